// A history chart's layout as the rows and axes of the browser chart
// (components/history/history-chart.tsx): one row per date with each series'
// value under its key, the projection under PROJECTION_KEY, and the layout's
// own ticks, so that both drawings show the same axes.
import type { TChartLayout } from "./history-chart";

export const PROJECTION_KEY = "projection";
const DAY_MS = 86_400_000;

export type TChartRow = { t: number; date: string } & { [key: string]: number | string };

export const dateToMs = (date: string) => Date.parse(`${date}T00:00:00Z`);
export const msToDate = (ms: number) => new Date(ms).toISOString().slice(0, 10);

export function chartRows(chart: TChartLayout) {
  const byDate = new Map<string, TChartRow>();
  const row = (date: string) => byDate.get(date) ?? byDate.set(date, { t: dateToMs(date), date }).get(date)!;
  for (const l of chart.lines) for (const p of l.points) row(p.date)[l.key] = p.value;
  if (chart.projection) {
    row(chart.projection.from.date)[PROJECTION_KEY] = chart.projection.from.value;
    row(chart.projection.to.date)[PROJECTION_KEY] = chart.projection.to.value;
  }
  const xTicks = chart.xTicks.map((t) => dateToMs(t.date));
  const first = Math.min(...xTicks);
  const last = Math.max(...xTicks);
  // One date alone sits in the middle, as in the layout: a year either side.
  const xDomain: [number, number] = !xTicks.length ? [0, DAY_MS] : first === last ? [first - 365 * DAY_MS, last + 365 * DAY_MS] : [first, last];
  const yTicks = chart.yTicks.map((t) => t.value);
  return {
    rows: [...byDate.values()].sort((a, b) => a.t - b.t),
    xTicks,
    xDomain,
    yTicks,
    yDomain: [0, yTicks[yTicks.length - 1] ?? 1] as [number, number],
  };
}

/** A value as the tables show it: "10.0 %", "3.50 m³". */
export const formatChartValue = (chart: Pick<TChartLayout, "unit" | "digits">, value: number) => `${value.toFixed(chart.digits)} ${chart.unit}`;
