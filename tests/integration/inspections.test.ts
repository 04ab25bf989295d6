import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { coatingAreas, findings, inspections, tankMembers } from "@/db/schema";
import { signIn, type TClient } from "../fixtures/http";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

let s: TScenario;
let officer: TClient;
let master: TClient;
let inspectionId = "";
type TErr = { error: { code: string; message: string; issues: { path: string; message: string }[] } };

const url = (p = "") => `/api/v1/inspections/${inspectionId}${p}`;
const version = async () => (await testDb().query.inspections.findFirst({ where: eq(inspections.id, inspectionId) }))!.version;
const crackFinding = (over: object = {}) => ({
  type: "crack", frameFrom: 88, frameTo: 88, memberKind: "longitudinal", platingRegion: "bottom_shell", memberNumber: 7, positionDetail: "lower bracket toe",
  lengthMm: 40, description: "Crack through the weld of the bracket toe, coating cracked around it", repair: { kind: "insert_plate", lengthMm: 400, widthMm: 800, thicknessMm: 8, pieces: 1 }, ...over,
});

beforeAll(async () => {
  s = await buildScenario();
  const tank = s.tankOf(s.ownVessel.id);
  await testDb().insert(tankMembers).values({ orgId: s.org.id, tankId: tank.id, kind: "longitudinal", platingRegion: "bottom_shell", numberFrom: 1, numberTo: 12 });
  officer = await signIn(s.users.officer.email, PASSWORD);
  master = await signIn(s.users.master.email, PASSWORD);
});

describe("start an inspection", () => {
  it("an officer starts a draft; a retried start with the same id returns the same inspection", async () => {
    const id = randomUUID();
    const body = { id, tankId: s.tankOf(s.ownVessel.id).id, inspectedOn: "2026-11-28", placeKind: "port", place: "Port Demo", team: ["A. Officer", "B. Bosun"] };
    const first = await officer.request(`/api/v1/vessels/${s.ownVessel.id}/inspections`, { method: "POST", json: body });
    expect(first.status).toBe(201);
    const again = await officer.request(`/api/v1/vessels/${s.ownVessel.id}/inspections`, { method: "POST", json: body });
    expect(again.status).toBe(201);
    expect(((await again.json()) as { inspection: { id: string } }).inspection.id).toBe(id);
    expect(await testDb().$count(inspections, eq(inspections.id, id))).toBe(1);
    inspectionId = id;
  });

  it("refuses a tank of another vessel and a superintendent starting one", async () => {
    const body = { tankId: s.tankOf(s.siblingVessel.id).id, inspectedOn: "2026-11-28", placeKind: "port", place: "Port Demo", team: ["A. Officer"] };
    const res = await officer.request(`/api/v1/vessels/${s.ownVessel.id}/inspections`, { method: "POST", json: body });
    expect(res.status).toBe(400);
    const sup = await signIn(s.users.superintendent.email, PASSWORD);
    expect((await sup.request(`/api/v1/vessels/${s.ownVessel.id}/inspections`, { method: "POST", json: { ...body, tankId: s.tankOf(s.ownVessel.id).id } })).status).toBe(403);
  });
});

describe("saving the wizard's parts", () => {
  it("saves a finding with its steel weight computed on the server (insert 400 × 800 × 8 mm → 20.1 kg)", async () => {
    const findingId = randomUUID();
    const res = await officer.request(url(`/findings/${findingId}`), { method: "PUT", json: { version: await version(), ...crackFinding() } });
    expect(res.status).toBe(200);
    const body = (await res.json()) as { version: number; findingNumber: number; steelWeightKg: number };
    expect(body.findingNumber).toBe(1);
    expect(body.steelWeightKg).toBeCloseTo(20.1, 1);
    const row = await testDb().query.findings.findFirst({ where: eq(findings.id, findingId) });
    expect(row).toMatchObject({ frameFrom: 88, memberNumber: 7, repairKind: "insert_plate" });
  });

  it("a retried request with the same Idempotency-Key is answered once, not applied twice", async () => {
    const findingId = randomUUID();
    const v = await version();
    const send = () => officer.request(url(`/findings/${findingId}`), { method: "PUT", json: { version: v, ...crackFinding({ frameFrom: 90, frameTo: 90 }) }, headers: { "idempotency-key": `retry-${findingId}` } });
    const [a, b] = [await send(), await send()];
    expect(a.status).toBe(200);
    expect(b.status).toBe(200);
    expect(await b.json()).toEqual(await a.json());
    expect(await testDb().$count(findings, eq(findings.id, findingId))).toBe(1);
    expect(await version()).toBe(v + 1);
  });

  it("a stale version gets 409 and changes nothing", async () => {
    const v = await version();
    const ok = await master.request(url("/sections/coating"), { method: "PUT", json: { version: v, areas: [{ area: "shell_plating", breakdownPct: 5, rustedPct: 2, hardScalePct: 0 }] } });
    expect(ok.status).toBe(200);
    const stale = await officer.request(url("/sections/coating"), { method: "PUT", json: { version: v, areas: [{ area: "shell_plating", breakdownPct: 50, rustedPct: 2, hardScalePct: 0 }] } });
    expect(stale.status).toBe(409);
    expect(((await stale.json()) as TErr).error.issues[0]).toMatchObject({ path: "version", message: String(v + 1) });
    const row = await testDb().query.coatingAreas.findFirst({ where: and(eq(coatingAreas.inspectionId, inspectionId), eq(coatingAreas.area, "shell_plating")) });
    expect(row!.breakdownPct).toBe(5);
  });

  it.each([
    ["a vague description", { description: "some corrosion in the tank" }, "description"],
    ["see photo", { description: "see photo" }, "description"],
    ["frames outside the tank", { frameFrom: 120, frameTo: 121 }, "frameFrom"],
    ["a member number outside the catalogue", { memberNumber: 40 }, "memberNumber"],
    ["a crack without its length", { lengthMm: undefined }, "lengthMm"],
    ["an insert without thickness", { repair: { kind: "insert_plate", lengthMm: 400, widthMm: 800, pieces: 1 } }, "repair.thicknessMm"],
    ["a bracket whose sides cannot close", { repair: { kind: "bracket_renewal", shape: "triangular", sideAMm: 100, sideBMm: 100, sideCMm: 300, thicknessMm: 8, pieces: 1 } }, "repair.sideCMm"],
  ])("refuses %s, naming the field, and changes nothing", async (_what, over, path) => {
    const v = await version();
    const before = await testDb().$count(findings, eq(findings.inspectionId, inspectionId));
    const res = await officer.request(url(`/findings/${randomUUID()}`), { method: "PUT", json: { version: v, ...crackFinding(over) } });
    expect(res.status).toBe(400);
    expect(((await res.json()) as TErr).error.issues.map((i) => i.path)).toContain(path);
    expect(await version()).toBe(v);
    expect(await testDb().$count(findings, eq(findings.inspectionId, inspectionId))).toBe(before);
  });

  it("refuses coating given as a word or above 100 %", async () => {
    const v = await version();
    const word = await officer.request(url("/sections/coating"), { method: "PUT", json: { version: v, areas: [{ area: "stringers", breakdownPct: "fair", rustedPct: 1, hardScalePct: 0 }] } });
    expect(word.status).toBe(400);
    expect(((await word.json()) as TErr).error.issues[0]!.message).toMatch(/not a word/);
    const over = await officer.request(url("/sections/coating"), { method: "PUT", json: { version: v, areas: [{ area: "stringers", breakdownPct: 120, rustedPct: 1, hardScalePct: 0 }] } });
    expect(over.status).toBe(400);
    expect(await version()).toBe(v);
  });

  it("refuses sediment without its area, an area not inspected without the reason, anodes without wastage", async () => {
    const v = await version();
    const sediment = await officer.request(url("/sections/sediment"), { method: "PUT", json: { version: v, noSediment: false, zones: [{ id: randomUUID(), label: "aft end", depthMm: 50 }] } });
    expect(((await sediment.json()) as TErr).error.issues.map((i) => i.path)).toContain("zones.0.areaM2");
    const ni = await officer.request(url("/sections/not-inspected"), { method: "PUT", json: { version: v, allAreasInspected: false, areas: [{ id: randomUUID(), frameFrom: 85, frameTo: 90 }] } });
    expect(((await ni.json()) as TErr).error.issues.map((i) => i.path)).toContain("areas.0.reason");
    const anodes = await officer.request(url("/sections/anodes"), { method: "PUT", json: { version: v, installedCount: 10, inspectedCount: 10, toRenewCount: 0 } });
    expect(((await anodes.json()) as TErr).error.issues.map((i) => i.path)).toContain("meanWastagePct");
    expect(await version()).toBe(v);
  });

  it("computes the sediment volume, the coating rating and the blockers in the view", async () => {
    let v = await version();
    const put = async (p: string, body: object) => {
      const res = await officer.request(url(p), { method: "PUT", json: { version: v, ...body } });
      expect(res.status, p).toBe(200);
      v = ((await res.json()) as { version: number }).version;
    };
    await put("/sections/sediment", { noSediment: false, zones: [{ id: randomUUID(), label: "Bottom between Fr. 84 and 96", frameFrom: 84, frameTo: 96, depthMm: 100, lengthM: 15, breadthM: 30 }] });
    await put("/sections/coating", { areas: [{ area: "shell_plating", breakdownPct: 5, rustedPct: 2, hardScalePct: 0 }, { area: "edges_welds", breakdownPct: 25, rustedPct: 10, hardScalePct: 0, location: "Along the weld seams of the bottom longitudinals, aft part" }] });
    const view = (await (await officer.request(url())).json()) as { sediment: { totalM3: number }; tankRating: { rating: string; worstArea: string }; blockers: { step: string; message: string }[] };
    expect(view.sediment.totalM3).toBeCloseTo(45, 6);
    expect(view.tankRating).toMatchObject({ rating: "POOR", worstArea: "edges_welds" });
    expect(view.blockers.find((b) => b.step === "coating")!.message).toMatch(/^Coating: 6 areas have no percentage/);
    expect(view.blockers.some((b) => b.step === "entry")).toBe(true);
  });

  it("records an atmosphere test outside the limits as a blocker until a new test is recorded", async () => {
    let v = await version();
    const reading = async (oxygenPct: number) => {
      const res = await officer.request(url("/readings"), { method: "POST", json: { version: v, id: randomUUID(), testedAt: new Date().toISOString(), oxygenPct, flammableLflPct: 0, h2sPpm: 0, coPpm: 0, measuredBy: "A. Officer" } });
      expect(res.status).toBe(200);
      v = ((await res.json()) as { version: number }).version;
    };
    await reading(20.5);
    let view = (await (await officer.request(url())).json()) as { blockers: { message: string }[] };
    expect(view.blockers.map((b) => b.message)).toContain("Entry record: the last atmosphere test is outside the limits; record a new test before the step is complete.");
    await reading(20.9);
    view = (await (await officer.request(url())).json()) as { blockers: { message: string }[] };
    expect(view.blockers.map((b) => b.message).join(" ")).not.toMatch(/outside the limits/);
  });

  it("another vessel's or another company's inspection is 404; a surveyor and a superintendent cannot write", async () => {
    const otherOfficer = await signIn(s.otherAdmin.email, PASSWORD);
    expect((await otherOfficer.request(url())).status).toBe(404);
    expect((await otherOfficer.request(url("/sections/coating"), { method: "PUT", json: { version: 1, areas: [] } })).status).toBe(404);
    const surveyor = await signIn(s.users.surveyor.email, PASSWORD);
    expect((await surveyor.request(url())).status).toBe(404);
    const sup = await signIn(s.users.superintendent.email, PASSWORD);
    expect((await sup.request(url())).status).toBe(200);
    expect((await sup.request(url("/sections/coating"), { method: "PUT", json: { version: await version(), areas: [] } })).status).toBe(403);
    expect((await officer.request("/api/v1/inspections/00000000-0000-4000-8000-000000000000")).status).toBe(404);
    expect((await officer.request(url("/sections/nonsense"), { method: "PUT", json: { version: 1 } })).status).toBe(404);
  });

  it("a submitted inspection is locked against every write", async () => {
    await testDb().update(inspections).set({ status: "submitted" }).where(eq(inspections.id, inspectionId));
    const res = await officer.request(url("/sections/coating"), { method: "PUT", json: { version: await version(), areas: [] } });
    expect(res.status).toBe(409);
    expect(((await res.json()) as TErr).error.message).toMatch(/submitted and can no longer be changed/);
    expect(await testDb().$count(coatingAreas, eq(coatingAreas.inspectionId, inspectionId))).toBe(2);
    await testDb().update(inspections).set({ status: "draft" }).where(eq(inspections.id, inspectionId));
  });
});
