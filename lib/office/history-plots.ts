// The three plots of a tank's history (coating breakdown per area, mean anode
// wastage with the renewal threshold and its projected date, sediment volume)
// laid out once from the history's series, for the page and the history PDF.
import { layoutLineChart, type TChartLayout } from "./history-chart";

export type THistorySeries = {
  coating: { area: string; label: string; points: { date: string; breakdownPct: number }[] }[];
  anodes: { thresholdPct: number; points: { date: string; meanWastagePct: number }[]; projection: { date: string } | null };
  sediment: { date: string; volumeM3: number }[];
};

export type THistoryPlots = { coating: TChartLayout; anodes: TChartLayout; sediment: TChartLayout };

export function layoutHistoryPlots(h: THistorySeries): THistoryPlots {
  const last = h.anodes.points[h.anodes.points.length - 1];
  const projection = h.anodes.projection;
  const threshold = h.anodes.thresholdPct;
  return {
    coating: layoutLineChart({
      title: "Coating breakdown per area over time",
      yLabel: "Breakdown (%)",
      unit: "%",
      series: h.coating.map((s) => ({ key: s.area, label: s.label, points: s.points.map((p) => ({ date: p.date, value: p.breakdownPct })) })),
      height: 340,
    }),
    anodes: layoutLineChart({
      title: "Mean anode wastage over time",
      yLabel: "Mean wastage (%)",
      unit: "%",
      series: [{ key: "mean", label: "Mean wastage", points: h.anodes.points.map((p) => ({ date: p.date, value: p.meanWastagePct })) }],
      threshold: { value: threshold, label: `Renewal threshold ${threshold.toFixed(0)} %` },
      extraDates: projection ? [projection.date] : [],
      projection:
        projection && last && projection.date > last.date
          ? { from: { date: last.date, value: last.meanWastagePct }, to: { date: projection.date, value: threshold }, label: `projected ${projection.date}` }
          : undefined,
    }),
    sediment: layoutLineChart({
      title: "Sediment volume over time",
      yLabel: "Sediment (m³)",
      unit: "m³",
      digits: 2,
      series: [{ key: "volume", label: "Sediment volume", points: h.sediment.map((p) => ({ date: p.date, value: p.volumeM3 })) }],
    }),
  };
}
