// The history plots' layout: round axis steps, every series its own marker and
// dash (readable without colour), points placed by date.
import { describe, expect, it } from "vitest";
import { layoutLineChart, niceTicks } from "@/lib/office/history-chart";

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
    const c = layoutLineChart({ title: "t", yLabel: "%", series });
    expect(new Set(c.lines.map((l) => l.marker)).size).toBe(8);
    expect(new Set(c.lines.map((l) => l.dash)).size).toBe(8);
  });

  it("gives each series a distinct marker and dash and places dates in proportion", () => {
    const c = layoutLineChart({
      title: "t", yLabel: "%", width: 400, height: 200,
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
