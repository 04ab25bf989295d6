// The data tables under the three plots of a tank's history (coating
// breakdown per area × inspection date, mean anode wastage and anodes to renew
// per date, sediment volume and zones per date), built once from the history's
// rows for the page and the history PDF, so that both print the same figures.

export type THistoryTableInput = {
  coating: { label: string; points: { date: string; breakdownPct: number }[] }[];
  anodes: { points: { date: string; meanWastagePct: number; toRenewCount: number }[] };
  sediment: { date: string; volumeM3: number; zones: number }[];
};

export type THistoryTable = { head: string[]; rows: string[][] };
export type THistoryTables = { coating: THistoryTable; anodes: THistoryTable; sediment: THistoryTable };

const fmt = (n: number, digits = 1) => n.toFixed(digits);

export function buildHistoryTables(h: THistoryTableInput): THistoryTables {
  const dates = [...new Set(h.coating.flatMap((s) => s.points.map((p) => p.date)))].sort();
  return {
    coating: {
      head: ["Area", ...dates],
      rows: dates.length
        ? h.coating.map((s) => [
            s.label,
            ...dates.map((d) => {
              const p = s.points.find((x) => x.date === d);
              return p ? `${fmt(p.breakdownPct)} %` : "—";
            }),
          ])
        : [],
    },
    anodes: {
      head: ["Date", "Mean wastage", "Anodes to renew"],
      rows: h.anodes.points.map((p) => [p.date, `${fmt(p.meanWastagePct)} %`, String(p.toRenewCount)]),
    },
    sediment: {
      head: ["Date", "Volume", "Zones"],
      rows: h.sediment.map((p) => [p.date, `${fmt(p.volumeM3, 2)} m³`, String(p.zones)]),
    },
  };
}
