import { PROJECTION_COLOUR, PROJECTION_DASH, THRESHOLD_COLOUR, THRESHOLD_DASH, type TChartLayout } from "@/lib/office/history-chart";
import { ChartMarker } from "./chart-marker";

/** One line chart from lib/office/history-chart.ts: markers and dashes tell the series apart, colour only adds to them. */
export function LineChartSvg({ chart }: { chart: TChartLayout }) {
  const { plot } = chart;
  return (
    <svg viewBox={`0 0 ${chart.width} ${chart.height}`} role="img" aria-label={chart.title} className="h-auto w-full max-w-3xl text-slate-900" style={{ fontFamily: "inherit" }}>
      <title>{chart.title}</title>
      {chart.yTicks.map((t) => (
        <g key={t.value}>
          <line x1={plot.x} x2={plot.x + plot.width} y1={t.y} y2={t.y} stroke="#e2e8f0" />
          <text x={plot.x - 6} y={t.y + 4} textAnchor="end" fontSize={11}>{t.value}</text>
        </g>
      ))}
      {chart.xTicks.map((t) => (
        <text key={t.date} x={t.x} y={plot.y + plot.height + 16} textAnchor="middle" fontSize={11}>{t.date}</text>
      ))}
      <line x1={plot.x} x2={plot.x} y1={plot.y} y2={plot.y + plot.height} stroke="currentColor" />
      <line x1={plot.x} x2={plot.x + plot.width} y1={plot.y + plot.height} y2={plot.y + plot.height} stroke="currentColor" />
      <text x={14} y={plot.y + plot.height / 2} fontSize={12} textAnchor="middle" transform={`rotate(-90 14 ${plot.y + plot.height / 2})`}>{chart.yLabel}</text>
      <text x={plot.x + plot.width} y={plot.y + plot.height + 32} fontSize={12} textAnchor="end">{chart.xLabel}</text>
      {chart.threshold ? (
        <g>
          <line x1={plot.x} x2={plot.x + plot.width} y1={chart.threshold.y} y2={chart.threshold.y} stroke={THRESHOLD_COLOUR} strokeWidth={1.5} strokeDasharray={THRESHOLD_DASH} />
          <text x={chart.threshold.labelX} y={chart.threshold.labelY} fontSize={11}>{chart.threshold.label}</text>
        </g>
      ) : null}
      {chart.projection ? (
        <g>
          <line x1={chart.projection.x1} y1={chart.projection.y1} x2={chart.projection.x2} y2={chart.projection.y2} stroke={PROJECTION_COLOUR} strokeWidth={1.5} strokeDasharray={PROJECTION_DASH} strokeLinecap="round" />
          <line x1={chart.projection.x2} y1={chart.projection.y2} x2={chart.projection.x2} y2={plot.y + plot.height} stroke={PROJECTION_COLOUR} strokeDasharray={PROJECTION_DASH} />
          <circle cx={chart.projection.x2} cy={chart.projection.y2} r={4} fill="white" stroke={PROJECTION_COLOUR} strokeWidth={1.5} />
          <text x={chart.projection.labelX} y={chart.projection.labelY} fontSize={11} textAnchor="end">{chart.projection.label}</text>
        </g>
      ) : null}
      {chart.lines.map((l) => (
        <g key={l.key}>
          <path d={l.path} fill="none" stroke={l.colour} strokeWidth={2} strokeDasharray={l.dash || undefined} />
          {l.points.map((p) => <ChartMarker key={p.date} shape={l.marker} x={p.x} y={p.y} colour={l.colour} />)}
        </g>
      ))}
      <g aria-label="Legend">
        {chart.lines.map((l) => (
          <g key={l.key} transform={`translate(${l.legend.x} ${l.legend.y})`}>
            <line x1={0} x2={28} y1={-4} y2={-4} stroke={l.colour} strokeWidth={2} strokeDasharray={l.dash || undefined} />
            <ChartMarker shape={l.marker} x={14} y={-4} colour={l.colour} />
            <text x={34} y={0} fontSize={11}>{l.label}</text>
          </g>
        ))}
      </g>
    </svg>
  );
}
