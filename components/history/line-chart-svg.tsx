import type { TChartLayout, TChartMarker } from "@/lib/office/history-chart";

function Marker({ shape, x, y }: { shape: TChartMarker; x: number; y: number }) {
  const s = 4.5;
  const common = { stroke: "currentColor", strokeWidth: 1.5 };
  switch (shape) {
    case "circle":
      return <circle cx={x} cy={y} r={s} fill="white" {...common} />;
    case "square":
      return <rect x={x - s} y={y - s} width={2 * s} height={2 * s} fill="currentColor" {...common} />;
    case "triangle":
      return <path d={`M${x} ${y - s - 1} L${x + s + 1} ${y + s} L${x - s - 1} ${y + s} Z`} fill="white" {...common} />;
    case "diamond":
      return <path d={`M${x} ${y - s - 1} L${x + s + 1} ${y} L${x} ${y + s + 1} L${x - s - 1} ${y} Z`} fill="currentColor" {...common} />;
    case "cross":
      return <path d={`M${x - s} ${y - s} L${x + s} ${y + s} M${x - s} ${y + s} L${x + s} ${y - s}`} {...common} strokeWidth={2} />;
    case "triangle-down":
      return <path d={`M${x} ${y + s + 1} L${x + s + 1} ${y - s} L${x - s - 1} ${y - s} Z`} fill="currentColor" {...common} />;
    case "dot":
      return <circle cx={x} cy={y} r={s - 1.5} fill="currentColor" {...common} />;
    default:
      return <path d={`M${x - s - 1} ${y} L${x + s + 1} ${y} M${x} ${y - s - 1} L${x} ${y + s + 1}`} {...common} strokeWidth={2} />;
  }
}

/** One line chart from lib/office/history-chart.ts: markers and dashes tell the series apart, not colour. */
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
          <line x1={plot.x} x2={plot.x + plot.width} y1={chart.threshold.y} y2={chart.threshold.y} stroke="#b91c1c" strokeWidth={1.5} strokeDasharray="10 4" />
          <text x={plot.x + 4} y={chart.threshold.y - 4} fontSize={11}>{chart.threshold.label}</text>
        </g>
      ) : null}
      {chart.projection ? (
        <g>
          <line x1={chart.projection.x1} y1={chart.projection.y1} x2={chart.projection.x2} y2={chart.projection.y2} stroke="currentColor" strokeWidth={1.5} strokeDasharray="1 4" strokeLinecap="round" />
          <text x={chart.projection.x2 - 4} y={chart.projection.y2 + 16} fontSize={11} textAnchor="end">{chart.projection.label}</text>
        </g>
      ) : null}
      {chart.lines.map((l) => (
        <g key={l.key}>
          <path d={l.path} fill="none" stroke="currentColor" strokeWidth={2} strokeDasharray={l.dash || undefined} />
          {l.points.map((p) => <Marker key={p.date} shape={l.marker} x={p.x} y={p.y} />)}
        </g>
      ))}
      <g aria-label="Legend">
        {chart.lines.map((l) => {
          return (
            <g key={l.key} transform={`translate(${l.legend.x} ${l.legend.y})`}>
              <line x1={0} x2={28} y1={-4} y2={-4} stroke="currentColor" strokeWidth={2} strokeDasharray={l.dash || undefined} />
              <Marker shape={l.marker} x={14} y={-4} />
              <text x={34} y={0} fontSize={11}>{l.label}</text>
            </g>
          );
        })}
      </g>
    </svg>
  );
}
