import { Circle, G, Line, Path, Svg, Text as SvgText } from "@react-pdf/renderer";
import { markerPath, PROJECTION_COLOUR, PROJECTION_DASH, THRESHOLD_COLOUR, THRESHOLD_DASH, type TChartLayout, type TChartMarker } from "@/lib/office/history-chart";
import { PDF_FONT_FAMILY } from "../fonts";

const INK = "#0f172a";
const GRID = "#e2e8f0";

// Font settings go in `style`: SVG text whose font React-PDF never loaded is left out of the page.
function Label({ x, y, size = 11, anchor = "start", children }: { x: number; y: number; size?: number; anchor?: "start" | "middle" | "end"; children: string }) {
  return (
    <SvgText x={x} y={y} fill={INK} textAnchor={anchor} style={{ fontFamily: PDF_FONT_FAMILY, fontSize: size }}>
      {children}
    </SvgText>
  );
}

function Marker({ shape, x, y, colour }: { shape: TChartMarker; x: number; y: number; colour: string }) {
  const m = markerPath(shape, x, y);
  return <Path d={m.d} fill={m.fill === "solid" ? colour : m.fill === "open" ? "white" : "none"} stroke={colour} strokeWidth={m.fill === "stroke" ? 2 : 1.5} />;
}

/** A lib/office/history-chart.ts layout drawn with React-PDF's SVG primitives, at the given width in points. */
export function LineChartPdf({ chart, width }: { chart: TChartLayout; width: number }) {
  const { plot } = chart;
  const bottom = plot.y + plot.height;
  return (
    <Svg width={width} height={(width * chart.height) / chart.width} viewBox={`0 0 ${chart.width} ${chart.height}`}>
      {chart.yTicks.map((t) => (
        <G key={t.value}>
          <Line x1={plot.x} x2={plot.x + plot.width} y1={t.y} y2={t.y} stroke={GRID} strokeWidth={1} />
          <Label x={plot.x - 6} y={t.y + 4} anchor="end">{String(t.value)}</Label>
        </G>
      ))}
      {chart.xTicks.map((t) => (
        <Label key={t.date} x={t.x} y={bottom + 16} anchor="middle">{t.date}</Label>
      ))}
      <Line x1={plot.x} x2={plot.x} y1={plot.y} y2={bottom} stroke={INK} strokeWidth={1} />
      <Line x1={plot.x} x2={plot.x + plot.width} y1={bottom} y2={bottom} stroke={INK} strokeWidth={1} />
      <G transform={`rotate(-90 14 ${plot.y + plot.height / 2})`}>
        <Label x={14} y={plot.y + plot.height / 2} size={12} anchor="middle">{chart.yLabel}</Label>
      </G>
      <Label x={plot.x + plot.width} y={bottom + 32} size={12} anchor="end">{chart.xLabel}</Label>
      {chart.threshold ? (
        <G>
          <Line x1={plot.x} x2={plot.x + plot.width} y1={chart.threshold.y} y2={chart.threshold.y} stroke={THRESHOLD_COLOUR} strokeWidth={1.5} strokeDasharray={THRESHOLD_DASH} />
          <Label x={chart.threshold.labelX} y={chart.threshold.labelY}>{chart.threshold.label}</Label>
        </G>
      ) : null}
      {chart.projection ? (
        <G>
          <Line x1={chart.projection.x1} y1={chart.projection.y1} x2={chart.projection.x2} y2={chart.projection.y2} stroke={PROJECTION_COLOUR} strokeWidth={1.5} strokeDasharray={PROJECTION_DASH} strokeLinecap="round" />
          <Line x1={chart.projection.x2} y1={chart.projection.y2} x2={chart.projection.x2} y2={bottom} stroke={PROJECTION_COLOUR} strokeWidth={1} strokeDasharray={PROJECTION_DASH} />
          <Circle cx={chart.projection.x2} cy={chart.projection.y2} r={4} fill="white" stroke={PROJECTION_COLOUR} strokeWidth={1.5} />
          <Label x={chart.projection.labelX} y={chart.projection.labelY} anchor="end">{chart.projection.label}</Label>
        </G>
      ) : null}
      {chart.lines.map((l) => (
        <G key={l.key}>
          <Path d={l.path} fill="none" stroke={l.colour} strokeWidth={2} strokeDasharray={l.dash || undefined} />
          {l.points.map((p) => <Marker key={p.date} shape={l.marker} x={p.x} y={p.y} colour={l.colour} />)}
        </G>
      ))}
      {chart.lines.map((l) => (
        <G key={`legend-${l.key}`}>
          <Line x1={l.legend.x} x2={l.legend.x + 28} y1={l.legend.y - 4} y2={l.legend.y - 4} stroke={l.colour} strokeWidth={2} strokeDasharray={l.dash || undefined} />
          <Marker shape={l.marker} x={l.legend.x + 14} y={l.legend.y - 4} colour={l.colour} />
          <Label x={l.legend.x + 34} y={l.legend.y}>{l.label}</Label>
        </G>
      ))}
    </Svg>
  );
}
