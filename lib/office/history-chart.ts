// A line chart over dates as renderer-neutral shapes: the one geometry drawn by
// components/history/line-chart-svg.tsx (the page before and without
// JavaScript) and templates/parts/line-chart-pdf.tsx (the history PDF); the
// browser chart (components/history/history-chart.tsx) takes its ticks,
// colours, dashes and markers from it. Readable without colour: each series has
// its own marker shape and dash pattern, the axes carry their units, and a
// legend names the series.
export type TChartSeries = { key: string; label: string; points: { date: string; value: number }[] };
export type TChartMarker = "circle" | "square" | "triangle" | "diamond" | "cross" | "plus" | "triangle-down" | "dot";
export type TChartInput = {
  title: string;
  yLabel: string;
  /** The unit of the values, for tooltips ("%", "m³"). */
  unit: string;
  /** Decimals of a value in tooltips and tables (default 1). */
  digits?: number;
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
/** Series colours from the app's palette (tailwind.config.ts, slate from Tailwind); colour only adds to marker and dash. */
export const SERIES_COLOURS: readonly string[] = [
  "#12253a", // hull-900
  "#9a6a00", // rating-fair
  "#2f5573", // hull-600
  "#1f7a4d", // rating-good
  "#64748b", // slate-500
  "#1b3549", // hull-800
  "#334155", // slate-700
  "#244560", // hull-700
];
/** The renewal threshold: rating-poor, the colour the app gives to what needs work. */
export const THRESHOLD_COLOUR = "#b42318";
export const THRESHOLD_DASH = "10 4";
export const PROJECTION_DASH = "1 4";
export const PROJECTION_COLOUR = "#12253a"; // hull-900
const MARKER_SIZE = 4.5;

/**
 * A marker as one SVG path around (x, y), so that the page, the browser chart
 * and the PDF draw the same shapes: "open" is outlined on white, "solid" filled,
 * "stroke" only lines (cross, plus).
 */
export function markerPath(shape: TChartMarker, x: number, y: number): { d: string; fill: "open" | "solid" | "stroke" } {
  const s = MARKER_SIZE;
  const t = s + 1;
  const circle = (r: number) => `M${x - r} ${y} A${r} ${r} 0 1 0 ${x + r} ${y} A${r} ${r} 0 1 0 ${x - r} ${y} Z`;
  switch (shape) {
    case "circle":
      return { d: circle(s), fill: "open" };
    case "square":
      return { d: `M${x - s} ${y - s} H${x + s} V${y + s} H${x - s} Z`, fill: "solid" };
    case "triangle":
      return { d: `M${x} ${y - t} L${x + t} ${y + s} L${x - t} ${y + s} Z`, fill: "open" };
    case "diamond":
      return { d: `M${x} ${y - t} L${x + t} ${y} L${x} ${y + t} L${x - t} ${y} Z`, fill: "solid" };
    case "cross":
      return { d: `M${x - s} ${y - s} L${x + s} ${y + s} M${x - s} ${y + s} L${x + s} ${y - s}`, fill: "stroke" };
    case "triangle-down":
      return { d: `M${x} ${y + t} L${x + t} ${y - s} L${x - t} ${y - s} Z`, fill: "solid" };
    case "dot":
      return { d: circle(s - 1.5), fill: "solid" };
    case "plus":
      return { d: `M${x - t} ${y} L${x + t} ${y} M${x} ${y - t} L${x} ${y + t}`, fill: "stroke" };
  }
}

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
  unit: string;
  digits: number;
  xLabel: string;
  yTicks: { value: number; y: number }[];
  xTicks: { date: string; x: number }[];
  lines: { key: string; label: string; dash: string; marker: TChartMarker; colour: string; path: string; legend: { x: number; y: number }; points: { x: number; y: number; date: string; value: number }[] }[];
  threshold: { y: number; value: number; label: string; labelX: number; labelY: number } | null;
  /** The dotted line to the projected point, the label above its end (anchored at its end) and a drop line to the date axis. */
  projection: { x1: number; y1: number; x2: number; y2: number; label: string; labelX: number; labelY: number; from: { date: string; value: number }; to: { date: string; value: number } } | null;
  empty: boolean;
};

function projectionLayout(p: NonNullable<TChartInput["projection"]>, sx: (date: string) => number, sy: (v: number) => number, r: (n: number) => number) {
  const x2 = r(sx(p.to.date));
  const y2 = r(sy(p.to.value));
  return { x1: r(sx(p.from.date)), y1: r(sy(p.from.value)), x2, y2, label: p.label, labelX: x2 - 8, labelY: y2 - 6, from: p.from, to: p.to };
}

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
      colour: SERIES_COLOURS[i % SERIES_COLOURS.length]!,
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
    unit: input.unit,
    digits: input.digits ?? 1,
    xLabel: "Inspection date",
    yTicks: yTickValues.map((value) => ({ value, y: r(sy(value)) })),
    xTicks: dates.map((date) => ({ date, x: r(sx(date)) })),
    lines,
    threshold: input.threshold ? { y: r(sy(input.threshold.value)), value: input.threshold.value, label: input.threshold.label, labelX: plot.x + 4, labelY: r(sy(input.threshold.value) - 4) } : null,
    projection: input.projection ? projectionLayout(input.projection, sx, sy, r) : null,
    empty: !input.series.some((s) => s.points.length),
  };
}
