import { markerPath, type TChartMarker } from "@/lib/office/history-chart";

/** A series marker from lib/office/history-chart.ts, drawn in the series colour. */
export function ChartMarker({ shape, x, y, colour, ...data }: { shape: TChartMarker; x: number; y: number; colour: string } & { [attr: `data-${string}`]: string }) {
  const m = markerPath(shape, x, y);
  const fill = m.fill === "solid" ? colour : m.fill === "open" ? "white" : "none";
  return <path d={m.d} fill={fill} stroke={colour} strokeWidth={m.fill === "stroke" ? 2 : 1.5} {...data} />;
}
