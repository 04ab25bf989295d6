// tank_latest_inspections is kept by database triggers (drizzle/0004_tank-latest.sql):
// whatever writes inspections or coating areas, each tank's row names its latest
// countersigned inspection and the rank of its worst coating area under both
// readings of the 20 % boundary. Ranks: the thresholds of IMO MSC.1/Circ.1330
// §4.1.3 Table 1 (GOOD < 3 %, FAIR 3–20 %, POOR > 20 %; hard scale ≥ 10 % POOR).
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { coatingAreas, inspections, tankLatestInspections } from "@/db/schema";
import { insertTank } from "@/db/seed/builders";
import { buildScenario, testDb, type TScenario } from "../fixtures/scenario";

let s: TScenario;
let tankN = 0;

async function newTank() {
  tankN += 1;
  return insertTank(testDb(), { orgId: s.org.id, vesselId: s.ownVessel.id, code: `TL-${tankN}`, name: `Latest test tank ${tankN}`, side: "port", kind: "side", frameFrom: 40, frameTo: 60 });
}

async function inspection(tankId: string, inspectedOn: string, status: "countersigned" | "submitted" | "superseded", revision = 1) {
  const [row] = await testDb()
    .insert(inspections)
    .values({ orgId: s.org.id, vesselId: s.ownVessel.id, tankId, inspectedOn, revision, placeKind: "port", place: "Test port", status, countersignedAt: status === "countersigned" ? new Date(`${inspectedOn}T12:00:00Z`) : null })
    .returning();
  return row!;
}

const coating = (inspectionId: string, area: "shell_plating" | "bulkhead_plating", breakdownPct: number, hardScalePct = 0) =>
  testDb().insert(coatingAreas).values({ orgId: s.org.id, inspectionId, area, breakdownPct, rustedPct: 0, hardScalePct });

async function latestOf(tankId: string) {
  const [row] = await testDb().select().from(tankLatestInspections).where(eq(tankLatestInspections.tankId, tankId));
  return row ? { inspectionId: row.inspectionId, inspectedOn: row.inspectedOn, revision: row.revision, rankTable: row.rankTable, rankWording: row.rankWording, orgId: row.orgId, vesselId: row.vesselId } : null;
}

beforeAll(async () => {
  s = await buildScenario();
});

describe("each tank's latest countersigned inspection, kept by the database", () => {
  it("has no row for a tank without a countersigned inspection", async () => {
    const t = await newTank();
    await inspection(t.id, "2026-01-10", "submitted");
    expect(await latestOf(t.id)).toBeNull();
  });

  it("follows the inspection date, not the order of writing, and ignores reports not countersigned", async () => {
    const t = await newTank();
    const newer = await inspection(t.id, "2026-02-01", "countersigned");
    await inspection(t.id, "2025-02-01", "countersigned");
    await inspection(t.id, "2026-03-01", "submitted");
    expect(await latestOf(t.id)).toMatchObject({ inspectionId: newer.id, inspectedOn: "2026-02-01", orgId: s.org.id, vesselId: s.ownVessel.id });
  });

  it("ranks the worst area when coating areas are written after the countersigned row, and again when one changes", async () => {
    const t = await newTank();
    const i = await inspection(t.id, "2026-02-01", "countersigned");
    expect((await latestOf(t.id))?.rankTable).toBeNull(); // no coating record yet
    await coating(i.id, "shell_plating", 2); // < 3 %: GOOD
    await coating(i.id, "bulkhead_plating", 20); // 20 %: FAIR in the table (POOR is > 20 %), POOR in the wording (20 % or more)
    expect(await latestOf(t.id)).toMatchObject({ rankTable: 1, rankWording: 2 });
    await testDb().update(coatingAreas).set({ breakdownPct: 2, hardScalePct: 10 }).where(and(eq(coatingAreas.inspectionId, i.id), eq(coatingAreas.area, "bulkhead_plating"))); // hard scale 10 %: POOR
    expect(await latestOf(t.id)).toMatchObject({ rankTable: 2, rankWording: 2 });
    await testDb().delete(coatingAreas).where(and(eq(coatingAreas.inspectionId, i.id), eq(coatingAreas.area, "bulkhead_plating")));
    expect(await latestOf(t.id)).toMatchObject({ rankTable: 0, rankWording: 0 });
  });

  it("moves to the revision countersigned later, and back when that one is superseded", async () => {
    const t = await newTank();
    const first = await inspection(t.id, "2026-02-01", "countersigned");
    await coating(first.id, "shell_plating", 25); // > 20 %: POOR
    const revised = await inspection(t.id, "2026-02-01", "submitted", 2);
    await coating(revised.id, "shell_plating", 5); // 3–20 %: FAIR
    expect(await latestOf(t.id)).toMatchObject({ inspectionId: first.id, rankTable: 2 });
    await testDb().update(inspections).set({ status: "countersigned", countersignedAt: new Date("2026-02-03T10:00:00Z") }).where(eq(inspections.id, revised.id));
    expect(await latestOf(t.id)).toMatchObject({ inspectionId: revised.id, revision: 2, rankTable: 1 });
    await testDb().update(inspections).set({ status: "superseded" }).where(eq(inspections.id, revised.id));
    expect(await latestOf(t.id)).toMatchObject({ inspectionId: first.id, revision: 1, rankTable: 2 });
  });

  it("falls back to the earlier report when the latest is deleted, and removes the row with the last one", async () => {
    const t = await newTank();
    const older = await inspection(t.id, "2025-06-01", "countersigned");
    const newer = await inspection(t.id, "2026-06-01", "countersigned");
    expect((await latestOf(t.id))?.inspectionId).toBe(newer.id);
    await testDb().delete(inspections).where(eq(inspections.id, newer.id));
    expect((await latestOf(t.id))?.inspectionId).toBe(older.id);
    await testDb().delete(inspections).where(eq(inspections.id, older.id));
    expect(await latestOf(t.id)).toBeNull();
  });
});
