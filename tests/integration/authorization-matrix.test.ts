// Every protected route handler and page × every role × own vessel / other
// vessel of the same company / other company → the expected status.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { dockings, memberships } from "@/db/schema";
import type { TRole } from "@/lib/vocabulary";
import { anonymousClient, signIn, type TClient } from "../fixtures/http";
import { buildScenario, fakeImo, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

type TScope = "own" | "sibling" | "other";
type TWho = TRole | "anonymous";
type TCase = {
  name: string;
  method?: string;
  path: (s: TScenario, scope: TScope) => string;
  body?: (s: TScenario, scope: TScope) => unknown;
  /** A body sent as it is (CSV) instead of JSON. */
  rawBody?: string;
  /** Scopes that matter for this route; routes without a record take only "own". */
  scopes: TScope[];
  expect: (who: TWho, scope: TScope) => number;
};

const ROLES: TRole[] = ["officer", "master", "superintendent", "admin", "surveyor"];
const vesselOf = (s: TScenario, scope: TScope) =>
  scope === "own" ? s.ownVessel : scope === "sibling" ? s.siblingVessel : s.otherVessel;
const tankPath = (s: TScenario, scope: TScope) => `/api/v1/vessels/${vesselOf(s, scope).id}/tanks/${s.tankOf(vesselOf(s, scope).id).id}`;
const tankPage = (s: TScenario, scope: TScope) => `/vessels/${vesselOf(s, scope).id}/tanks/${s.tankOf(vesselOf(s, scope).id).id}`;
const inspectionPath = (s: TScenario, scope: TScope) => `/api/v1/inspections/${s.inspectionOf(vesselOf(s, scope).id)}`;
/** Carry out an inspection: the vessel's officer and master; the office reads but does not write. */
const inspector = (who: TWho, scope: TScope, ok: number) => {
  const read = vesselReader(who, scope);
  if (read !== 200) return read;
  return who === "officer" || who === "master" ? ok : 403;
};
/** Share a report with class: the office (superintendent, admin) of the vessel's company. */
const officeOnly = (who: TWho, scope: TScope, ok: number) => {
  const read = vesselReader(who, scope);
  if (read !== 200) return read;
  return who === "superintendent" || who === "admin" ? ok : 403;
};
/** Countersign or return a report: the vessel's master only. */
const countersigner = (who: TWho, scope: TScope, ok: number) => {
  const read = vesselReader(who, scope);
  if (read !== 200) return read;
  return who === "master" ? ok : 403;
};
let memberSerial = 0;
let frameSerial = 0;

/** Read a vessel record: its own officer/master, or the office of its company. */
const vesselReader = (who: TWho, scope: TScope) => {
  if (who === "anonymous") return 401;
  if (scope === "other" || who === "surveyor") return 404;
  if (who === "officer" || who === "master") return scope === "own" ? 200 : 404;
  return 200;
};
/** Edit a vessel's particulars or structure map: whoever may read it (its officer and master, the office). */
const vesselEditor = vesselReader;
/** Keep a vessel's report recipients: the office; the vessel's officer and master only read them. */
const recipientEditor = (ok: number) => (who: TWho, scope: TScope) => {
  const read = vesselReader(who, scope);
  if (read !== 200) return read;
  return who === "superintendent" || who === "admin" ? ok : 403;
};
/** Plan dockings and read their work lists: the office only. */
const dockingPlanner = recipientEditor;
/** One docking per vessel of the scenario, made in beforeAll. */
const dockingOf = new Map<string, string>();
const dockingPath = (s: TScenario, scope: TScope) => `/api/v1/dockings/${dockingOf.get(vesselOf(s, scope).id)}`;
const DOCKING_BODY = { yard: "Matrix Yard", place: "Matrix port", plannedOn: "2027-01-10", currency: "USD", steelRatePerKg: 1, coatingRatePerM2: 1, anodeRatePerPiece: 1, sedimentRatePerM3: 1 };
const adminOnly = (ok: number) => (who: TWho) => (who === "anonymous" ? 401 : who === "admin" ? ok : 403);
const adminOnlyScoped = (ok: number) => (who: TWho, scope: TScope) =>
  who === "anonymous" ? 401 : who !== "admin" ? 403 : scope === "other" ? 404 : ok;

const page = (allowed: (who: TRole, scope: TScope) => boolean) => (who: TWho, scope: TScope) =>
  who === "anonymous" ? 307 : allowed(who, scope) ? 200 : 404;
const office = (who: TRole) => who === "superintendent" || who === "admin";

function vesselBody(s: TScenario, scope: TScope) {
  const v = vesselOf(s, scope);
  return { name: v.name, imoNumber: v.imoNumber, vesselType: v.vesselType, frameFirst: v.frameFirst, frameLast: v.frameLast, midshipFromFrame: 60, midshipToFrame: 140 };
}

const CASES: TCase[] = [
  { name: "GET /api/v1/me", path: () => "/api/v1/me", scopes: ["own"], expect: (w) => (w === "anonymous" ? 401 : 200) },
  { name: "GET /api/v1/me/tokens", path: () => "/api/v1/me/tokens", scopes: ["own"], expect: (w) => (w === "anonymous" ? 401 : office(w) ? 200 : 403) },
  {
    name: "POST /api/v1/me/tokens", method: "POST", path: () => "/api/v1/me/tokens", scopes: ["own"],
    body: () => ({ name: "Matrix token" }), expect: (w) => (w === "anonymous" ? 401 : office(w) ? 201 : 403),
  },
  {
    name: "DELETE /api/v1/me/tokens/:id (not one's own)", method: "DELETE", path: () => "/api/v1/me/tokens/00000000-0000-4000-8000-000000000000", scopes: ["own"],
    expect: (w) => (w === "anonymous" ? 401 : office(w) ? 404 : 403),
  },
  { name: "page /account (API tokens)", path: () => "/account", scopes: ["own"], expect: page((w) => office(w)) },
  { name: "GET /api/v1/openapi.json (public)", path: () => "/api/v1/openapi.json", scopes: ["own"], expect: () => 200 },
  { name: "GET /api/v1/vessels", path: () => "/api/v1/vessels", scopes: ["own"], expect: (w) => (w === "anonymous" ? 401 : 200) },
  {
    name: "POST /api/v1/vessels", method: "POST", path: () => "/api/v1/vessels", scopes: ["own"],
    body: () => ({ name: "Matrix vessel", imoNumber: fakeImo(), vesselType: "oil_tanker", frameFirst: 0, frameLast: 150 }),
    expect: adminOnly(201),
  },
  { name: "GET /api/v1/vessels/:id", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "PATCH /api/v1/vessels/:id", method: "PATCH", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}`,
    body: vesselBody, scopes: ["own", "sibling", "other"], expect: vesselEditor,
  },
  { name: "GET /api/v1/vessels/:id/tanks", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/tanks`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "POST /api/v1/vessels/:id/tanks", method: "POST", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/tanks`,
    body: () => ({ code: `M-${Math.random().toString(36).slice(2, 8)}`, name: "Matrix tank", side: "centre", kind: "double_bottom", frameFrom: 10, frameTo: 20 }),
    scopes: ["own", "sibling", "other"], expect: (w, sc) => (vesselEditor(w, sc) === 200 ? 201 : vesselEditor(w, sc)),
  },
  { name: "GET /api/v1/vessels/:id/tanks/:tankId", path: (s, sc) => tankPath(s, sc), scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "PATCH /api/v1/vessels/:id/tanks/:tankId", method: "PATCH", path: (s, sc) => tankPath(s, sc),
    body: () => ({ code: "No. 1 WBT P", name: "Test tank", side: "port", kind: "double_bottom", frameFrom: 80, frameTo: 100 }),
    scopes: ["own", "sibling", "other"], expect: vesselEditor,
  },
  {
    name: "POST /api/v1/vessels/:id/tanks/:tankId/members", method: "POST", path: (s, sc) => `${tankPath(s, sc)}/members`,
    body: () => ({ kind: "longitudinal", platingRegion: "bottom_shell", numberFrom: ++memberSerial * 10, numberTo: memberSerial * 10 + 5 }),
    scopes: ["own", "sibling", "other"], expect: (w, sc) => (vesselEditor(w, sc) === 200 ? 201 : vesselEditor(w, sc)),
  },
  {
    name: "POST /api/v1/vessels/:id/tanks/:tankId/special-frames", method: "POST", path: (s, sc) => `${tankPath(s, sc)}/special-frames`,
    body: () => ({ frame: 80 + (++frameSerial % 20), note: "Matrix landmark" }),
    scopes: ["own", "sibling", "other"], expect: (w, sc) => (vesselEditor(w, sc) === 200 ? 201 : vesselEditor(w, sc)),
  },
  { name: "GET /api/v1/vessels/:id/tanks/:tankId/history", path: (s, sc) => `${tankPath(s, sc)}/history`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  { name: "GET /api/v1/vessels/:id/tanks/:tankId/history.pdf", path: (s, sc) => `${tankPath(s, sc)}/history.pdf`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  { name: "GET /api/v1/vessels/:id/tanks/:tankId/brief.pdf", path: (s, sc) => `${tankPath(s, sc)}/brief.pdf`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "POST /api/v1/vessels/:id/tanks/import (preview)", method: "POST", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/tanks/import`,
    rawBody: "code,name,side,kind,frame_from,frame_to\nX1,Preview only,port,side,10,20\n",
    scopes: ["own", "sibling", "other"], expect: vesselEditor,
  },
  { name: "page /vessels/:id/edit", path: (s, sc) => `/vessels/${vesselOf(s, sc).id}/edit`, scopes: ["own", "sibling", "other"], expect: (w, sc) => (w === "anonymous" ? 307 : vesselEditor(w, sc)) },
  { name: "page /vessels/:id/tanks/new", path: (s, sc) => `/vessels/${vesselOf(s, sc).id}/tanks/new`, scopes: ["own", "sibling", "other"], expect: (w, sc) => (w === "anonymous" ? 307 : vesselEditor(w, sc)) },
  { name: "page /vessels/:id/tanks/import", path: (s, sc) => `/vessels/${vesselOf(s, sc).id}/tanks/import`, scopes: ["own", "sibling", "other"], expect: (w, sc) => (w === "anonymous" ? 307 : vesselEditor(w, sc)) },
  { name: "page /vessels/:id/tanks/:tankId", path: (s, sc) => tankPage(s, sc), scopes: ["own", "sibling", "other"], expect: (w, sc) => (w === "anonymous" ? 307 : vesselReader(w, sc)) },
  { name: "page /vessels/:id/tanks/:tankId/edit", path: (s, sc) => `${tankPage(s, sc)}/edit`, scopes: ["own", "sibling", "other"], expect: (w, sc) => (w === "anonymous" ? 307 : vesselEditor(w, sc)) },
  { name: "page /vessels/:id/tanks/:tankId/history", path: (s, sc) => `${tankPage(s, sc)}/history`, scopes: ["own", "sibling", "other"], expect: (w, sc) => (w === "anonymous" ? 307 : vesselReader(w, sc)) },
  { name: "page /vessels/:id/tanks/:tankId/brief", path: (s, sc) => `${tankPage(s, sc)}/brief`, scopes: ["own", "sibling", "other"], expect: (w, sc) => (w === "anonymous" ? 307 : vesselReader(w, sc)) },
  { name: "GET /api/v1/vessels/:id/inspections", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/inspections`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "POST /api/v1/vessels/:id/inspections", method: "POST", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/inspections`,
    body: (s, sc) => ({ tankId: s.tankOf(vesselOf(s, sc).id).id, inspectedOn: "2026-11-21", placeKind: "at_sea", place: "At sea, matrix", team: ["Matrix team"] }),
    scopes: ["own", "sibling", "other"], expect: (w, sc) => inspector(w, sc, 201),
  },
  { name: "GET /api/v1/inspections/:id", path: (s, sc) => inspectionPath(s, sc), scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "PUT /api/v1/inspections/:id/sections/remarks", method: "PUT", path: (s, sc) => `${inspectionPath(s, sc)}/sections/remarks`,
    body: () => ({ version: 1, doc: { type: "doc", content: [] } }),
    // Version 1 is current only for the first accepted write; later accepted roles meet the moved version (409).
    scopes: ["own", "sibling", "other"], expect: (w, sc) => inspector(w, sc, w === "officer" ? 200 : 409),
  },
  {
    name: "POST /api/v1/inspections/:id/readings", method: "POST", path: (s, sc) => `${inspectionPath(s, sc)}/readings`,
    body: () => ({ version: 1, id: crypto.randomUUID(), testedAt: "2026-11-20T08:00:00Z", oxygenPct: 20.9, flammableLflPct: 0, h2sPpm: 0, coPpm: 0, measuredBy: "Matrix" }),
    scopes: ["own", "sibling", "other"], expect: (w, sc) => inspector(w, sc, 409),
  },
  {
    name: "PUT /api/v1/inspections/:id/findings/:findingId", method: "PUT", path: (s, sc) => `${inspectionPath(s, sc)}/findings/${crypto.randomUUID()}`,
    body: () => ({ version: 1, type: "other", frameFrom: 85, frameTo: 85, memberKind: "manhole", description: "Manhole cover bolt missing, 1 of 24", repair: { kind: "monitor_only" } }),
    scopes: ["own", "sibling", "other"], expect: (w, sc) => inspector(w, sc, 409),
  },
  { name: "GET /api/v1/inspections/:id/photos", path: (s, sc) => `${inspectionPath(s, sc)}/photos`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "POST /api/v1/inspections/:id/photos", method: "POST", path: (s, sc) => `${inspectionPath(s, sc)}/photos`,
    body: () => ({ id: crypto.randomUUID(), fileName: "matrix.jpg", contentType: "image/jpeg", sizeBytes: 1000 }),
    scopes: ["own", "sibling", "other"], expect: (w, sc) => inspector(w, sc, 201),
  },
  {
    name: "POST /api/v1/inspections/:id/photos/:photoId/complete (unknown photo)", method: "POST", path: (s, sc) => `${inspectionPath(s, sc)}/photos/${crypto.randomUUID()}/complete`,
    scopes: ["own", "sibling", "other"], expect: (w, sc) => inspector(w, sc, 404),
  },
  {
    name: "GET /api/v1/inspections/:id/photos/:photoId/file (unknown photo)", path: (s, sc) => `${inspectionPath(s, sc)}/photos/${crypto.randomUUID()}/file?variant=thumb`,
    scopes: ["own", "sibling", "other"], expect: (w, sc) => (vesselReader(w, sc) === 200 ? 404 : vesselReader(w, sc)),
  },
  {
    name: "PUT /api/v1/inspections/:id/photos/:photoId", method: "PUT", path: (s, sc) => `${inspectionPath(s, sc)}/photos/${crypto.randomUUID()}`,
    body: () => ({ version: 1, kind: "overview", frameFrom: 85, frameTo: 90, memberKind: "manhole", caption: "Manhole at the aft end, cover and bolts" }),
    scopes: ["own", "sibling", "other"], expect: (w, sc) => inspector(w, sc, 409),
  },
  {
    name: "DELETE /api/v1/inspections/:id/photos/:photoId", method: "DELETE", path: (s, sc) => `${inspectionPath(s, sc)}/photos/${crypto.randomUUID()}`,
    body: () => ({ version: 1 }), scopes: ["own", "sibling", "other"], expect: (w, sc) => inspector(w, sc, 409),
  },
  // Signing: the scenario's inspections are drafts with blockers, so a permitted signature is refused with 422.
  {
    name: "POST /api/v1/inspections/:id/submit", method: "POST", path: (s, sc) => `${inspectionPath(s, sc)}/submit`,
    body: () => ({ version: 1, password: PASSWORD, typedSignature: "Matrix signer" }),
    scopes: ["own", "sibling", "other"], expect: (w, sc) => inspector(w, sc, 422),
  },
  {
    name: "POST /api/v1/inspections/:id/countersign", method: "POST", path: (s, sc) => `${inspectionPath(s, sc)}/countersign`,
    body: () => ({ version: 1, password: PASSWORD, typedSignature: "Matrix signer" }),
    scopes: ["own", "sibling", "other"], expect: (w, sc) => countersigner(w, sc, 422),
  },
  {
    name: "POST /api/v1/inspections/:id/return", method: "POST", path: (s, sc) => `${inspectionPath(s, sc)}/return`,
    body: () => ({ version: 1, comments: "Matrix: a return of a draft is refused." }),
    scopes: ["own", "sibling", "other"], expect: (w, sc) => countersigner(w, sc, 409),
  },
  { name: "GET /api/v1/inspections/:id/signatures", path: (s, sc) => `${inspectionPath(s, sc)}/signatures`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  { name: "GET /api/v1/inspections/:id/revisions", path: (s, sc) => `${inspectionPath(s, sc)}/revisions`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "POST /api/v1/inspections/:id/revisions (of a draft)", method: "POST", path: (s, sc) => `${inspectionPath(s, sc)}/revisions`,
    scopes: ["own", "sibling", "other"], expect: (w, sc) => inspector(w, sc, 409),
  },
  {
    name: "GET /api/v1/inspections/:id/signed-report (not signed yet)", path: (s, sc) => `${inspectionPath(s, sc)}/signed-report`,
    scopes: ["own", "sibling", "other"], expect: (w, sc) => (vesselReader(w, sc) === 200 ? 404 : vesselReader(w, sc)),
  },
  { name: "GET /api/v1/inspections/:id/deliveries", path: (s, sc) => `${inspectionPath(s, sc)}/deliveries`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  { name: "GET /api/v1/inspections/:id/report (draft PDF)", path: (s, sc) => `${inspectionPath(s, sc)}/report`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "POST /api/v1/deliveries/:id/resend (unknown delivery)", method: "POST", path: () => `/api/v1/deliveries/${crypto.randomUUID()}/resend`,
    scopes: ["own"], expect: (w) => (w === "anonymous" ? 401 : 404),
  },
  {
    name: "POST /api/v1/password-reset (open to anyone, same answer)", method: "POST", path: () => "/api/v1/password-reset",
    body: () => ({ email: "nobody-matrix@tests.tankwright.test" }), scopes: ["own"], expect: () => 200,
  },
  {
    name: "POST /api/v1/password-reset/confirm (forged token)", method: "POST", path: () => "/api/v1/password-reset/confirm",
    body: () => ({ token: "x".repeat(43), password: "a-long-enough-new-password", passwordAgain: "a-long-enough-new-password" }), scopes: ["own"], expect: () => 400,
  },
  // Sharing with class: the office shares (the scenario's drafts cannot be shared: 409); a surveyor reads only what is shared.
  { name: "GET /api/v1/inspections/:id/shares", path: (s, sc) => `${inspectionPath(s, sc)}/shares`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "POST /api/v1/inspections/:id/shares (a draft)", method: "POST", path: (s, sc) => `${inspectionPath(s, sc)}/shares`,
    body: (s) => ({ surveyorUserId: s.users.surveyor.id }), scopes: ["own", "sibling", "other"], expect: (w, sc) => officeOnly(w, sc, 409),
  },
  {
    name: "DELETE /api/v1/inspections/:id/shares/:shareId (unknown share)", method: "DELETE", path: (s, sc) => `${inspectionPath(s, sc)}/shares/${crypto.randomUUID()}`,
    scopes: ["own", "sibling", "other"], expect: (w, sc) => officeOnly(w, sc, 404),
  },
  { name: "GET /api/v1/shares", path: () => "/api/v1/shares", scopes: ["own"], expect: (w) => (w === "anonymous" ? 401 : w === "surveyor" ? 200 : 403) },
  { name: "GET /api/v1/shares/:id/report (not shared)", path: () => `/api/v1/shares/${crypto.randomUUID()}/report`, scopes: ["own"], expect: (w) => (w === "anonymous" ? 401 : w === "surveyor" ? 404 : 403) },
  {
    name: "POST /api/v1/shares/:id/acknowledge (not shared)", method: "POST", path: () => `/api/v1/shares/${crypto.randomUUID()}/acknowledge`,
    body: () => ({}), scopes: ["own"], expect: (w) => (w === "anonymous" ? 401 : w === "surveyor" ? 404 : 403),
  },
  { name: "GET /api/v1/inspections/:id/comments", path: (s, sc) => `${inspectionPath(s, sc)}/comments`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "POST /api/v1/inspections/:id/comments", method: "POST", path: (s, sc) => `${inspectionPath(s, sc)}/comments`,
    body: () => ({ body: "Matrix: a comment from the office." }), scopes: ["own", "sibling", "other"], expect: (w, sc) => officeOnly(w, sc, 201),
  },
  { name: "GET /api/v1/settings/intervals", path: () => "/api/v1/settings/intervals", scopes: ["own"], expect: (w) => (w === "anonymous" ? 401 : w === "superintendent" || w === "admin" ? 200 : 403) },
  {
    name: "PUT /api/v1/settings/intervals", method: "PUT", path: () => "/api/v1/settings/intervals", body: () => ({ defaultMonths: 12, belowGoodMonths: 6 }),
    scopes: ["own"], expect: (w) => (w === "anonymous" ? 401 : w === "superintendent" || w === "admin" ? 200 : 403),
  },
  {
    name: "DELETE /api/v1/settings/intervals (a vessel without its own)", method: "DELETE", path: (s, sc) => `/api/v1/settings/intervals?vesselId=${vesselOf(s, sc).id}`,
    scopes: ["own", "other"], expect: (w) => (w === "anonymous" ? 401 : w === "superintendent" || w === "admin" ? 404 : 403),
  },
  {
    name: "POST /api/v1/verify (open to anyone)", method: "POST", path: () => "/api/v1/verify",
    body: () => ({ fingerprint: "0".repeat(64) }), scopes: ["own"], expect: () => 200,
  },
  { name: "GET /api/v1/vessels/:id/drawings", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/drawings`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "POST /api/v1/vessels/:id/drawings", method: "POST", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/drawings`,
    body: () => ({ id: crypto.randomUUID(), kind: "general_arrangement", title: "Matrix general arrangement", fileName: "ga.pdf", contentType: "application/pdf", sizeBytes: 2000 }),
    scopes: ["own", "sibling", "other"], expect: (w, sc) => (vesselEditor(w, sc) === 200 ? 201 : vesselEditor(w, sc)),
  },
  {
    name: "POST /api/v1/vessels/:id/drawings/:drawingId/complete (unknown drawing)", method: "POST", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/drawings/${crypto.randomUUID()}/complete`,
    scopes: ["own", "sibling", "other"], expect: (w, sc) => (vesselEditor(w, sc) === 200 ? 404 : vesselEditor(w, sc)),
  },
  {
    name: "GET /api/v1/vessels/:id/drawings/:drawingId/file (unknown drawing)", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/drawings/${crypto.randomUUID()}/file`,
    scopes: ["own", "sibling", "other"], expect: (w, sc) => (vesselReader(w, sc) === 200 ? 404 : vesselReader(w, sc)),
  },
  {
    name: "DELETE /api/v1/vessels/:id/drawings/:drawingId (unknown drawing)", method: "DELETE", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/drawings/${crypto.randomUUID()}`,
    scopes: ["own", "sibling", "other"], expect: (w, sc) => (vesselEditor(w, sc) === 200 ? 404 : vesselEditor(w, sc)),
  },
  { name: "GET /api/v1/vessels/:id/recipients", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/recipients`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  {
    name: "POST /api/v1/vessels/:id/recipients", method: "POST", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/recipients`,
    body: (s) => ({ kind: "office", email: `matrix-${crypto.randomUUID().slice(0, 8)}-${s.run}@tests.tankwright.test` }),
    scopes: ["own", "sibling", "other"], expect: recipientEditor(201),
  },
  {
    name: "PUT /api/v1/vessels/:id/recipients/:recipientId (unknown recipient)", method: "PUT", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/recipients/${crypto.randomUUID()}`,
    body: () => ({ kind: "class", email: "matrix-class@tests.tankwright.test" }), scopes: ["own", "sibling", "other"], expect: recipientEditor(404),
  },
  {
    name: "DELETE /api/v1/vessels/:id/recipients/:recipientId (unknown recipient)", method: "DELETE", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/recipients/${crypto.randomUUID()}`,
    scopes: ["own", "sibling", "other"], expect: recipientEditor(404),
  },
  { name: "GET /api/v1/vessels/:id/dockings", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/dockings`, scopes: ["own", "sibling", "other"], expect: dockingPlanner(200) },
  { name: "POST /api/v1/vessels/:id/dockings", method: "POST", path: (s, sc) => `/api/v1/vessels/${vesselOf(s, sc).id}/dockings`, body: () => DOCKING_BODY, scopes: ["own", "sibling", "other"], expect: dockingPlanner(201) },
  { name: "GET /api/v1/dockings/:id", path: dockingPath, scopes: ["own", "sibling", "other"], expect: dockingPlanner(200) },
  {
    name: "PUT /api/v1/dockings/:id/items (unknown item)", method: "PUT", path: (s, sc) => `${dockingPath(s, sc)}/items`,
    body: () => ({ items: [{ id: crypto.randomUUID(), included: true }] }), scopes: ["own", "sibling", "other"], expect: dockingPlanner(404),
  },
  {
    name: "POST /api/v1/dockings/:id/items", method: "POST", path: (s, sc) => `${dockingPath(s, sc)}/items`,
    body: () => ({ description: "Staging in the matrix tank for access", quantity: 1, unit: "lump sum", unitRate: 1, reason: "Matrix check" }), scopes: ["own", "sibling", "other"], expect: dockingPlanner(201),
  },
  {
    name: "DELETE /api/v1/dockings/:id/items/:itemId (unknown item)", method: "DELETE", path: (s, sc) => `${dockingPath(s, sc)}/items/${crypto.randomUUID()}`,
    scopes: ["own", "sibling", "other"], expect: dockingPlanner(404),
  },
  { name: "POST /api/v1/dockings/:id/rebuild", method: "POST", path: (s, sc) => `${dockingPath(s, sc)}/rebuild`, scopes: ["own", "sibling", "other"], expect: dockingPlanner(200) },
  { name: "GET /api/v1/dockings/:id/work-list.csv", path: (s, sc) => `${dockingPath(s, sc)}/work-list.csv`, scopes: ["own", "sibling", "other"], expect: dockingPlanner(200) },
  { name: "PUT /api/v1/dockings/:id (details as they are)", method: "PUT", path: dockingPath, body: () => DOCKING_BODY, scopes: ["own", "sibling", "other"], expect: dockingPlanner(200) },
  { name: "PUT /api/v1/dockings/:id (not-ISO currency)", method: "PUT", path: dockingPath, body: () => ({ ...DOCKING_BODY, currency: "XXQ" }), scopes: ["own", "sibling", "other"], expect: dockingPlanner(400) },
  { name: "PUT /api/v1/dockings/:id/status (unknown status)", method: "PUT", path: (s, sc) => `${dockingPath(s, sc)}/status`, body: () => ({ status: "finished" }), scopes: ["own", "sibling", "other"], expect: dockingPlanner(400) },
  {
    name: "PUT /api/v1/dockings/:id/done (planned docking)", method: "PUT", path: (s, sc) => `${dockingPath(s, sc)}/done`,
    body: () => ({ itemIds: [crypto.randomUUID()], done: true }), scopes: ["own", "sibling", "other"], expect: dockingPlanner(409),
  },
  { name: "GET /api/v1/dockings/:id/work-list.pdf", path: (s, sc) => `${dockingPath(s, sc)}/work-list.pdf`, scopes: ["own", "sibling", "other"], expect: dockingPlanner(200) },
  { name: "page /vessels/:id/dockings", path: (s, sc) => `/vessels/${vesselOf(s, sc).id}/dockings`, scopes: ["own", "sibling", "other"], expect: page((w, sc) => office(w) && sc !== "other") },
  { name: "page /vessels/:id/dockings/new", path: (s, sc) => `/vessels/${vesselOf(s, sc).id}/dockings/new`, scopes: ["own", "sibling", "other"], expect: page((w, sc) => office(w) && sc !== "other") },
  { name: "page /dockings/:id", path: (s, sc) => `/dockings/${dockingOf.get(vesselOf(s, sc).id)}`, scopes: ["own", "sibling", "other"], expect: page((w, sc) => office(w) && sc !== "other") },
  { name: "page /inspections/:id", path: (s, sc) => `/inspections/${s.inspectionOf(vesselOf(s, sc).id)}`, scopes: ["own", "sibling", "other"], expect: (w, sc) => (w === "anonymous" ? 307 : vesselReader(w, sc)) },
  { name: "page /inspections/:id/report", path: (s, sc) => `/inspections/${s.inspectionOf(vesselOf(s, sc).id)}/report`, scopes: ["own", "sibling", "other"], expect: (w, sc) => (w === "anonymous" ? 307 : vesselReader(w, sc)) },
  {
    name: "page /vessels/:id/inspections/new", path: (s, sc) => `/vessels/${vesselOf(s, sc).id}/inspections/new`, scopes: ["own", "sibling", "other"],
    expect: (w, sc) => (w === "anonymous" ? 307 : inspector(w, sc, 200) === 403 ? 404 : inspector(w, sc, 200)),
  },
  { name: "GET /api/v1/users", path: () => "/api/v1/users", scopes: ["own"], expect: adminOnly(200) },
  {
    name: "POST /api/v1/users", method: "POST", path: () => "/api/v1/users", scopes: ["own"],
    body: (s) => ({ email: `new-${Math.random().toString(36).slice(2)}-${s.run}@tests.tankwright.test`, name: "New person", password: "a-long-enough-password", role: "superintendent" }),
    expect: adminOnly(201),
  },
  {
    name: "POST /api/v1/users/:id/memberships", method: "POST",
    path: (s, sc) => `/api/v1/users/${sc === "other" ? s.otherAdmin.id : s.spare.id}/memberships`,
    body: (s, sc) => ({ role: "officer", vesselId: sc === "other" ? s.otherVessel.id : s.siblingVessel.id }),
    scopes: ["own", "other"], expect: adminOnlyScoped(201),
  },
  {
    name: "DELETE /api/v1/memberships/:id", method: "DELETE",
    path: (s, sc) => `/api/v1/memberships/${sc === "other" ? s.otherAdmin.membershipId : s.spare.membershipId}`,
    scopes: ["other", "own"], expect: adminOnlyScoped(200),
  },
  { name: "page /fleet", path: () => "/fleet", scopes: ["own"], expect: page((w) => w !== "surveyor") },
  { name: "page /fleet?vessel=:id", path: (s, sc) => `/fleet?vessel=${vesselOf(s, sc).id}`, scopes: ["own", "sibling", "other"], expect: (w, sc) => (w === "anonymous" ? 307 : vesselReader(w, sc)) },
  { name: "GET /api/v1/fleet", path: () => "/api/v1/fleet", scopes: ["own"], expect: (w) => (w === "anonymous" ? 401 : w === "surveyor" ? 403 : 200) },
  { name: "GET /api/v1/fleet?vessel=:id", path: (s, sc) => `/api/v1/fleet?vessel=${vesselOf(s, sc).id}`, scopes: ["own", "sibling", "other"], expect: vesselReader },
  { name: "page /vessels", path: () => "/vessels", scopes: ["own"], expect: page(() => true) },
  { name: "page /vessels/:id", path: (s, sc) => `/vessels/${vesselOf(s, sc).id}`, scopes: ["own", "sibling", "other"], expect: (w, sc) => (w === "anonymous" ? 307 : vesselReader(w, sc)) },
  { name: "page /shared", path: () => "/shared", scopes: ["own"], expect: page((w) => w === "surveyor") },
  { name: "page /admin", path: () => "/admin", scopes: ["own"], expect: page((w) => w === "admin") },
  { name: "page /admin/users", path: () => "/admin/users", scopes: ["own"], expect: page((w) => w === "admin") },
  { name: "page /admin/vessels", path: () => "/admin/vessels", scopes: ["own"], expect: page((w) => w === "admin") },
  { name: "page /admin/vessels/new", path: () => "/admin/vessels/new", scopes: ["own"], expect: page((w) => w === "admin") },
  {
    name: "page /admin/vessels/:id", path: (s, sc) => `/admin/vessels/${vesselOf(s, sc).id}`, scopes: ["own", "sibling", "other"],
    expect: (w, sc) => (w === "anonymous" ? 307 : w === "admin" && sc !== "other" ? 200 : 404),
  },
];

let scenario: TScenario;
const clients = new Map<TWho, TClient>();

beforeAll(async () => {
  scenario = await buildScenario();
  for (const v of [scenario.ownVessel, scenario.siblingVessel, scenario.otherVessel]) {
    const [d] = await testDb().insert(dockings).values({ orgId: v.orgId, vesselId: v.id, ...DOCKING_BODY }).returning({ id: dockings.id });
    dockingOf.set(v.id, d!.id);
  }
  clients.set("anonymous", anonymousClient());
  for (const role of ROLES) clients.set(role, await signIn(scenario.users[role].email, PASSWORD));
});

describe("authorization matrix", () => {
  // Runs the admin's DELETE last for each scope, after every other role was refused.
  const WHO: TWho[] = ["anonymous", "officer", "master", "superintendent", "surveyor", "admin"];
  for (const c of CASES) {
    for (const scope of c.scopes) {
      for (const who of WHO) {
        const expected = () => c.expect(who, scope);
        it(`${c.name} · ${who} · ${scope} vessel`, async () => {
          const res = await clients.get(who)!.request(c.path(scenario, scope), {
            method: c.method ?? "GET",
            ...(c.rawBody ? { body: c.rawBody, headers: { "content-type": "text/csv" } } : { json: c.body?.(scenario, scope) }),
          });
          expect(res.status, `${c.name} as ${who} on ${scope}`).toBe(expected());
          if (res.status === 404 && c.name.startsWith("GET /api")) {
            // A refused record is not leaked in the body.
            const text = await res.text();
            expect(text).not.toContain(vesselOf(scenario, scope).name);
          }
        });
      }
    }
  }

  it("the refused DELETE of another company's role changed nothing", async () => {
    const row = await testDb().query.memberships.findFirst({ where: eq(memberships.id, scenario.otherAdmin.membershipId) });
    expect(row).toBeDefined();
  });

  it("an officer's vessel list holds only their own vessel; a surveyor's is empty", async () => {
    const officer = (await (await clients.get("officer")!.request("/api/v1/vessels")).json()) as { vessels: { id: string }[] };
    expect(officer.vessels.map((v) => v.id)).toEqual([scenario.ownVessel.id]);
    const surveyor = (await (await clients.get("surveyor")!.request("/api/v1/vessels")).json()) as { vessels: unknown[] };
    expect(surveyor.vessels).toEqual([]);
  });
});
