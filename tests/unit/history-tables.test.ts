// The data tables under the tank history's plots (lib/office/history-tables.ts),
// shared by the history page and the history PDF. Figures worked by hand.
import { describe, expect, it } from "vitest";
import { buildHistoryTables } from "@/lib/office/history-tables";

describe("buildHistoryTables", () => {
  const tables = buildHistoryTables({
    coating: [
      { label: "Shell plating", points: [{ date: "2025-03-01", breakdownPct: 10 }, { date: "2024-03-01", breakdownPct: 4 }] },
      // Not measured on 2025-03-01: a dash, never 0.
      { label: "Stringers", points: [{ date: "2024-03-01", breakdownPct: 1 }] },
    ],
    anodes: { points: [{ date: "2024-03-01", meanWastagePct: 20.25, toRenewCount: 0 }] },
    sediment: [{ date: "2024-03-01", volumeM3: 3.5, zones: 2 }],
  });

  it("puts every area in a row and every inspection date in a column, oldest first", () => {
    expect(tables.coating.head).toEqual(["Area", "2024-03-01", "2025-03-01"]);
    expect(tables.coating.rows).toEqual([
      ["Shell plating", "4.0 %", "10.0 %"],
      ["Stringers", "1.0 %", "—"],
    ]);
  });

  it("gives mean wastage with one decimal and the anodes to renew, including none", () => {
    // 20.25 → "20.3" (toFixed(1) of 20.25 rounds up: 20.25 is exact in binary).
    expect(tables.anodes).toEqual({ head: ["Date", "Mean wastage", "Anodes to renew"], rows: [["2024-03-01", "20.3 %", "0"]] });
  });

  it("gives sediment volume with two decimals and the number of zones", () => {
    expect(tables.sediment).toEqual({ head: ["Date", "Volume", "Zones"], rows: [["2024-03-01", "3.50 m³", "2"]] });
  });

  it("has no rows when nothing is signed yet", () => {
    const empty = buildHistoryTables({ coating: [{ label: "Shell plating", points: [] }], anodes: { points: [] }, sediment: [] });
    expect(empty.coating.rows).toEqual([]);
    expect(empty.anodes.rows).toEqual([]);
    expect(empty.sediment.rows).toEqual([]);
  });
});
