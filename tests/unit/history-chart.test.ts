// The history plots' layout: round axis steps, every series its own marker and
// dash (readable without colour), points placed by date; the three plots of a
// tank's history and the rows the browser chart draws from them.
import { describe, expect, it } from "vitest";
import { layoutLineChart, MARKERS, markerPath, niceTicks } from "@/lib/office/history-chart";
import { chartRows, formatChartValue, PROJECTION_KEY } from "@/lib/office/history-chart-rows";
import { layoutHistoryPlots } from "@/lib/office/history-plots";

describe("niceTicks", () => {
  it("uses steps of 1, 2 or 5 × 10^n up to at least the maximum", () => {
    expect(niceTicks(50)).toEqual([0, 10, 20, 30, 40, 50]);
    expect(niceTicks(7)).toEqual([0, 2, 4, 6, 8]);
    expect(niceTicks(0)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
  });
});

describe("layoutLineChart", () => {
  it("tells eight series apart by marker and by dash", () => {
    const series = Array.from({ length: 8 }, (_, i) => ({ key: `s${i}`, label: `S${i}`, points: [{ date: "2025-01-01", value: i }] }));
    const c = layoutLineChart({ title: "t", yLabel: "%", unit: "%", series });
    expect(new Set(c.lines.map((l) => l.marker)).size).toBe(8);
    expect(new Set(c.lines.map((l) => l.dash)).size).toBe(8);
  });

  it("gives each series a distinct marker and dash and places dates in proportion", () => {
    const c = layoutLineChart({
      title: "t", yLabel: "%", unit: "%", width: 400, height: 200,
      series: [
        { key: "a", label: "A", points: [{ date: "2024-01-01", value: 10 }, { date: "2026-01-01", value: 20 }] },
        { key: "b", label: "B", points: [{ date: "2025-01-01", value: 5 }] },
      ],
    });
    expect(new Set(c.lines.map((l) => l.marker)).size).toBe(2);
    expect(new Set(c.lines.map((l) => l.dash)).size).toBe(2);
    const [a0, a1] = c.lines[0]!.points;
    expect(a0!.x).toBe(c.plot.x);
    expect(a1!.x).toBe(c.plot.x + c.plot.width);
    expect(c.lines[1]!.points[0]!.x).toBeCloseTo(c.plot.x + (366 / 731) * c.plot.width, 0); // 2024 is a leap year
    expect(c.empty).toBe(false);
  });
});

describe("markerPath", () => {
  it("draws every marker as its own path around the point, filled ones closed", () => {
    const paths = MARKERS.map((m) => markerPath(m, 100, 50));
    expect(new Set(paths.map((p) => p.d)).size).toBe(8);
    for (const p of paths) if (p.fill !== "stroke") expect(p.d.endsWith("Z")).toBe(true);
    // By hand: a square of half-side 4.5 around (100, 50).
    expect(markerPath("square", 100, 50)).toEqual({ d: "M95.5 45.5 H104.5 V54.5 H95.5 Z", fill: "solid" });
    expect(markerPath("cross", 100, 50).fill).toBe("stroke");
  });
});

// The tank history fixture's series (tests/fixtures/history.ts): shell plating
// 4, 10, 25 %; mean anode wastage 20, 30, 40 % with the company's 60 % threshold
// projected to 2028-02-29 (worked in tests/integration/history.test.ts);
// sediment 1, 2, 3.5 m³.
const FIXTURE = {
  coating: [{ area: "shell_plating", label: "Shell plating", points: [["2024-03-01", 4], ["2025-03-01", 10], ["2026-03-01", 25]].map(([date, v]) => ({ date: date as string, breakdownPct: v as number })) }],
  anodes: { thresholdPct: 60, points: [["2024-03-01", 20], ["2025-03-01", 30], ["2026-03-01", 40]].map(([date, v]) => ({ date: date as string, meanWastagePct: v as number })), projection: { date: "2028-02-29" } },
  sediment: [["2024-03-01", 1], ["2025-03-01", 2], ["2026-03-01", 3.5]].map(([date, v]) => ({ date: date as string, volumeM3: v as number })),
};

describe("layoutHistoryPlots", () => {
  const plots = layoutHistoryPlots(FIXTURE);

  it("gives each plot round ticks up to its largest value (steps by hand: 25/5 → 5, 60/5 → 20, 3.5/5 → 1)", () => {
    expect(plots.coating.yTicks.map((t) => t.value)).toEqual([0, 5, 10, 15, 20, 25]);
    expect(plots.anodes.yTicks.map((t) => t.value)).toEqual([0, 20, 40, 60]);
    expect(plots.sediment.yTicks.map((t) => t.value)).toEqual([0, 1, 2, 3, 4]);
    expect([plots.coating.yLabel, plots.anodes.yLabel, plots.sediment.yLabel]).toEqual(["Breakdown (%)", "Mean wastage (%)", "Sediment (m³)"]);
  });

  it("draws the threshold and the projection from the last signed point to the projected date on the threshold", () => {
    const a = plots.anodes;
    expect(a.xTicks.map((t) => t.date)).toEqual(["2024-03-01", "2025-03-01", "2026-03-01", "2028-02-29"]);
    expect(a.threshold).toMatchObject({ value: 60, label: "Renewal threshold 60 %" });
    expect(a.projection).toMatchObject({ label: "projected 2028-02-29", from: { date: "2026-03-01", value: 40 }, to: { date: "2028-02-29", value: 60 } });
    // 60 % is the top tick, so the projection ends at the top right corner of the plot.
    expect([a.projection!.x2, a.projection!.y2]).toEqual([a.plot.x + a.plot.width, a.plot.y]);
    expect(a.threshold!.y).toBe(a.plot.y);
  });

  it("has no projection when the projected date is not after the last inspection", () => {
    const p = layoutHistoryPlots({ ...FIXTURE, anodes: { ...FIXTURE.anodes, projection: { date: "2026-03-01" } } });
    expect(p.anodes.projection).toBeNull();
  });
});

describe("chartRows", () => {
  it("puts each date's values in one row, the projection under its own key, and keeps the layout's ticks", () => {
    const c = chartRows(layoutHistoryPlots(FIXTURE).anodes);
    expect(c.rows.map((r) => [r.date, r.mean, r[PROJECTION_KEY]])).toEqual([
      ["2024-03-01", 20, undefined],
      ["2025-03-01", 30, undefined],
      ["2026-03-01", 40, 40],
      ["2028-02-29", undefined, 60],
    ]);
    expect(c.xDomain).toEqual([Date.UTC(2024, 2, 1), Date.UTC(2028, 1, 29)]);
    expect(c.xTicks).toHaveLength(4);
    expect(c.yTicks).toEqual([0, 20, 40, 60]);
    expect(c.yDomain).toEqual([0, 60]);
  });

  it("centres a single date with a year either side", () => {
    const one = layoutLineChart({ title: "t", yLabel: "m³", unit: "m³", series: [{ key: "v", label: "V", points: [{ date: "2025-06-01", value: 2 }] }] });
    expect(chartRows(one).xDomain).toEqual([Date.UTC(2024, 5, 1), Date.UTC(2026, 5, 1)]); // 2025-06-01 ± 365 days
  });

  it("formats values as the data tables do", () => {
    const p = layoutHistoryPlots(FIXTURE);
    expect(formatChartValue(p.anodes, 30)).toBe("30.0 %");
    expect(formatChartValue(p.sediment, 3.5)).toBe("3.50 m³");
  });
});
