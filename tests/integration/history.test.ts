// A tank's history: three countersigned inspections built here (the complete
// inspection of the seed, then coating, anodes and sediment varied), one
// submitted inspection (listed, not plotted), the series, the anode projection
// with the company's threshold, and the recurring marks. The projection is
// worked by hand below (least-squares line, lib/calc/anodes.ts).
import { beforeAll, describe, expect, it } from "vitest";
import type { TTankHistory } from "@/lib/services/history";
import { buildTankHistory } from "../fixtures/history";
import { signIn } from "../fixtures/http";
import { buildScenario, PASSWORD, type TScenario } from "../fixtures/scenario";

let s: TScenario;
let h: TTankHistory;
let ids: string[] = [];
let submittedId = "";

beforeAll(async () => {
  s = await buildScenario();
  const built = await buildTankHistory(s);
  ids = built.countersignedIds;
  submittedId = built.submittedId;
  const superintendent = await signIn(s.users.superintendent.email, PASSWORD);
  const res = await superintendent.request(`/api/v1/vessels/${s.ownVessel.id}/tanks/${built.tank.id}/history`);
  expect(res.status).toBe(200);
  h = (await res.json()) as TTankHistory;
});

describe("tank history", () => {
  it("lists every inspection, newest first, with links to the page and (when rendered) the signed PDF", () => {
    expect(h.inspections.map((i) => i.inspectedOn)).toEqual(["2026-06-01", "2026-03-01", "2025-03-01", "2024-03-01"]);
    expect(h.inspections[0]).toMatchObject({ id: submittedId, status: "submitted", plotted: false, rating: null, signedReportUrl: null });
    expect(h.inspections[1]).toMatchObject({ id: ids[2], status: "countersigned", plotted: true, pageUrl: `/inspections/${ids[2]}` });
  });

  it("rates each signed inspection (IMO MSC.1/Circ.1330 Table 1: > 20 % breakdown POOR, 3–20 % FAIR)", () => {
    expect(h.inspections.slice(1).map((i) => i.rating)).toEqual(["POOR", "FAIR", "FAIR"]);
  });

  it("plots coating breakdown per area from the signed inspections only", () => {
    const shell = h.coating.find((c) => c.area === "shell_plating")!;
    expect(shell.points.map((p) => [p.date, p.breakdownPct])).toEqual([["2024-03-01", 4], ["2025-03-01", 10], ["2026-03-01", 25]]);
    expect(h.coating.find((c) => c.area === "stringers")!.points.map((p) => p.breakdownPct)).toEqual([1, 1, 1]);
  });

  it("plots mean anode wastage and projects the company's threshold (60 %)", () => {
    expect(h.anodes.thresholdPct).toBe(60);
    expect(h.anodes.points.map((p) => [p.date, p.meanWastagePct])).toEqual([["2024-03-01", 20], ["2025-03-01", 30], ["2026-03-01", 40]]);
    // By hand: 10 % per 365 days; from 40 % on 2026-03-01, 20 % more takes 730 days → 2028-02-29 (2028 is a leap year).
    expect(h.anodes.projection!.date).toBe("2028-02-29");
    expect(h.anodes.projection!.ratePctPerYear).toBeCloseTo((10 / 365) * 365.25, 6);
  });

  it("plots the sediment volume as the sum of the zones", () => {
    expect(h.sediment.map((p) => [p.date, p.volumeM3, p.zones])).toEqual([["2024-03-01", 1, 1], ["2025-03-01", 2, 1], ["2026-03-01", 3.5, 2]]);
  });

  it("marks findings found again at the same frames and member as recurring", () => {
    const mark = (date: string, n: number) => h.findings.find((f) => f.inspectedOn === date && f.number === n)!.recurring;
    expect(mark("2024-03-01", 1)).toBeNull();
    expect(mark("2024-03-01", 2)).toBeNull();
    expect(mark("2025-03-01", 1)).toMatchObject({ number: 1, inspectedOn: "2024-03-01", inspectionId: ids[0] });
    expect(mark("2025-03-01", 2)).toMatchObject({ number: 2, inspectedOn: "2024-03-01" });
    expect(mark("2026-03-01", 1)).toMatchObject({ number: 1, inspectedOn: "2025-03-01", inspectionId: ids[1] });
    expect(mark("2026-03-01", 2)).toBeNull();
  });

  it("shows the history page with the plots, their data tables and the recurring marks", async () => {
    const officer = await signIn(s.users.officer.email, PASSWORD);
    const res = await officer.request(`/vessels/${s.ownVessel.id}/tanks/${h.tank.id}/history`);
    expect(res.status).toBe(200);
    const html = await res.text();
    for (const title of ["Coating breakdown per area over time", "Mean anode wastage over time", "Sediment volume over time"]) expect(html).toContain(title);
    expect(html).toContain("Breakdown (%)");
    expect(html).toContain("2028-02-29");
    expect(html.match(/data-recurring=/g)).toHaveLength(3);
  });
});
