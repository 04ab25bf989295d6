// The OpenAPI document tells the truth about what the API answers: every JSON
// response schema in the served /api/v1/openapi.json is checked against a real
// answer of its route (and the error body against real refusals), with Ajv, so
// a field that is renamed, retyped, added or dropped fails here.
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { comments, inspectionIntervals, signatures } from "@/db/schema";
import { fillInspection } from "@/db/seed/complete-inspection";
import { anonymousClient, signIn, type TClient } from "../fixtures/http";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";
import { storeSignedReport } from "../fixtures/signed-report";

type TJson = Record<string, unknown>;
type TMedia = { schema?: TJson };
type TOperation = { responses: Record<string, { description: string; headers?: Record<string, TJson>; content?: Record<string, TMedia> }> };
type TDocument = { paths: Record<string, Record<string, TOperation>>; components: { schemas: Record<string, TJson> } };
type TValidate = ((data: unknown) => boolean) & { errors?: unknown[] | null };

let doc: TDocument;
let ajv: { compile: (schema: TJson) => TValidate };
let s: TScenario;
let officer: TClient;
let superintendent: TClient;
let dockingId = "";
/** The own vessel's inspection: filled, signed, countersigned, its PDF stored. */
let signedId = "";
/** The sibling vessel's inspection: an empty draft (no coating record, no PDF); the officer is not on that vessel. */
let unsignedId = "";
/** "get /api/v1/…" of every answer checked below, to prove that no documented schema goes untested. */
const checked = new Set<string>();

/** The schema the served document gives for one answer, standalone (its components as $defs), compiled. */
function validatorFor(method: string, path: string, status: number, mediaType = "application/json"): TValidate {
  const media = doc.paths[path]?.[method]?.responses[String(status)]?.content?.[mediaType];
  expect(media?.schema, `${method} ${path} documents a ${status} ${mediaType} schema`).toBeTypeOf("object");
  const standalone = JSON.parse(JSON.stringify({ ...media!.schema, $defs: doc.components.schemas }).replaceAll("#/components/schemas/", "#/$defs/")) as TJson;
  return ajv.compile(standalone);
}

/** Calls a route, and validates its JSON body against the served document's schema for that status. */
async function expectDocumented(client: TClient, method: "get" | "put", path: string, url: string, status: number, json?: unknown) {
  const res = await client.request(url, method === "get" ? {} : { method: method.toUpperCase(), json });
  expect(res.status, `${url}: ${await res.clone().text()}`).toBe(status);
  expect(res.headers.get("content-type")).toContain("application/json");
  const body = (await res.json()) as TJson;
  const validate = validatorFor(method, path, status);
  expect(validate(body), `${method} ${url} ${status}: ${JSON.stringify(validate.errors, null, 1)}`).toBe(true);
  checked.add(`${method} ${path} ${status}`);
  return body;
}

beforeAll(async () => {
  const res = await anonymousClient().request("/api/v1/openapi.json");
  expect(res.status).toBe(200);
  doc = (await res.json()) as TDocument;
  const mod = (await import("ajv/dist/2020")) as unknown as { default: new (o: TJson) => typeof ajv };
  // Formats are not checked by Ajv here; zod writes a pattern beside each date and time format, and those are.
  ajv = new mod.default({ strict: true, validateFormats: false, allowUnionTypes: true, allErrors: true });

  s = await buildScenario();
  const db = testDb();
  const tank = s.tankOf(s.ownVessel.id);
  signedId = s.inspectionOf(s.ownVessel.id);
  unsignedId = s.inspectionOf(s.siblingVessel.id);
  await fillInspection(db, { orgId: s.org.id, inspectionId: signedId, frameFrom: tank.frameFrom, testedAt: new Date("2026-11-20T08:00:00Z"), measuredBy: "Test officer", standbyPerson: "Test bosun" });
  await db.insert(signatures).values([
    { orgId: s.org.id, inspectionId: signedId, userId: s.users.officer.id, kind: "officer", signerName: "Test officer", signerRank: "Chief Officer", typedSignature: "T. Officer" },
    { orgId: s.org.id, inspectionId: signedId, userId: s.users.master.id, kind: "master", signerName: "Test master", signerRank: null, typedSignature: "T. Master" },
  ]);
  await db.insert(comments).values({ orgId: s.org.id, inspectionId: signedId, authorId: s.users.master.id, kind: "return", body: "Add the sounding of the aft bay." });
  await storeSignedReport({ orgId: s.org.id, vesselId: s.ownVessel.id, inspectionId: signedId, pdf: Buffer.from(`%PDF-1.4\n% openapi responses ${s.run}\n%%EOF\n`), label: "openapi" });
  await db.insert(inspectionIntervals).values({ orgId: s.org.id, vesselId: null, defaultMonths: 12, belowGoodMonths: 6 });
  [officer, superintendent] = await Promise.all([signIn(s.users.officer.email, PASSWORD), signIn(s.users.superintendent.email, PASSWORD)]);
  const created = await superintendent.request(`/api/v1/vessels/${s.ownVessel.id}/dockings`, {
    method: "POST",
    json: { yard: "Test Yard", place: "Test Harbour", plannedOn: "2027-04-12", currency: "USD", steelRatePerKg: 4.2, coatingRatePerM2: 35.5, anodeRatePerPiece: 180, sedimentRatePerM3: 95 },
  });
  expect(created.status, await created.clone().text()).toBe(201);
  dockingId = ((await created.json()) as { docking: { id: string } }).docking.id;
  // Work added by hand (kind other, no tank, its own rate): the shapes only such an item has.
  const added = await superintendent.request(`/api/v1/dockings/${dockingId}/items`, {
    method: "POST",
    json: { description: "Staging in the double bottom", quantity: 2, unit: "days", unitRate: 650, reason: "The yard's quote lists staging apart" },
  });
  expect(added.status, await added.clone().text()).toBe(201);
});

describe("the documented answers are the real ones", () => {
  it("vessels and their tanks", async () => {
    for (const client of [officer, superintendent]) {
      const body = (await expectDocumented(client, "get", "/api/v1/vessels", "/api/v1/vessels", 200)) as { vessels: unknown[] };
      expect(body.vessels.length).toBeGreaterThan(0);
    }
    const body = (await expectDocumented(officer, "get", "/api/v1/vessels/{vesselId}/tanks", `/api/v1/vessels/${s.ownVessel.id}/tanks`, 200)) as { tanks: unknown[] };
    expect(body.tanks).toHaveLength(1);
  });

  it("a vessel's inspections, with their ratings", async () => {
    const body = (await expectDocumented(officer, "get", "/api/v1/vessels/{vesselId}/inspections", `/api/v1/vessels/${s.ownVessel.id}/inspections`, 200)) as { inspections: { id: string; rating: string | null }[] };
    // fillInspection: one area with 4 % breakdown, the rest 1 % — FAIR by the 3–20 % band (IACS Rec. 87 / IMO Res. A.1049 coating condition).
    expect(body.inspections.find((i) => i.id === signedId)?.rating).toBe("FAIR");
    const unrated = (await expectDocumented(superintendent, "get", "/api/v1/vessels/{vesselId}/inspections", `/api/v1/vessels/${s.siblingVessel.id}/inspections`, 200)) as typeof body;
    expect(unrated.inspections.find((i) => i.id === unsignedId)?.rating).toBeNull();
  });

  it("the signing state, the signed PDF's fingerprint, and the redirect to the PDF", async () => {
    const state = (await expectDocumented(officer, "get", "/api/v1/inspections/{inspectionId}/signatures", `/api/v1/inspections/${signedId}/signatures`, 200)) as { signatures: unknown[]; returnComments: unknown[]; report: unknown };
    expect(state.signatures).toHaveLength(2);
    expect(state.returnComments).toHaveLength(1);
    await expectDocumented(superintendent, "get", "/api/v1/inspections/{inspectionId}/signatures", `/api/v1/inspections/${unsignedId}/signatures`, 200);

    const path = "/api/v1/inspections/{inspectionId}/signed-report";
    const fingerprint = (await expectDocumented(officer, "get", path, `/api/v1/inspections/${signedId}/signed-report?format=json`, 200)) as { report: { sha256: string } | null };
    expect(fingerprint.report?.sha256).toMatch(/^[0-9a-f]{64}$/);
    const none = (await expectDocumented(superintendent, "get", path, `/api/v1/inspections/${unsignedId}/signed-report?format=json`, 200)) as typeof fingerprint;
    expect(none.report).toBeNull();

    const redirect = await officer.request(`/api/v1/inspections/${signedId}/signed-report`);
    expect(redirect.status).toBe(302);
    expect(doc.paths[path]!.get!.responses["302"]!.headers).toHaveProperty("Location");
    expect(redirect.headers.get("location")).toBeTruthy();
    const pdf = await fetch(redirect.headers.get("location")!);
    expect(pdf.status).toBe(200);
    expect(Buffer.from(await pdf.arrayBuffer()).subarray(0, 5).toString()).toBe("%PDF-");
  });

  it("the fleet overview", async () => {
    for (const client of [superintendent, officer]) {
      const body = (await expectDocumented(client, "get", "/api/v1/fleet", "/api/v1/fleet?pageSize=2", 200)) as { tanks: { due: unknown }[] };
      expect(body.tanks.length).toBeGreaterThan(0);
      expect(body.tanks.some((t) => t.due !== null), "intervals are set: due dates are given").toBe(true);
    }
    await expectDocumented(superintendent, "get", "/api/v1/fleet", `/api/v1/fleet?vessel=${s.ownVessel.id}&rating=FAIR&dueWithin=3650`, 200);
  });

  it("a vessel's dockings, and a docking with one page of its work list", async () => {
    const list = (await expectDocumented(superintendent, "get", "/api/v1/vessels/{vesselId}/dockings", `/api/v1/vessels/${s.ownVessel.id}/dockings`, 200)) as { dockings: { id: string }[] };
    expect(list.dockings.map((d) => d.id)).toContain(dockingId);
    const path = "/api/v1/dockings/{dockingId}";
    const page = (await expectDocumented(superintendent, "get", path, `/api/v1/dockings/${dockingId}?page=1&pageSize=2`, 200)) as { workList: { items: unknown[]; counts: { included: number } }; paging: { matching: number; totalPages: number } };
    expect(page.workList.items).toHaveLength(2);
    expect(page.paging.matching).toBeGreaterThan(2);
    expect(page.workList.counts.included).toBe(page.paging.matching);
    const tank = s.tankOf(s.ownVessel.id);
    await expectDocumented(superintendent, "get", path, `/api/v1/dockings/${dockingId}?tank=${tank.id}&page=2&pageSize=1`, 200);
    const details = { yard: "Test Yard", place: "Test Harbour", plannedOn: "2027-04-19", currency: "USD", steelRatePerKg: 4.2, coatingRatePerM2: 40, anodeRatePerPiece: 180, sedimentRatePerM3: 95 };
    const edited = (await expectDocumented(superintendent, "put", path, `/api/v1/dockings/${dockingId}?page=1&pageSize=2`, 200, details)) as { docking: { plannedOn: string; coatingRatePerM2: number }; workList: { items: unknown[] } };
    expect(edited.docking).toMatchObject({ plannedOn: "2027-04-19", coatingRatePerM2: 40 });
    expect(edited.workList.items).toHaveLength(2);
  });

  it("the work list files are what the document says", async () => {
    for (const [sub, type] of [["work-list.csv", "text/csv"], ["work-list.pdf", "application/pdf"]] as const) {
      const documented = doc.paths[`/api/v1/dockings/{dockingId}/${sub}`]!.get!.responses["200"]!;
      expect(Object.keys(documented.content ?? {})).toEqual([type]);
      expect(documented.headers).toHaveProperty("Content-Disposition");
      const res = await superintendent.request(`/api/v1/dockings/${dockingId}/${sub}`);
      expect(res.status).toBe(200);
      expect(res.headers.get("content-type")).toContain(type);
      expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename=/);
      await res.arrayBuffer();
    }
  });

  it("refusals carry the one error body (400, 401, 403, 404, 409)", async () => {
    const bad = (await expectDocumented(superintendent, "get", "/api/v1/fleet", "/api/v1/fleet?rating=SPLENDID", 400)) as { error: { code: string; issues: { path: string }[] } };
    expect(bad.error.code).toBe("bad_request");
    expect(bad.error.issues.map((i) => i.path)).toContain("rating");
    await expectDocumented(superintendent, "get", "/api/v1/dockings/{dockingId}", `/api/v1/dockings/${dockingId}?pageSize=0`, 400);
    const anonymous = (await expectDocumented(anonymousClient(), "get", "/api/v1/vessels", "/api/v1/vessels", 401)) as { error: { code: string } };
    expect(anonymous.error.code).toBe("unauthenticated");
    const forbidden = (await expectDocumented(officer, "get", "/api/v1/vessels/{vesselId}/dockings", `/api/v1/vessels/${s.ownVessel.id}/dockings`, 403)) as { error: { code: string } };
    expect(forbidden.error.code).toBe("forbidden");
    const missing = (await expectDocumented(superintendent, "get", "/api/v1/dockings/{dockingId}", `/api/v1/dockings/${randomUUID()}`, 404)) as { error: { code: string } };
    expect(missing.error.code).toBe("not_found");
    await expectDocumented(officer, "get", "/api/v1/vessels/{vesselId}/tanks", `/api/v1/vessels/${s.otherVessel.id}/tanks`, 404);
    await expectDocumented(officer, "get", "/api/v1/inspections/{inspectionId}/signed-report", `/api/v1/inspections/${unsignedId}/signed-report?format=json`, 404);

    // A countersigned report is locked: a write is refused with 409, documented for every write.
    const res = await officer.request(`/api/v1/inspections/${signedId}/sections/remarks`, { method: "PUT", json: { version: 1, remarks: null } });
    expect(res.status, await res.clone().text()).toBe(409);
    const validate = validatorFor("put", "/api/v1/inspections/{inspectionId}/sections/{section}", 409);
    const conflict = await res.json();
    expect(validate(conflict), JSON.stringify(validate.errors)).toBe(true);
  });

  it("a body that differs from the schema is refused by it, so these checks can fail", async () => {
    const vessels = (await (await officer.request("/api/v1/vessels")).json()) as { vessels: TJson[] };
    const validate = validatorFor("get", "/api/v1/vessels", 200);
    const first = vessels.vessels[0]!;
    expect(validate(vessels)).toBe(true);
    expect(validate({ vessels: [{ ...first, tankCount: String(first.tankCount) }] }), "a number sent as a string").toBe(false);
    expect(validate({ vessels: [{ ...first, secret: "x" }] }), "a field the document does not name").toBe(false);
    const { imoNumber: _dropped, ...withoutImo } = first;
    expect(validate({ vessels: [withoutImo] }), "a required field left out").toBe(false);

    const inspections = validatorFor("get", "/api/v1/vessels/{vesselId}/inspections", 200);
    const sample = { id: signedId, status: "countersigned", inspectedOn: "2026-11-20", revision: 1, place: "Test port", tankId: signedId, tankCode: "No. 1 WBT P", updatedAt: "2026-11-21T10:00:00.000Z", rating: "FAIR" };
    expect(inspections({ inspections: [sample] })).toBe(true);
    expect(inspections({ inspections: [{ ...sample, rating: "EXCELLENT" }] }), "a rating outside GOOD/FAIR/POOR").toBe(false);
    expect(inspections({ inspections: [{ ...sample, inspectedOn: "20 November 2026" }] }), "a date that is not ISO").toBe(false);

    const error = validatorFor("get", "/api/v1/dockings/{dockingId}", 404);
    expect(error({ error: { code: "not_found", message: "No such docking.", issues: [] } })).toBe(true);
    expect(error({ error: { code: "not_found", message: "No such docking." } }), "issues left out").toBe(false);
    expect(error({ message: "No such docking." }), "another error shape").toBe(false);
  });

  it("checks every JSON response schema the document has", () => {
    const documented = Object.entries(doc.paths).flatMap(([p, item]) =>
      Object.entries(item).flatMap(([m, op]) =>
        Object.entries(op.responses).flatMap(([status, r]) => (/^2\d\d$/.test(status) && r.content?.["application/json"]?.schema ? [`${m} ${p} ${status}`] : [])),
      ),
    );
    expect(documented.length).toBeGreaterThanOrEqual(8);
    expect(documented.filter((d) => !checked.has(d)), "documented response schemas without a real answer checked here").toEqual([]);
  });
});

describe("the document says what answers look like", () => {
  it("lists the error statuses an operation can answer with, each with the one error body", () => {
    const op = doc.paths["/api/v1/dockings/{dockingId}/status"]!.put!;
    for (const status of ["400", "401", "403", "404", "409", "422"]) {
      expect(op.responses[status]?.content?.["application/json"]?.schema, status).toEqual({ $ref: "#/components/schemas/ErrorBody" });
    }
    expect(Object.keys(doc.paths["/api/v1/vessels"]!.get!.responses).sort()).toEqual(["200", "401", "403", "default"]);
  });

  it("documents PDF answers by media type, and the signed report's two answers", () => {
    for (const p of ["/api/v1/inspections/{inspectionId}/report", "/api/v1/vessels/{vesselId}/tanks/{tankId}/brief.pdf", "/api/v1/vessels/{vesselId}/tanks/{tankId}/history.pdf"]) {
      expect(doc.paths[p]!.get!.responses["200"]!.content, p).toEqual({ "application/pdf": {} });
    }
    expect(Object.keys(doc.paths["/api/v1/inspections/{inspectionId}/signed-report"]!.get!.responses)).toEqual(expect.arrayContaining(["200", "302", "404"]));
  });
});
