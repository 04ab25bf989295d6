// Dockings and their work lists: created by the office, gathered from each
// tank's latest countersigned report, priced at the docking's rates, adjusted
// with reasons, exported as CSV. Expected totals are worked by hand below.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { auditLog, dockingItems, dockings, findings, inspections } from "@/db/schema";
import { fillInspection } from "@/db/seed/complete-inspection";
import { repairQuantities } from "@/lib/inspection/quantities";
import { signIn, type TClient } from "../fixtures/http";
import { pdfText } from "../fixtures/pdf";
import { pdfItems } from "../fixtures/pdf-items";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

let s: TScenario;
let superintendent: TClient;
let admin: TClient;
let officer: TClient;
let master: TClient;
let otherAdmin: TClient;
let dockingId = "";

// Rates of the test docking (USD). Hand-worked work list of the own vessel's tank:
//   steel    finding 3 insert 1000 × 1500 × 10 mm, 1 piece: 1.0 × 1.5 × 0.010 m³ × 7850 kg/m³ = 117.75 kg × 4.20 = 494.55
//   coating  finding 1 2.5 m² × 35.50 = 88.75; finding 2 1.2 m² × 35.50 = 42.60; finding 3 1.5 m² × 35.50 = 53.25 → 5.2 m², 184.60
//   anodes   1 piece to renew × 180.00 = 180.00
//   sediment 50 mm × 20 m² = 1.0 m³ × 95.00 = 95.00
//   grand total 494.55 + 184.60 + 180.00 + 95.00 = 954.15
const RATES = { currency: "USD", steelRatePerKg: 4.2, coatingRatePerM2: 35.5, anodeRatePerPiece: 180, sedimentRatePerM3: 95 };
const DOCKING = { yard: "Test Yard Shipbuilding", place: "Test Harbour, Berth 3", plannedOn: "2027-04-12", ...RATES };

const insert = { kind: "insert_plate" as const, lengthMm: 1000, widthMm: 1500, thicknessMm: 10, pieces: 1 };
const monitor = { kind: "monitor_only" as const };

type TBody = {
  docking: { id: string; status: string };
  workList: {
    currency: string;
    items: { id: string; kind: string; description: string; quantity: number; quantityPriced: number; cost: number; included: boolean; adjustedQuantity: number | null; adjustmentReason: string | null }[];
    totals: Record<string, { quantity: number; cost: number; included: number; excluded: number }>;
    grandTotal: number;
  };
  unpriced: { description: string }[];
};

async function body(res: Response) {
  expect(res.status, await res.clone().text()).toBe(200);
  return (await res.json()) as TBody;
}
const dockingCount = async (vesselId: string) => testDb().$count(dockings, eq(dockings.vesselId, vesselId));

beforeAll(async () => {
  s = await buildScenario();
  const db = testDb();
  const tank = s.tankOf(s.ownVessel.id);
  const inspectionId = s.inspectionOf(s.ownVessel.id);
  // An older countersigned report of the same tank: its finding must not be gathered.
  const [old] = await db.insert(inspections).values({ orgId: s.org.id, vesselId: s.ownVessel.id, tankId: tank.id, inspectedOn: "2025-05-02", placeKind: "port", place: "Old port", status: "countersigned", countersignedAt: new Date("2025-05-03T10:00:00Z") }).returning();
  await db.insert(findings).values({
    id: randomUUID(), orgId: s.org.id, inspectionId: old!.id, number: 1, type: "pitting", frameFrom: 84, frameTo: 85, memberKind: "plating", platingRegion: "inner_bottom", lengthMm: 800, widthMm: 800,
    description: "Old pitting 800 × 800 mm, superseded by the later report", repairKind: "insert_plate", repair: { ...insert, pieces: 4 }, ...repairQuantities({ ...insert, pieces: 4 }),
  });
  await fillInspection(db, { orgId: s.org.id, inspectionId, frameFrom: tank.frameFrom, testedAt: new Date("2026-11-20T08:00:00Z"), measuredBy: "Test officer", standbyPerson: "Test bosun" });
  await db.insert(findings).values([
    {
      id: randomUUID(), orgId: s.org.id, inspectionId, number: 3, type: "pitting", frameFrom: 90, frameTo: 91, memberKind: "plating", platingRegion: "bottom_shell", lengthMm: 1000, widthMm: 1500, pitDepthMm: 4,
      description: "Pitting over 1.0 × 1.5 m of bottom shell plating, up to 4 mm deep", repairKind: "insert_plate", repair: insert, ...repairQuantities(insert),
    },
    {
      id: randomUUID(), orgId: s.org.id, inspectionId, number: 4, type: "crack", frameFrom: 95, frameTo: 95, memberKind: "plating", platingRegion: "inner_bottom", lengthMm: 30,
      description: "Hairline crack 30 mm at the toe of the manhole coaming, to be watched", repairKind: "monitor_only", repair: monitor, ...repairQuantities(monitor),
    },
  ]);
  await db.update(inspections).set({ status: "countersigned", countersignedAt: new Date("2026-11-21T10:00:00Z"), lockedAt: new Date("2026-11-21T10:00:00Z") }).where(eq(inspections.id, inspectionId));
  [superintendent, admin, officer, master, otherAdmin] = await Promise.all([
    signIn(s.users.superintendent.email, PASSWORD),
    signIn(s.users.admin.email, PASSWORD),
    signIn(s.users.officer.email, PASSWORD),
    signIn(s.users.master.email, PASSWORD),
    signIn(s.otherAdmin.email, PASSWORD),
  ]);
});

describe("planning a docking", () => {
  it("creates the docking and gathers the work of the latest countersigned report", async () => {
    const res = await superintendent.request(`/api/v1/vessels/${s.ownVessel.id}/dockings`, { method: "POST", json: DOCKING });
    expect(res.status, await res.clone().text()).toBe(201);
    dockingId = ((await res.json()) as { docking: { id: string } }).docking.id;
    const rows = await testDb().select().from(dockingItems).where(eq(dockingItems.dockingId, dockingId));
    expect(rows.map((r) => `${r.kind} ${r.quantity}`).sort()).toEqual(["anodes 1", "coating 1.2", "coating 1.5", "coating 2.5", "sediment 1", "steel 117.75"]);
    expect(await testDb().$count(auditLog, and(eq(auditLog.entityId, dockingId), eq(auditLog.action, "docking.create")))).toBe(1);
  });

  it("lists it for the vessel", async () => {
    const res = await admin.request(`/api/v1/vessels/${s.ownVessel.id}/dockings`);
    expect(res.status).toBe(200);
    const list = (await res.json()) as { dockings: { id: string; yard: string; currency: string }[] };
    expect(list.dockings).toEqual([expect.objectContaining({ id: dockingId, yard: DOCKING.yard, currency: "USD" })]);
  });

  it("prices the work list: per item, per kind and in total (worked by hand above)", async () => {
    const b = await body(await superintendent.request(`/api/v1/dockings/${dockingId}`));
    expect(b.workList.currency).toBe("USD");
    expect(b.workList.items.map((i) => [i.kind, i.cost]).sort()).toEqual([["anodes", 180], ["coating", 42.6], ["coating", 53.25], ["coating", 88.75], ["sediment", 95], ["steel", 494.55]].sort());
    expect(b.workList.totals.steel).toMatchObject({ cost: 494.55, included: 1 });
    expect(b.workList.totals.coating).toMatchObject({ cost: 184.6, included: 3 });
    expect(b.workList.totals.coating!.quantity).toBeCloseTo(5.2, 9);
    expect(b.workList.totals.anodes).toMatchObject({ quantity: 1, cost: 180 });
    expect(b.workList.totals.sediment).toMatchObject({ quantity: 1, cost: 95 });
    expect(b.workList.grandTotal).toBe(954.15);
    // The monitored crack has no quantity: the yard cannot price it, and the page says so.
    expect(b.unpriced.map((u) => u.description)).toEqual([expect.stringMatching(/^Finding 4: /)]);
  });
});

describe("paging the work list", () => {
  it("returns the page asked for; the totals and counts still cover every item", async () => {
    // Six items, ordered by tank code, then kind in the list's order (steel, coating × 3, anodes, sediment): page 2 of 4 a page.
    const b = (await body(await superintendent.request(`/api/v1/dockings/${dockingId}?pageSize=4&page=2`))) as TBody & { paging: unknown };
    expect(b.workList.items.map((i) => i.kind)).toEqual(["anodes", "sediment"]);
    expect(b.paging).toEqual({ page: 2, pageSize: 4, tank: null, matching: 6, totalPages: 2 });
    expect(b.workList.grandTotal).toBe(954.15); // worked by hand at the top of this file
    expect(b.workList.totals.coating).toMatchObject({ cost: 184.6, included: 3 });
  });

  it("shows one tank's items, or none for a tank without work, with the same totals", async () => {
    const own = (await body(await superintendent.request(`/api/v1/dockings/${dockingId}?tank=${s.tankOf(s.ownVessel.id).id}`))) as TBody & { paging: { matching: number } };
    expect(own.paging.matching).toBe(6);
    const none = (await body(await superintendent.request(`/api/v1/dockings/${dockingId}?tank=${randomUUID()}`))) as TBody & { paging: { matching: number; totalPages: number } };
    expect(none.workList.items).toEqual([]);
    expect(none.paging).toMatchObject({ matching: 0, totalPages: 1 });
    expect(none.workList.grandTotal).toBe(954.15);
  });

  it("refuses a page that is not a whole number in range, and a decision sent with one changes nothing", async () => {
    for (const q of ["page=0", "pageSize=501", "page=two", "tank=7"]) {
      const res = await superintendent.request(`/api/v1/dockings/${dockingId}?${q}`);
      expect(res.status, q).toBe(400);
      const e = (await res.json()) as { error: { message: string; issues: { message: string }[] } };
      expect(e.error.message).toBe("The work-list page is not valid.");
      expect(e.error.issues[0]!.message).toMatch(/^(page|pageSize|tank) /);
    }
    const [item] = (await body(await superintendent.request(`/api/v1/dockings/${dockingId}`))).workList.items;
    const res = await superintendent.request(`/api/v1/dockings/${dockingId}/items?pageSize=0`, { method: "PUT", json: { items: [{ id: item!.id, included: false, adjustmentReason: "Crew will do it" }] } });
    expect(res.status).toBe(400);
    expect(await testDb().$count(auditLog, and(eq(auditLog.orgId, s.org.id), eq(auditLog.action, "docking_item.decide")))).toBe(0);
    expect((await body(await superintendent.request(`/api/v1/dockings/${dockingId}`))).workList.items[0]!.included).toBe(true);
  });

  it("does not tell a ship's officer whether a page is valid: the docking is the office's (403 first)", async () => {
    const res = await officer.request(`/api/v1/dockings/${dockingId}?page=0`);
    expect(res.status).toBe(403);
    const write = await officer.request(`/api/v1/dockings/${dockingId}/rebuild?page=0`, { method: "POST" });
    expect(write.status).toBe(403);
  });
});

describe("deciding on items", () => {
  const itemOf = async (kind: string, quantity: number) => (await body(await superintendent.request(`/api/v1/dockings/${dockingId}`))).workList.items.find((i) => i.kind === kind && i.quantity === quantity)!;

  it("refuses an exclusion or an adjustment without a reason, and changes nothing", async () => {
    const coating = await itemOf("coating", 1.2);
    const refusals: [object, string][] = [
      [{ included: false }, "Reason is required: say why the item is excluded."],
      [{ included: true, adjustedQuantity: 3 }, "Reason is required: say why the quantity was changed."],
    ];
    for (const [decision, message] of refusals) {
      const res = await superintendent.request(`/api/v1/dockings/${dockingId}/items`, { method: "PUT", json: { items: [{ id: coating.id, ...decision }] } });
      expect(res.status).toBe(400);
      const e = (await res.json()) as { error: { message: string; issues: { path: string }[] } };
      expect(e.error.issues.map((i) => i.path)).toEqual(["items.0.adjustmentReason"]);
      expect(e.error.message).toBe(message);
    }
    expect(await testDb().$count(auditLog, and(eq(auditLog.orgId, s.org.id), eq(auditLog.action, "docking_item.decide")))).toBe(0);
    expect((await itemOf("coating", 1.2)).included).toBe(true);
  });

  it("names each refused field in words with its own message, not the body's paths", async () => {
    const coating = await itemOf("coating", 1.2);
    const put = await superintendent.request(`/api/v1/dockings/${dockingId}/items`, { method: "PUT", json: { items: [{ id: coating.id, included: true, adjustedQuantity: -2 }] } });
    expect(put.status).toBe(400);
    const decided = (await put.json()) as { error: { message: string; issues: { path: string; message: string }[] } };
    expect(decided.error.message).toBe("Adjusted quantity cannot be negative; Reason is required: say why the quantity was changed.");
    // The paths stay in the issues, for a form to put each message beside its field.
    expect(decided.error.issues).toEqual([
      { path: "items.0.adjustedQuantity", message: "cannot be negative" },
      { path: "items.0.adjustmentReason", message: "is required: say why the quantity was changed" },
    ]);
    // Two items in one body: each message says which item.
    const sediment = await itemOf("sediment", 1);
    const two = await superintendent.request(`/api/v1/dockings/${dockingId}/items`, { method: "PUT", json: { items: [{ id: sediment.id, included: true }, { id: coating.id, included: false }] } });
    expect(((await two.json()) as { error: { message: string } }).error.message).toBe("Item 2, reason is required: say why the item is excluded.");
    const add = await superintendent.request(`/api/v1/dockings/${dockingId}/items`, { method: "POST", json: { description: "Staging", quantity: 2, unit: "days", unitRate: -5, reason: "ab" } });
    expect(add.status).toBe(400);
    expect(((await add.json()) as { error: { message: string } }).error.message).toBe(
      "Description is too short for a yard to price: say what is to be done, and where, in at least three words; Unit rate cannot be negative; Reason: say why the item is added, in a few words.",
    );
    const plan = await superintendent.request(`/api/v1/vessels/${s.ownVessel.id}/dockings`, { method: "POST", json: { ...DOCKING, plannedOn: "12/04/2027", steelRatePerKg: -1 } });
    expect(((await plan.json()) as { error: { message: string } }).error.message).toBe("Planned date must be a date like 2026-03-14; Steel renewal rate per kg cannot be negative.");
    expect(await testDb().$count(auditLog, and(eq(auditLog.orgId, s.org.id), eq(auditLog.action, "docking_item.decide")))).toBe(0);
  });

  it("excludes and adjusts with reasons, audit-logs each change, and prices again", async () => {
    const coating = await itemOf("coating", 1.2);
    const sediment = await itemOf("sediment", 1);
    const res = await superintendent.request(`/api/v1/dockings/${dockingId}/items`, {
      method: "PUT",
      json: {
        items: [
          { id: coating.id, included: false, adjustmentReason: "Touched up by the crew at sea" },
          { id: sediment.id, included: true, adjustedQuantity: 3, adjustmentReason: "Yard survey found more mud, \"about 3 m³\"" },
        ],
      },
    });
    const b = await body(res);
    // coating 2.5 + 1.5 = 4.0 m² × 35.50 = 142.00; sediment 3 m³ × 95.00 = 285.00;
    // grand total 494.55 + 142.00 + 180.00 + 285.00 = 1101.55
    expect(b.workList.totals.coating).toMatchObject({ cost: 142, included: 2, excluded: 1 });
    expect(b.workList.totals.sediment).toMatchObject({ quantity: 3, cost: 285 });
    expect(b.workList.grandTotal).toBe(1101.55);
    const logs = await testDb().select().from(auditLog).where(and(eq(auditLog.orgId, s.org.id), eq(auditLog.action, "docking_item.decide")));
    expect(logs.map((l) => l.entityId).sort()).toEqual([coating.id, sediment.id].sort());
    const sedimentLog = logs.find((l) => l.entityId === sediment.id)!.detail as { before: { adjustedQuantity: number | null }; after: { adjustedQuantity: number; adjustmentReason: string } };
    expect(sedimentLog.before.adjustedQuantity).toBeNull();
    expect(sedimentLog.after).toMatchObject({ adjustedQuantity: 3, adjustmentReason: "Yard survey found more mud, \"about 3 m³\"" });
  });

  it("keeps the decisions when the list is gathered again", async () => {
    const res = await superintendent.request(`/api/v1/dockings/${dockingId}/rebuild`, { method: "POST" });
    const b = await body(res);
    expect(b.workList.grandTotal).toBe(1101.55);
    expect(b.workList.items).toHaveLength(6);
  });

  it("exports the CSV: header, items, totals per kind, grand total, with quoting", async () => {
    const res = await superintendent.request(`/api/v1/dockings/${dockingId}/work-list.csv`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="work-list-.*-2027-04-12\.csv"$/);
    const lines = (await res.text()).split("\r\n");
    expect(lines.pop()).toBe("");
    const t = "No. 1 WBT P";
    expect(lines).toEqual([
      "Tank,Kind,Description,Included,Quantity gathered,Adjusted quantity,Quantity priced,Unit,Unit rate,Currency,Cost,Reason",
      `${t},Steel renewal,"Finding 3: Pitting, Fr. 90–91, Bottom shell plating: steel renewal (insert plate)",yes,117.75,,117.75,kg,4.2,USD,494.55,`,
      `${t},Coating repair,"Finding 1: Local coating breakdown, Fr. 82–85, Inner bottom plating: coating repair (coating touch-up)",yes,2.5,,2.5,m²,35.5,USD,88.75,`,
      // excluded: no Cost, so the items' Cost column adds up to the grand total
      // (494.55 + 88.75 + 53.25 + 180.00 + 285.00 = 1101.55, worked at the top of this file and in the test above)
      `${t},Coating repair,"Finding 2: Local coating breakdown, Fr. 88–89, Bottom shell plating: coating repair (coating touch-up)",no,1.2,,1.2,m²,35.5,USD,,Touched up by the crew at sea`,
      `${t},Coating repair,"Finding 3: Pitting, Fr. 90–91, Bottom shell plating: coating repair (insert plate)",yes,1.5,,1.5,m²,35.5,USD,53.25,`,
      `${t},Anode renewal,Anodes to renew,yes,1,,1,pcs,180,USD,180.00,`,
      // the zone's label from fillInspection
      `${t},Sediment removal,"Sediment removal, 1 zone: Bottom between the floors, aft end",yes,1,3,3,m³,95,USD,285.00,"Yard survey found more mud, ""about 3 m³"""`,
      `Total,Steel renewal,"1 included, 0 excluded",,,,117.75,kg,,USD,494.55,`,
      `Total,Coating repair,"2 included, 1 excluded",,,,4,m²,,USD,142.00,`,
      `Total,Anode renewal,"1 included, 0 excluded",,,,1,pcs,,USD,180.00,`,
      `Total,Sediment removal,"1 included, 0 excluded",,,,3,m³,,USD,285.00,`,
      `Total,Other work (added by hand),"0 included, 0 excluded",,,,,,,USD,0.00,`,
      `Grand total,,"${s.ownVessel.name}, Test Yard Shipbuilding, Test Harbour, Berth 3, planned 2027-04-12",,,,,,,USD,1101.55,`,
    ]);
  });

  it("exports the PDF with the items, the totals per kind and the grand total", async () => {
    const res = await superintendent.request(`/api/v1/dockings/${dockingId}/work-list.pdf`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    const text = await pdfText(new Uint8Array(await res.arrayBuffer()));
    expect(text).toContain(`Docking work list: ${s.ownVessel.name}`);
    expect(text).toContain("Finding 3: Pitting, Fr. 90–91, Bottom shell plating: steel renewal (insert plate)");
    expect(text).toContain("Reason: Touched up by the crew at sea");
    expect(text).toMatch(/Coating repair: 2 included, 1 excluded 4 m² 142\.00 USD/);
    expect(text).toMatch(/Grand total 1101\.55 USD/);
    // The excluded coating (1.2 m² × 35.50 = 42.60) shows "excluded" in place of its cost.
    expect(text).not.toContain("42.60 USD");
    // The tank code and the work are drawn apart on every item row: the tank's own run of text
    // ends left of the work's first line, on the same baseline, with a gap.
    const runs = await pdfItems(new Uint8Array(await (await superintendent.request(`/api/v1/dockings/${dockingId}/work-list.pdf`)).arrayBuffer()));
    const works = runs.filter((r) => /^(Finding \d+:|Anodes to renew|Sediment removal,)/.test(r.str));
    expect(works).toHaveLength(6); // 6 items, worked at the top of this file
    for (const work of works) {
      const tank = runs.find((r) => r.page === work.page && Math.abs(r.y - work.y) < 0.5 && r.str.trim() === "No. 1 WBT P");
      expect(tank, work.str).toBeDefined();
      expect(tank!.x + tank!.width + 4, work.str).toBeLessThan(work.x);
    }
    expect(runs.some((r) => /WBT P\S*Finding|WBT P(Anodes|Sediment)/.test(r.str))).toBe(false);
    const excluded = works.find((r) => r.str.startsWith("Finding 2:"))!;
    expect(runs.filter((r) => Math.abs(r.y - excluded.y) < 0.5).map((r) => r.str.trim()).slice(-3)).toEqual(["1.2 m²", "35.50 USD", "excluded"]);
    expect((await officer.request(`/api/v1/dockings/${dockingId}/work-list.pdf`)).status).toBe(403);
    expect((await otherAdmin.request(`/api/v1/dockings/${dockingId}/work-list.pdf`)).status).toBe(404);
  }, 60_000);

  it("refuses any change once the docking is completed", async () => {
    await testDb().update(dockings).set({ status: "completed" }).where(eq(dockings.id, dockingId));
    const sediment = await itemOf("sediment", 1);
    const put = await superintendent.request(`/api/v1/dockings/${dockingId}/items`, { method: "PUT", json: { items: [{ id: sediment.id, included: true }] } });
    expect(put.status).toBe(409);
    expect((await superintendent.request(`/api/v1/dockings/${dockingId}/rebuild`, { method: "POST" })).status).toBe(409);
    expect((await itemOf("sediment", 1)).adjustedQuantity).toBe(3);
  });
});

describe("bad input and strangers", () => {
  const post = (c: TClient, vesselId: string, json: unknown) => c.request(`/api/v1/vessels/${vesselId}/dockings`, { method: "POST", json });

  it.each([
    ["steelRatePerKg", { steelRatePerKg: -1 }],
    ["coatingRatePerM2", { coatingRatePerM2: "lots" }],
    ["anodeRatePerPiece", { anodeRatePerPiece: null }],
    ["currency", { currency: "EURO" }],
    ["currency", { currency: "ZZZ" }],
    ["plannedOn", { plannedOn: "2027-02-30" }],
  ])("refuses a bad %s with 400 naming the field, and saves nothing", async (field, change) => {
    const before = await dockingCount(s.ownVessel.id);
    const res = await post(superintendent, s.ownVessel.id, { ...DOCKING, ...change });
    expect(res.status).toBe(400);
    const e = (await res.json()) as { error: { issues: { path: string }[] } };
    expect(e.error.issues.map((i) => i.path)).toEqual([field]);
    expect(await dockingCount(s.ownVessel.id)).toBe(before);
  });

  it("refuses the vessel's officer and master (403) and another company (404)", async () => {
    const before = await dockingCount(s.ownVessel.id);
    for (const c of [officer, master]) {
      expect((await post(c, s.ownVessel.id, DOCKING)).status).toBe(403);
      expect((await c.request(`/api/v1/dockings/${dockingId}`)).status).toBe(403);
      expect((await c.request(`/api/v1/dockings/${dockingId}/work-list.csv`)).status).toBe(403);
    }
    expect((await post(otherAdmin, s.ownVessel.id, DOCKING)).status).toBe(404);
    for (const path of [`/api/v1/dockings/${dockingId}`, `/api/v1/dockings/${dockingId}/work-list.csv`]) {
      const res = await otherAdmin.request(path);
      expect(res.status).toBe(404);
      expect(await res.text()).not.toContain(s.ownVessel.name);
    }
    expect((await otherAdmin.request(`/api/v1/dockings/${dockingId}/rebuild`, { method: "POST" })).status).toBe(404);
    expect(await dockingCount(s.ownVessel.id)).toBe(before);
  });

  it("answers 404 for an unknown docking or an item of another docking", async () => {
    expect((await superintendent.request(`/api/v1/dockings/${randomUUID()}`)).status).toBe(404);
    expect((await superintendent.request(`/api/v1/dockings/not-an-id`)).status).toBe(404);
    const res = await superintendent.request(`/api/v1/vessels/${s.siblingVessel.id}/dockings`, { method: "POST", json: DOCKING });
    const sibling = ((await res.json()) as { docking: { id: string } }).docking.id;
    const [item] = await testDb().select().from(dockingItems).where(eq(dockingItems.dockingId, dockingId));
    const put = await superintendent.request(`/api/v1/dockings/${sibling}/items`, { method: "PUT", json: { items: [{ id: item!.id, included: false, adjustmentReason: "Not ours" }] } });
    expect(put.status).toBe(404);
  });
});

describe("after the docking: items done close their findings", () => {
  let second = "";
  const view = async () => body(await superintendent.request(`/api/v1/dockings/${second}`));
  const status = (to: unknown) => superintendent.request(`/api/v1/dockings/${second}/status`, { method: "PUT", json: { status: to } });
  const done = (itemIds: string[], isDone = true) => superintendent.request(`/api/v1/dockings/${second}/done`, { method: "PUT", json: { itemIds, done: isDone } });
  const findingStatus = async (number: number) =>
    (await testDb().select({ status: findings.status, n: findings.number }).from(findings).where(eq(findings.inspectionId, s.inspectionOf(s.ownVessel.id)))).find((f) => f.n === number)!.status;

  beforeAll(async () => {
    const res = await superintendent.request(`/api/v1/vessels/${s.ownVessel.id}/dockings`, { method: "POST", json: { ...DOCKING, plannedOn: "2027-09-01" } });
    second = ((await res.json()) as { docking: { id: string } }).docking.id;
  });

  it("refuses marking done before the docking is in progress, and an unknown status", async () => {
    const [item] = (await view()).workList.items;
    expect((await done([item!.id])).status).toBe(409);
    const bad = await status("finished");
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as { error: { issues: { path: string }[] } }).error.issues.map((i) => i.path)).toEqual(["status"]);
    expect((await status("in_progress")).status).toBe(200);
    expect((await status("planned")).status).toBe(409);
  });

  it("closes a finding once all its items are done, and opens it again when one is undone", async () => {
    const items = (await view()).workList.items;
    const f3 = items.filter((i) => i.description.startsWith("Finding 3:"));
    expect(f3.map((i) => i.kind).sort()).toEqual(["coating", "steel"]);
    const steel = f3.find((i) => i.kind === "steel")!;
    const coating = f3.find((i) => i.kind === "coating")!;
    expect((await done([steel.id])).status).toBe(200);
    expect(await findingStatus(3)).toBe("open");
    const res = await done([coating.id]);
    expect(res.status).toBe(200);
    expect(((await res.json()) as { closedFindings: string[] }).closedFindings).toHaveLength(1);
    expect(await findingStatus(3)).toBe("closed");
    expect(await testDb().$count(auditLog, and(eq(auditLog.orgId, s.org.id), eq(auditLog.action, "finding.close")))).toBe(1);
    expect((await done([coating.id], false)).status).toBe(200);
    expect(await findingStatus(3)).toBe("open");
    expect((await done([coating.id])).status).toBe(200);
    expect(await findingStatus(3)).toBe("closed");
  });

  it("refuses an item of another docking, and anything once the docking is completed", async () => {
    const [foreign] = await testDb().select().from(dockingItems).where(eq(dockingItems.dockingId, dockingId));
    expect((await done([foreign!.id])).status).toBe(404);
    expect((await status("completed")).status).toBe(200);
    const anodes = (await view()).workList.items.find((i) => i.kind === "anodes")!;
    expect((await done([anodes.id])).status).toBe(409);
    expect((await status("cancelled")).status).toBe(409);
    expect((await officer.request(`/api/v1/dockings/${second}/status`, { method: "PUT", json: { status: "cancelled" } })).status).toBe(403);
    expect((await otherAdmin.request(`/api/v1/dockings/${second}/done`, { method: "PUT", json: { itemIds: [anodes.id], done: true } })).status).toBe(404);
  });

  it("leaves closed findings out of a docking gathered afterwards", async () => {
    const res = await superintendent.request(`/api/v1/vessels/${s.ownVessel.id}/dockings`, { method: "POST", json: { ...DOCKING, plannedOn: "2028-03-01" } });
    const third = ((await res.json()) as { docking: { id: string } }).docking.id;
    const b = await body(await superintendent.request(`/api/v1/dockings/${third}`));
    expect(b.workList.items.some((i) => i.description.startsWith("Finding 3:"))).toBe(false);
    expect(b.workList.totals.steel!.cost).toBe(0);
  });
});
