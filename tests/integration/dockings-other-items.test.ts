// Work the superintendent adds by hand to a docking's work list ("other":
// staging, attendance, lump sums), priced at its own rate; and the plan-a-docking
// form that starts from the company's most recent rates. Expected totals are
// worked by hand below.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { auditLog, dockingItems, dockings, inspections } from "@/db/schema";
import { fillInspection } from "@/db/seed/complete-inspection";
import { signIn, type TClient } from "../fixtures/http";
import { pdfText } from "../fixtures/pdf";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

let s: TScenario;
let superintendent: TClient;
let officer: TClient;
let otherAdmin: TClient;
let dockingId = "";

// Rates of the test docking (USD). The gathered list (fillInspection's report of the own vessel's tank):
//   coating  2.5 + 1.2 = 3.7 m² × 35.50 = 131.35
//   anodes   1 piece × 180.00 = 180.00
//   sediment 50 mm × 20 m² = 1.0 m³ × 95.00 = 95.00
//   no steel; gathered total 131.35 + 180.00 + 95.00 = 406.35
const RATES = { currency: "USD", steelRatePerKg: 4.2, coatingRatePerM2: 35.5, anodeRatePerPiece: 180, sedimentRatePerM3: 95 };
const DOCKING = { yard: "Hand Work Test Yard", place: "Test Harbour", plannedOn: "2027-04-12", ...RATES };
// Added by hand:
//   staging  3 days × 1 212.345 = 3 637.035 → 3 637.04 on its line
//   surveyor 1 lump sum × 850.00 = 850.00
const STAGING = { description: "Staging in No. 1 WBT P for the coating repair", quantity: 3, unit: "days", unitRate: 1212.345, reason: "Coating repair at Fr. 82–89 is out of reach" };
const SURVEYOR = { description: "Surveyor's attendance for the intermediate survey", quantity: 1, unit: "lump sum", unitRate: 850, reason: "Class attends the tank survey in dock" };

type TItem = { id: string; kind: string; description: string; tankCode: string | null; quantity: number; unitRate: number; cost: number; included: boolean; adjustedQuantity: number | null; addedReason: string | null; addedByName: string | null; doneAt: string | null };
type TBody = {
  itemId?: string;
  docking: { id: string; status: string };
  workList: { items: TItem[]; totals: Record<string, { quantity: number | null; cost: number; included: number; excluded: number }>; grandTotal: number; counts: { included: number; excluded: number } };
  paging: { page: number; pageSize: number; matching: number; totalPages: number };
};
type TError = { error: { code: string; message: string; issues: { path: string; message: string }[] } };

const url = (path = "") => `/api/v1/dockings/${dockingId}${path}`;
const read = async (q = "") => (await (await superintendent.request(url(q))).json()) as TBody;
const add = (json: unknown, c = superintendent, q = "") => c.request(url(`/items${q}`), { method: "POST", json });
const remove = (itemId: string, c = superintendent) => c.request(url(`/items/${itemId}`), { method: "DELETE" });
const otherRows = async () => testDb().select().from(dockingItems).where(and(eq(dockingItems.dockingId, dockingId), eq(dockingItems.kind, "other")));
const auditCount = (action: string) => testDb().$count(auditLog, and(eq(auditLog.orgId, s.org.id), eq(auditLog.action, action)));
const itemNamed = (b: TBody, start: string) => b.workList.items.find((i) => i.description.startsWith(start))!;

beforeAll(async () => {
  s = await buildScenario();
  const inspectionId = s.inspectionOf(s.ownVessel.id);
  await fillInspection(testDb(), { orgId: s.org.id, inspectionId, frameFrom: s.tankOf(s.ownVessel.id).frameFrom, testedAt: new Date("2026-11-20T08:00:00Z"), measuredBy: "Test officer", standbyPerson: "Test bosun" });
  await testDb().update(inspections).set({ status: "countersigned", countersignedAt: new Date("2026-11-21T10:00:00Z"), lockedAt: new Date("2026-11-21T10:00:00Z") }).where(eq(inspections.id, inspectionId));
  [superintendent, officer, otherAdmin] = await Promise.all([signIn(s.users.superintendent.email, PASSWORD), signIn(s.users.officer.email, PASSWORD), signIn(s.otherAdmin.email, PASSWORD)]);
});

describe("the plan-a-docking form starts from the company's most recent rates", () => {
  const formPage = async () => {
    const res = await superintendent.request(`/vessels/${s.siblingVessel.id}/dockings/new`);
    expect(res.status).toBe(200);
    return res.text();
  };

  it("starts empty when the company has no docking yet", async () => {
    const html = await formPage();
    expect(html).toContain("No earlier docking in the company");
    expect(html).not.toContain("Currency and rates from the docking at");
  });

  it("starts from the latest planned docking of any vessel, not a cancelled one, and says which", async () => {
    const res = await superintendent.request(`/api/v1/vessels/${s.ownVessel.id}/dockings`, { method: "POST", json: DOCKING });
    expect(res.status, await res.clone().text()).toBe(201);
    dockingId = ((await res.json()) as { docking: { id: string } }).docking.id;
    // An older docking and a later, cancelled one: neither is where the rates come from.
    await testDb().insert(dockings).values([
      { orgId: s.org.id, vesselId: s.siblingVessel.id, yard: "Older Yard", place: "Old port", plannedOn: "2025-01-10", currency: "EUR", steelRatePerKg: 1, coatingRatePerM2: 1, anodeRatePerPiece: 1, sedimentRatePerM3: 1 },
      { orgId: s.org.id, vesselId: s.siblingVessel.id, yard: "Cancelled Yard", place: "Far port", plannedOn: "2028-06-01", currency: "SGD", steelRatePerKg: 9, coatingRatePerM2: 9, anodeRatePerPiece: 9, sedimentRatePerM3: 9, status: "cancelled" },
    ]);
    const html = (await formPage()).replaceAll("<!-- -->", "");
    expect(html).toContain(`Currency and rates from the docking at Hand Work Test Yard, 2027-04-12 (${s.ownVessel.name})`);
    // The boxes hold the rates of that docking (the page's first HTML, before the browser takes over).
    for (const value of ['value="USD"', 'value="4.2"', 'value="35.5"', 'value="180"', 'value="95"']) expect(html).toContain(value);
    expect(html).not.toContain('value="SGD"');
  });
});

describe("adding work by hand", () => {
  it("adds an item at its own rate (201), audit-logged, and prices the totals again", async () => {
    const tank = s.tankOf(s.ownVessel.id);
    const res = await add({ ...STAGING, tankId: tank.id }, superintendent, "?pageSize=2");
    expect(res.status, await res.clone().text()).toBe(201);
    const b = (await res.json()) as TBody;
    expect(b.paging).toMatchObject({ page: 1, pageSize: 2, matching: 5, totalPages: 3 }); // 4 gathered items + 1 added, 2 a page
    expect(b.docking.id).toBe(dockingId);
    // other: 3 days × 1 212.345 = 3 637.035 → 3 637.04; grand total 406.35 + 3 637.035 = 4 043.385 → 4 043.39
    expect(b.workList.totals.other).toEqual({ quantity: null, cost: 3637.04, included: 1, excluded: 0 });
    expect(b.workList.totals.coating).toMatchObject({ cost: 131.35, included: 2 });
    expect(b.workList.grandTotal).toBe(4043.39);
    const [row] = await otherRows();
    expect(row).toMatchObject({ id: b.itemId, tankId: tank.id, findingId: null, quantity: 3, unit: "days", unitRate: 1212.345, addedReason: STAGING.reason, addedBy: s.users.superintendent.id, included: true });
    const [log] = await testDb().select().from(auditLog).where(and(eq(auditLog.orgId, s.org.id), eq(auditLog.action, "docking_item.add")));
    expect(log).toMatchObject({ entityId: b.itemId, actorUserId: s.users.superintendent.id });
    expect(log!.detail).toMatchObject({ dockingId, description: STAGING.description, unitRate: 1212.345, reason: STAGING.reason });
  });

  it.each([
    ["a negative rate", { ...SURVEYOR, unitRate: -1 }, "unitRate"],
    ["a rate that is not a number", { ...SURVEYOR, unitRate: "NaN" }, "unitRate"],
    ["a negative quantity", { ...SURVEYOR, quantity: -2 }, "quantity"],
    ["no reason", { ...SURVEYOR, reason: undefined }, "reason"],
    ["a description that only says 'other work'", { ...SURVEYOR, description: "Misc works" }, "description"],
    ["no unit", { ...SURVEYOR, unit: " " }, "unit"],
    ["a tank id that is not an id", { ...SURVEYOR, tankId: "No. 1 WBT P" }, "tankId"],
  ])("refuses %s (400, naming the field) and changes nothing", async (_what, json, field) => {
    const res = await add(json);
    expect(res.status).toBe(400);
    expect(((await res.json()) as TError).error.issues.map((i) => i.path)).toEqual([field]);
    expect(await otherRows()).toHaveLength(1);
    expect(await auditCount("docking_item.add")).toBe(1);
  });

  it("refuses a tank of another vessel, of the company or not (400 with a message), and changes nothing", async () => {
    for (const vessel of [s.siblingVessel, s.otherVessel]) {
      const res = await add({ ...SURVEYOR, tankId: s.tankOf(vessel.id).id });
      expect(res.status).toBe(400);
      const e = (await res.json()) as TError;
      expect(e.error.message).toMatch(/^That tank is not a tank of this docking's vessel; nothing was added/);
      expect(e.error.issues).toEqual([{ path: "tankId", message: "must be a tank of the docking's vessel" }]);
    }
    expect(await otherRows()).toHaveLength(1);
    expect((await read()).workList.grandTotal).toBe(4043.39);
  });

  it("adds work of no tank; it is listed after the tanks' items", async () => {
    const res = await add(SURVEYOR);
    expect(res.status).toBe(201);
    const b = (await res.json()) as TBody;
    expect(b.workList.items.at(-1)).toMatchObject({ description: SURVEYOR.description, tankCode: null, unitRate: 850, cost: 850, addedReason: SURVEYOR.reason, addedByName: "Test superintendent" });
    // other: 3 637.035 + 850.00 = 4 487.035 → 4 487.04; grand total 406.35 + 4 487.035 = 4 893.385 → 4 893.39
    expect(b.workList.totals.other).toEqual({ quantity: null, cost: 4487.04, included: 2, excluded: 0 });
    expect(b.workList.grandTotal).toBe(4893.39);
  });

  it("refuses the vessel's officer (403) and another company (404), and changes nothing", async () => {
    expect((await add(SURVEYOR, officer)).status).toBe(403);
    const foreign = await add(SURVEYOR, otherAdmin);
    expect(foreign.status).toBe(404);
    expect(await foreign.text()).not.toContain(s.ownVessel.name);
    expect(await otherRows()).toHaveLength(2);
  });
});

describe("deciding on, gathering again and removing", () => {
  it("excludes and adjusts an item added by hand like any other, with a reason", async () => {
    const staging = itemNamed(await read(), "Staging");
    const excluded = await superintendent.request(url("/items"), { method: "PUT", json: { items: [{ id: staging.id, included: false, adjustmentReason: "Crew rigs the staging" }] } });
    const e = (await excluded.json()) as TBody;
    // other: surveyor 850.00 only; grand total 406.35 + 850.00 = 1 256.35
    expect(e.workList.totals.other).toEqual({ quantity: null, cost: 850, included: 1, excluded: 1 });
    expect(e.workList.grandTotal).toBe(1256.35);
    const adjusted = await superintendent.request(url("/items"), { method: "PUT", json: { items: [{ id: staging.id, included: true, adjustedQuantity: 2, adjustmentReason: "Yard quotes two days" }] } });
    const a = (await adjusted.json()) as TBody;
    // staging 2 days × 1 212.345 = 2 424.69; other 2 424.69 + 850.00 = 3 274.69; grand total 406.35 + 3 274.69 = 3 681.04
    expect(itemNamed(a, "Staging")).toMatchObject({ quantity: 3, adjustedQuantity: 2, cost: 2424.69 });
    expect(a.workList.totals.other).toEqual({ quantity: null, cost: 3274.69, included: 2, excluded: 0 });
    expect(a.workList.grandTotal).toBe(3681.04);
  });

  it("keeps the items added by hand, and their decisions, when the list is gathered again", async () => {
    const res = await superintendent.request(url("/rebuild"), { method: "POST" });
    expect(res.status).toBe(200);
    const b = (await res.json()) as TBody & { changes: { added: number; updated: number; removed: number } };
    expect(b.changes).toEqual({ added: 0, updated: 0, removed: 0 });
    expect(b.workList.items.filter((i) => i.kind === "other").map((i) => [i.description, i.adjustedQuantity])).toEqual([[STAGING.description, 2], [SURVEYOR.description, null]]);
    expect(b.workList.grandTotal).toBe(3681.04); // as worked above
    expect(await otherRows()).toHaveLength(2);
  });

  it("refuses to remove a gathered item (409: exclude it instead) or an unknown one (404), and changes nothing", async () => {
    const before = await read();
    const anodes = before.workList.items.find((i) => i.kind === "anodes")!;
    const res = await remove(anodes.id);
    expect(res.status).toBe(409);
    const e = (await res.json()) as TError;
    expect(e.error.message).toMatch(/gathered from a countersigned report and cannot be removed; exclude it instead, with a reason/);
    expect((await remove(randomUUID())).status).toBe(404);
    expect((await remove("not-an-id")).status).toBe(404);
    expect((await remove(itemNamed(before, "Staging").id, officer)).status).toBe(403);
    expect((await remove(itemNamed(before, "Staging").id, otherAdmin)).status).toBe(404);
    expect((await read()).workList.items).toHaveLength(6);
    expect(await auditCount("docking_item.remove")).toBe(0);
  });

  it("exports the items added by hand and their total in the CSV and the PDF", async () => {
    const csv = (await (await superintendent.request(url("/work-list.csv"))).text()).split("\r\n");
    expect(csv).toContain(`No. 1 WBT P,Other work (added by hand),${STAGING.description},yes,3,2,2,days,1212.345,USD,2424.69,Added: ${STAGING.reason}; Yard quotes two days`);
    expect(csv).toContain(`,Other work (added by hand),Surveyor's attendance for the intermediate survey,yes,1,,1,lump sum,850,USD,850.00,Added: ${SURVEYOR.reason}`);
    expect(csv).toContain('Total,Other work (added by hand),"2 included, 0 excluded",,,,,,,USD,3274.69,');
    expect(csv.at(-2)).toMatch(/^Grand total,,".*",,,,,,,USD,3681\.04,$/);
    const pdf = await pdfText(new Uint8Array(await (await superintendent.request(url("/work-list.pdf"))).arrayBuffer()));
    expect(pdf).toContain(`Added by hand by Test superintendent: ${SURVEYOR.reason}`);
    expect(pdf).toMatch(/Other work \(added by hand\): 2 included, 0 excluded — 3274\.69 USD/);
    expect(pdf).toMatch(/Grand total 3681\.04 USD/);
  }, 60_000);

  it("removes an item added by hand, audit-logged with what it was", async () => {
    const surveyor = itemNamed(await read(), "Surveyor");
    const res = await remove(surveyor.id);
    expect(res.status).toBe(200);
    const b = (await res.json()) as TBody;
    // other: staging 2 424.69 only; grand total 406.35 + 2 424.69 = 2 831.04
    expect(b.workList.totals.other).toEqual({ quantity: null, cost: 2424.69, included: 1, excluded: 0 });
    expect(b.workList.grandTotal).toBe(2831.04);
    const [log] = await testDb().select().from(auditLog).where(and(eq(auditLog.orgId, s.org.id), eq(auditLog.action, "docking_item.remove")));
    expect(log).toMatchObject({ entityId: surveyor.id });
    expect(log!.detail).toMatchObject({ description: SURVEYOR.description, unitRate: 850, reason: SURVEYOR.reason });
    expect((await remove(surveyor.id)).status).toBe(404);
  });
});

describe("during and after the docking", () => {
  it("marks an item added by hand done; it closes no finding", async () => {
    expect((await superintendent.request(url("/status"), { method: "PUT", json: { status: "in_progress" } })).status).toBe(200);
    const staging = itemNamed(await read(), "Staging");
    const res = await superintendent.request(url("/done"), { method: "PUT", json: { itemIds: [staging.id], done: true } });
    expect(res.status).toBe(200);
    const b = (await res.json()) as TBody & { closedFindings: string[] };
    expect(b.closedFindings).toEqual([]);
    expect(itemNamed(b, "Staging").doneAt).not.toBeNull();
    expect(await auditCount("finding.close")).toBe(0);
  });

  it("refuses adding, removing and deciding once the docking is completed (409), and changes nothing", async () => {
    expect((await superintendent.request(url("/status"), { method: "PUT", json: { status: "completed" } })).status).toBe(200);
    const staging = itemNamed(await read(), "Staging");
    for (const res of [
      await add(SURVEYOR),
      await remove(staging.id),
      await superintendent.request(url("/items"), { method: "PUT", json: { items: [{ id: staging.id, included: false, adjustmentReason: "Too late" }] } }),
    ]) {
      expect(res.status).toBe(409);
      expect(((await res.json()) as TError).error.message).toBe("This docking is completed: its work list can no longer be changed.");
    }
    expect(await otherRows()).toHaveLength(1);
    expect((await read()).workList.grandTotal).toBe(2831.04); // as worked above
  });
});
