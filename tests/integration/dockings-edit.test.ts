// Changing a docking's details (yard, place, planned date, currency, unit
// rates) while it is planned or in progress, and the totals of the list of a
// vessel's dockings. Expected totals are worked by hand below.
import { randomUUID } from "node:crypto";
import { and, asc, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { auditLog, dockings, findings, inspections } from "@/db/schema";
import { fillInspection } from "@/db/seed/complete-inspection";
import { repairQuantities } from "@/lib/inspection/quantities";
import { signIn, type TClient } from "../fixtures/http";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

let s: TScenario;
let superintendent: TClient;
let admin: TClient;
let officer: TClient;
let otherAdmin: TClient;
/** Planned, then edited, then started and edited again. */
let editedId = "";
/** Completed: its details are final. */
let completedId = "";

// The fixture of tests/integration/dockings.test.ts: the own vessel's tank gathers
//   steel 117.75 kg (finding 3 insert 1000 × 1500 × 10 mm: 1.0 × 1.5 × 0.010 m³ × 7850 kg/m³),
//   coating 2.5 + 1.2 + 1.5 = 5.2 m², anodes 1 piece, sediment 50 mm × 20 m² = 1.0 m³: six items.
// At the rates it is planned with (USD), as worked there:
//   494.55 + 184.60 + 180.00 + 95.00 = 954.15
const DOCKING = { yard: "Test Yard Shipbuilding", place: "Test Harbour, Berth 3", plannedOn: "2027-04-12", currency: "USD", steelRatePerKg: 4.2, coatingRatePerM2: 35.5, anodeRatePerPiece: 180, sedimentRatePerM3: 95 };
// The yard's new quotation, in EUR (the place, the date, the currency and every rate change; the yard stays):
//   steel    117.75 kg × 5.10 = 600.525 → 600.53
//   coating  5.2 m² × 42.25 = 219.70
//   anodes   1 × 210.00 = 210.00
//   sediment 1.0 m³ × 110.00 = 110.00
//   grand total 600.525 + 219.70 + 210.00 + 110.00 = 1 140.225 → 1 140.23 (rounded once, half away from zero)
const EDITED = { ...DOCKING, place: "Test Harbour, Berth 7", plannedOn: "2027-05-03", currency: "EUR", steelRatePerKg: 5.1, coatingRatePerM2: 42.25, anodeRatePerPiece: 210, sedimentRatePerM3: 110 };
// Once in progress, sediment at 120.00: 1.0 m³ × 120.00 = 120.00; grand total 600.525 + 219.70 + 210.00 + 120.00 = 1 150.225 → 1 150.23
const IN_PROGRESS = { ...EDITED, sedimentRatePerM3: 120 };

const insert = { kind: "insert_plate" as const, lengthMm: 1000, widthMm: 1500, thicknessMm: 10, pieces: 1 };

type TBody = {
  docking: { id: string; status: string; place: string; plannedOn: string; currency: string; steelRatePerKg: number };
  workList: { currency: string; minorUnits: number; items: { kind: string; cost: number }[]; totals: Record<string, { quantity: number | null; cost: number }>; grandTotal: number };
  paging: { page: number; pageSize: number; matching: number };
};
type TError = { error: { code: string; message: string; issues: { path: string; message: string }[] } };

async function ok(res: Response) {
  expect(res.status, await res.clone().text()).toBe(200);
  return (await res.json()) as TBody;
}
const put = (client: TClient, dockingId: string, json: unknown, query = "") => client.request(`/api/v1/dockings/${dockingId}${query}`, { method: "PUT", json });
const rowOf = async (dockingId: string) => (await testDb().select().from(dockings).where(eq(dockings.id, dockingId)))[0]!;
const updatesOf = (dockingId: string) =>
  testDb().select().from(auditLog).where(and(eq(auditLog.entityId, dockingId), eq(auditLog.action, "docking.update"))).orderBy(asc(auditLog.id));

async function createDocking(body: typeof DOCKING) {
  const res = await superintendent.request(`/api/v1/vessels/${s.ownVessel.id}/dockings`, { method: "POST", json: body });
  expect(res.status, await res.clone().text()).toBe(201);
  return ((await res.json()) as { docking: { id: string } }).docking.id;
}

beforeAll(async () => {
  s = await buildScenario();
  const db = testDb();
  const tank = s.tankOf(s.ownVessel.id);
  const inspectionId = s.inspectionOf(s.ownVessel.id);
  await fillInspection(db, { orgId: s.org.id, inspectionId, frameFrom: tank.frameFrom, testedAt: new Date("2026-11-20T08:00:00Z"), measuredBy: "Test officer", standbyPerson: "Test bosun" });
  await db.insert(findings).values({
    id: randomUUID(), orgId: s.org.id, inspectionId, number: 3, type: "pitting", frameFrom: 90, frameTo: 91, memberKind: "plating", platingRegion: "bottom_shell", lengthMm: 1000, widthMm: 1500, pitDepthMm: 4,
    description: "Pitting over 1.0 × 1.5 m of bottom shell plating, up to 4 mm deep", repairKind: "insert_plate", repair: insert, ...repairQuantities(insert),
  });
  await db.update(inspections).set({ status: "countersigned", countersignedAt: new Date("2026-11-21T10:00:00Z"), lockedAt: new Date("2026-11-21T10:00:00Z") }).where(eq(inspections.id, inspectionId));
  [superintendent, admin, officer, otherAdmin] = await Promise.all([
    signIn(s.users.superintendent.email, PASSWORD),
    signIn(s.users.admin.email, PASSWORD),
    signIn(s.users.officer.email, PASSWORD),
    signIn(s.otherAdmin.email, PASSWORD),
  ]);
  editedId = await createDocking(DOCKING);
  completedId = await createDocking({ ...DOCKING, plannedOn: "2027-01-10" });
  const completed = await superintendent.request(`/api/v1/dockings/${completedId}/status`, { method: "PUT", json: { status: "completed" } });
  expect(completed.status, await completed.clone().text()).toBe(200);
});

describe("changing a docking's details", () => {
  it("starts at the rates it was planned with (worked by hand above)", async () => {
    const b = await ok(await superintendent.request(`/api/v1/dockings/${editedId}`));
    expect(b.workList.grandTotal).toBe(954.15);
  });

  it("saves the new details and answers like GET, the totals priced at the new rates and currency", async () => {
    const b = await ok(await put(superintendent, editedId, EDITED, "?pageSize=2&page=1"));
    expect(b.docking).toMatchObject({ place: EDITED.place, plannedOn: "2027-05-03", currency: "EUR", steelRatePerKg: 5.1 });
    expect(b.workList).toMatchObject({ currency: "EUR", minorUnits: 2, grandTotal: 1140.23 });
    expect(b.workList.totals.steel).toMatchObject({ quantity: 117.75, cost: 600.53 });
    expect(b.workList.totals.coating!.cost).toBe(219.7);
    expect(b.workList.totals.anodes!.cost).toBe(210);
    expect(b.workList.totals.sediment!.cost).toBe(110);
    // The page asked for: two of the six items, priced one by one at the new rates (steel first, then coating).
    expect(b.paging).toMatchObject({ page: 1, pageSize: 2, matching: 6 });
    expect(b.workList.items.map((i) => [i.kind, i.cost])).toEqual([["steel", 600.53], ["coating", expect.any(Number)]]);
    const row = await rowOf(editedId);
    expect(row).toMatchObject({ yard: DOCKING.yard, place: EDITED.place, plannedOn: "2027-05-03", currency: "EUR", steelRatePerKg: 5.1, coatingRatePerM2: 42.25, anodeRatePerPiece: 210, sedimentRatePerM3: 110 });
    const [audit, ...more] = await updatesOf(editedId);
    expect(more).toEqual([]);
    // Only the changed fields, before and after: the yard did not change.
    expect(audit!.actorUserId).toBe(s.users.superintendent.id);
    expect(audit!.detail).toEqual({
      before: { place: DOCKING.place, plannedOn: "2027-04-12", currency: "USD", steelRatePerKg: 4.2, coatingRatePerM2: 35.5, anodeRatePerPiece: 180, sedimentRatePerM3: 95 },
      after: { place: EDITED.place, plannedOn: "2027-05-03", currency: "EUR", steelRatePerKg: 5.1, coatingRatePerM2: 42.25, anodeRatePerPiece: 210, sedimentRatePerM3: 110 },
    });
  });

  it("writes nothing when nothing changes", async () => {
    const before = await rowOf(editedId);
    const b = await ok(await put(admin, editedId, EDITED));
    expect(b.workList.grandTotal).toBe(1140.23);
    expect((await rowOf(editedId)).updatedAt).toEqual(before.updatedAt);
    expect(await updatesOf(editedId)).toHaveLength(1);
  });

  it("is allowed while the docking is in progress", async () => {
    await ok(await superintendent.request(`/api/v1/dockings/${editedId}/status`, { method: "PUT", json: { status: "in_progress" } }));
    const b = await ok(await put(admin, editedId, IN_PROGRESS));
    expect(b.docking.status).toBe("in_progress");
    expect(b.workList.totals.sediment!.cost).toBe(120);
    expect(b.workList.grandTotal).toBe(1150.23); // worked by hand at the top of this file
    const updates = await updatesOf(editedId);
    expect(updates.at(-1)!.detail).toEqual({ before: { sedimentRatePerM3: 110 }, after: { sedimentRatePerM3: 120 } });
  });
});

describe("a refused change changes nothing", () => {
  const refusals: { name: string; client: () => TClient; dockingId: () => string; body: unknown; status: number; check: (e: TError) => void }[] = [
    {
      name: "a negative rate",
      client: () => superintendent, dockingId: () => editedId, body: { ...IN_PROGRESS, coatingRatePerM2: -1 }, status: 400,
      check: (e) => expect(e.error.issues).toEqual([expect.objectContaining({ path: "coatingRatePerM2", message: "cannot be negative" })]),
    },
    {
      name: "a currency that is not ISO 4217",
      client: () => superintendent, dockingId: () => editedId, body: { ...IN_PROGRESS, currency: "EUX" }, status: 400,
      check: (e) => expect(e.error.issues).toEqual([expect.objectContaining({ path: "currency", message: "must be an ISO 4217 currency code such as USD or EUR" })]),
    },
    {
      name: "a completed docking (409)",
      client: () => superintendent, dockingId: () => completedId, body: EDITED, status: 409,
      check: (e) => expect(e.error).toMatchObject({ code: "conflict", message: "This docking is completed: its details can no longer be changed." }),
    },
    { name: "an officer (403)", client: () => officer, dockingId: () => editedId, body: EDITED, status: 403, check: (e) => expect(e.error.code).toBe("forbidden") },
    { name: "another company's admin (404)", client: () => otherAdmin, dockingId: () => editedId, body: EDITED, status: 404, check: (e) => expect(e.error).toMatchObject({ code: "not_found", message: "No such docking." }) },
  ];

  for (const r of refusals) {
    it(`refuses ${r.name}`, async () => {
      const id = r.dockingId();
      const [before, audits] = await Promise.all([rowOf(id), updatesOf(id)]);
      const res = await put(r.client(), id, r.body);
      expect(res.status, await res.clone().text()).toBe(r.status);
      r.check((await res.json()) as TError);
      expect(await rowOf(id)).toEqual(before);
      expect(await updatesOf(id)).toHaveLength(audits.length);
    });
  }
});

describe("the list of a vessel's dockings", () => {
  it("carries each docking's grand total in its currency and its item counts, from the database's sums", async () => {
    const res = await superintendent.request(`/api/v1/vessels/${s.ownVessel.id}/dockings`);
    expect(res.status).toBe(200);
    const list = (await res.json()) as { dockings: { id: string; currency: string; status: string; minorUnits: number; grandTotal: number; counts: unknown }[] };
    // Latest planned first: the edited one (2027-05-03, EUR, 1 150.23 as worked above), then the completed one (2027-01-10, USD, 954.15).
    expect(list.dockings.map((d) => [d.id, d.status, d.currency, d.minorUnits, d.grandTotal, d.counts])).toEqual([
      [editedId, "in_progress", "EUR", 2, 1150.23, { included: 6, excluded: 0, adjusted: 0 }],
      [completedId, "completed", "USD", 2, 954.15, { included: 6, excluded: 0, adjusted: 0 }],
    ]);
  });

  it("counts excluded and adjusted items, and leaves excluded ones out of the total", async () => {
    const page = await ok(await superintendent.request(`/api/v1/dockings/${editedId}`));
    const anodes = (page.workList.items as unknown as { id: string; kind: string }[]).find((i) => i.kind === "anodes")!;
    const decided = await superintendent.request(`/api/v1/dockings/${editedId}/items`, { method: "PUT", json: { items: [{ id: anodes.id, included: false, adjustmentReason: "Anodes renewed by the crew at sea" }] } });
    expect(decided.status, await decided.clone().text()).toBe(200);
    const list = (await (await admin.request(`/api/v1/vessels/${s.ownVessel.id}/dockings`)).json()) as { dockings: { id: string; grandTotal: number; counts: unknown }[] };
    // Without the anode: 1 150.225 − 210.00 = 940.225 → 940.23
    expect(list.dockings.find((d) => d.id === editedId)).toMatchObject({ grandTotal: 940.23, counts: { included: 5, excluded: 1, adjusted: 0 } });
  });
});
