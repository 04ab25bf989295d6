// A line chart over dates as renderer-neutral shapes, drawn by
// components/history/line-chart-svg.tsx (web) and usable for a static SVG in
// the PDF. Readable without colour: each series has its own marker shape and
// dash pattern, the axes carry their units, and a legend names the series.
export type TChartSeries = { key: string; label: string; points: { date: string; value: number }[] };
export type TChartMarker = "circle" | "square" | "triangle" | "diamond" | "cross" | "plus" | "triangle-down" | "dot";
export type TChartInput = {
  title: string;
  yLabel: string;
  series: TChartSeries[];
  /** A dashed horizontal line with its label, e.g. the renewal threshold. */
  threshold?: { value: number; label: string };
  /** Extra x positions to include in the range (a projected date). */
  extraDates?: string[];
  /** A dotted projection from a point to another. */
  projection?: { from: { date: string; value: number }; to: { date: string; value: number }; label: string };
  width?: number;
  height?: number;
};

/** Eight series (the coating areas) each get their own marker and dash. */
export const MARKERS: readonly TChartMarker[] = ["circle", "square", "triangle", "diamond", "cross", "plus", "triangle-down", "dot"];
export const DASHES: readonly string[] = ["", "6 3", "2 3", "8 3 2 3", "12 4", "1 2", "4 2 1 2 1 2", "16 3 4 3"];

const LEGEND_PER_ROW = 3;
const DAY_MS = 86_400_000;
const toDay = (date: string) => Date.parse(`${date}T00:00:00Z`) / DAY_MS;

/** Round steps of 1, 2 or 5 × 10^n for about `count` ticks from 0 to max. */
export function niceTicks(max: number, count = 5): number[] {
  const top = max > 0 ? max : 1;
  const raw = top / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? 10 * mag;
  const ticks: number[] = [];
  for (let v = 0; v <= top + step * 1e-9; v += step) ticks.push(Number(v.toFixed(10)));
  if (ticks[ticks.length - 1]! < top) ticks.push(Number((ticks[ticks.length - 1]! + step).toFixed(10)));
  return ticks;
}

export type TChartLayout = {
  width: number;
  height: number;
  plot: { x: number; y: number; width: number; height: number };
  title: string;
  yLabel: string;
  xLabel: string;
  yTicks: { value: number; y: number }[];
  xTicks: { date: string; x: number }[];
  lines: { key: string; label: string; dash: string; marker: TChartMarker; path: string; legend: { x: number; y: number }; points: { x: number; y: number; date: string; value: number }[] }[];
  threshold: { y: number; label: string } | null;
  projection: { x1: number; y1: number; x2: number; y2: number; label: string } | null;
  empty: boolean;
};

export function layoutLineChart(input: TChartInput): TChartLayout {
  const width = input.width ?? 640;
  const height = input.height ?? 280;
  const legendRows = Math.ceil(input.series.length / LEGEND_PER_ROW);
  const plot = { x: 64, y: 16, width: width - 64 - 44, height: height - 16 - 44 - 18 * legendRows };
  const dates = [...new Set([...input.series.flatMap((s) => s.points.map((p) => p.date)), ...(input.extraDates ?? [])])].sort();
  const values = [...input.series.flatMap((s) => s.points.map((p) => p.value)), input.threshold?.value ?? 0, input.projection?.to.value ?? 0];
  const yTickValues = niceTicks(Math.max(...values, 0));
  const yMax = yTickValues[yTickValues.length - 1]!;
  const d0 = dates.length ? toDay(dates[0]!) : 0;
  const d1 = dates.length ? toDay(dates[dates.length - 1]!) : 1;
  const span = d1 - d0 || 1;
  const sx = (date: string) => plot.x + (dates.length > 1 && d1 !== d0 ? ((toDay(date) - d0) / span) * plot.width : plot.width / 2);
  const sy = (v: number) => plot.y + plot.height - (v / yMax) * plot.height;
  const r = (n: number) => Math.round(n * 10) / 10;
  const lines = input.series.map((s, i) => {
    const points = [...s.points].sort((a, b) => a.date.localeCompare(b.date)).map((p) => ({ x: r(sx(p.date)), y: r(sy(p.value)), date: p.date, value: p.value }));
    return {
      key: s.key,
      label: s.label,
      dash: DASHES[i % DASHES.length]!,
      marker: MARKERS[i % MARKERS.length]!,
      path: points.map((p, j) => `${j ? "L" : "M"}${p.x} ${p.y}`).join(" "),
      legend: { x: plot.x + (i % LEGEND_PER_ROW) * Math.floor(plot.width / LEGEND_PER_ROW), y: plot.y + plot.height + 52 + 18 * Math.floor(i / LEGEND_PER_ROW) },
      points,
    };
  });
  return {
    width,
    height,
    plot,
    title: input.title,
    yLabel: input.yLabel,
    xLabel: "Inspection date",
    yTicks: yTickValues.map((value) => ({ value, y: r(sy(value)) })),
    xTicks: dates.map((date) => ({ date, x: r(sx(date)) })),
    lines,
    threshold: input.threshold ? { y: r(sy(input.threshold.value)), label: input.threshold.label } : null,
    projection: input.projection
      ? { x1: r(sx(input.projection.from.date)), y1: r(sy(input.projection.from.value)), x2: r(sx(input.projection.to.date)), y2: r(sy(input.projection.to.value)), label: input.projection.label }
      : null,
    empty: !input.series.some((s) => s.points.length),
  };
}
