import "server-only";
// The API's description. Every route handler under app/api/v1 is listed here once,
// with the zod schema that validates its body or query; the OpenAPI 3.1 document
// served at /api/v1/openapi.json is generated from this list (never written by
// hand). tests/integration/openapi.test.ts fails when a route file is missing here.
import { z } from "zod";
import { ZApiTokenInput } from "@/lib/schemas/api-token";
import { ZCommentInput } from "@/lib/schemas/comment";
import { ZIntervalsInput } from "@/lib/schemas/intervals";
import { ZDockingDecisions, ZDockingDoneInput, ZDockingInput, ZDockingOtherItemInput, ZDockingStatusInput, ZWorkListQuery } from "@/lib/schemas/docking";
import { ZFleetQuery } from "@/lib/schemas/fleet";
import { findingInputSchema, notInspectedInputSchema, sedimentInputSchema, ZAnodesInput, ZCoatingInput, ZEntryRecordInput, ZFindingsFlagInput, ZHeaderInput, ZInspectionStart, ZReadingInput, ZRemarksInput } from "@/lib/schemas/inspection";
import { ZPasswordResetConfirm, ZPasswordResetRequest } from "@/lib/schemas/password-reset";
import { photoCaptionSchema, ZDrawingUploadRequest, ZPhotoOrderInput, ZPhotoUploadRequest } from "@/lib/schemas/photo";
import { ZRecipientInput } from "@/lib/schemas/recipient";
import { ZDockingList, ZDockingWithWorkList, ZErrorBody, ZFleetOverview, ZInspectionList, ZSignedReportFingerprint, ZSigningState, ZTankList, ZVesselList } from "@/lib/schemas/responses";
import { ZAcknowledgeInput, ZShareInput } from "@/lib/schemas/share";
import { ZReturnInput, ZSignInput, ZVerifyInput } from "@/lib/schemas/signing";
import { memberInputSchema, specialFrameInputSchema, tankInputSchema } from "@/lib/schemas/tank";
import { ZMembershipInput, ZUserInput } from "@/lib/schemas/user";
import { ZVesselInput } from "@/lib/schemas/vessel";
import type { TCatalogue } from "@/lib/structure/catalogue";

type TMethod = "get" | "post" | "put" | "patch" | "delete";
/** "session-or-token": a session cookie or `Authorization: Bearer tw_…`; "session": a signed-in browser only. */
type TAuth = "session-or-token" | "session" | "public";

export type TApiOperation = {
  method: TMethod;
  /** OpenAPI form: /api/v1/vessels/{vesselId} */
  path: string;
  summary: string;
  tag: string;
  auth?: TAuth;
  /** The zod schema that validates the JSON body. */
  body?: z.ZodType;
  /** A body that is not JSON (a CSV or PDF file). */
  rawBody?: { contentTypes: string[]; description: string };
  /** The zod schema of the query string. */
  query?: z.ZodObject;
  /** The success answer; an operation with two (a redirect, or JSON on request) lists both. */
  response: TResponse | TResponse[];
};

type TResponse = {
  status: number;
  description: string;
  contentType?: string;
  /** The zod schema of a JSON answer (lib/schemas/responses.ts). */
  schema?: z.ZodType;
  headers?: Record<string, { description: string }>;
};

// Some schemas are built per vessel or tank (frames, members); their shape is the
// same for every record, and the record's own limits are checked on the server.
const ANY_TANK = { code: "(the tank)", frameFrom: -50, frameTo: 1000 };
const ANY_CATALOGUE: TCatalogue = { tank: ANY_TANK, members: [], specialFrames: [] };
const ZTank = tankInputSchema({ frameFirst: -50, frameLast: 1000 });
const ZFinding = findingInputSchema(ANY_CATALOGUE);
const ZPhotoCaption = photoCaptionSchema({ catalogue: ANY_CATALOGUE, photoId: "00000000-0000-0000-0000-000000000000", peers: [], findingIds: [] });

/** Every inspection write carries the version the writer read (409 when it is stale). */
const ZWriteVersion = z.object({ version: z.number().int().positive().describe("The inspection's version you read; a stale one is refused with 409.") });
const versioned = (schema: z.ZodType) => z.intersection(ZWriteVersion, schema);

/** The parts of an inspection written by PUT …/sections/{section}: one body schema each. */
const SECTION_BODIES = {
  header: ZHeaderInput,
  entry: ZEntryRecordInput,
  coating: ZCoatingInput,
  anodes: ZAnodesInput,
  sediment: sedimentInputSchema(ANY_TANK),
  "not-inspected": notInspectedInputSchema(ANY_CATALOGUE),
  remarks: ZRemarksInput,
  "findings-flag": ZFindingsFlagInput,
  "photo-order": ZPhotoOrderInput,
} as const;

const PDF = "application/pdf";
const JSON_TYPE = "application/json";
const ok = (description: string, status = 200, contentType?: string, schema?: z.ZodType): TResponse => ({ status, description, contentType, schema });
/** A JSON answer documented by its response schema. */
const okJson = (description: string, schema: z.ZodType, status = 200) => ok(description, status, JSON_TYPE, schema);
/** A file download; OpenAPI 3.1 describes binary bodies by media type alone (no schema). */
const okFile = (description: string, contentType: string, disposition: string): TResponse => ({
  ...ok(description, 200, contentType),
  headers: { "Content-Disposition": { description: `${disposition}, with the file's name.` } },
});
const redirect = (description: string): TResponse => ({ ...ok(description, 302), headers: { Location: { description: "A short-lived (presigned) storage URL." } } });

export const API_OPERATIONS: TApiOperation[] = [
  // ---- account
  { method: "get", path: "/api/v1/me", tag: "Account", summary: "The signed-in user and their roles", response: ok("The user and their memberships.") },
  { method: "get", path: "/api/v1/me/tokens", tag: "Account", auth: "session", summary: "Your personal API tokens (admin, superintendent)", response: ok("Name, creation, last use and revocation of each token; never the token itself.") },
  { method: "post", path: "/api/v1/me/tokens", tag: "Account", auth: "session", summary: "Create a personal API token (admin, superintendent)", body: ZApiTokenInput, response: ok("The token's clear text (`token`), shown this once; only its SHA-256 is stored.", 201) },
  { method: "delete", path: "/api/v1/me/tokens/{tokenId}", tag: "Account", auth: "session", summary: "Revoke one of your API tokens", response: ok("The revoked token; it stops working at once.") },
  { method: "post", path: "/api/v1/password-reset", tag: "Account", auth: "public", summary: "Ask for a password reset e-mail", body: ZPasswordResetRequest, response: ok("The same answer whether or not the address has an account.") },
  { method: "post", path: "/api/v1/password-reset/confirm", tag: "Account", auth: "public", summary: "Choose a new password with the e-mailed token", body: ZPasswordResetConfirm, response: ok("The password is changed.") },
  // ---- users (admin)
  { method: "get", path: "/api/v1/users", tag: "Users", summary: "The company's users and roles (admin)", response: ok("Every user with each role.") },
  { method: "post", path: "/api/v1/users", tag: "Users", summary: "Create a user with a first role (admin)", body: ZUserInput, response: ok("The new user.", 201) },
  { method: "post", path: "/api/v1/users/{userId}/memberships", tag: "Users", summary: "Grant a user a role (admin)", body: ZMembershipInput, response: ok("The new membership.", 201) },
  { method: "delete", path: "/api/v1/memberships/{membershipId}", tag: "Users", summary: "Remove a role (admin)", response: ok("The removed membership.") },
  // ---- vessels and tanks
  { method: "get", path: "/api/v1/vessels", tag: "Vessels", summary: "The vessels you may see", response: okJson("Every vessel of your company (office), or your own vessel (officer, master), with its number of tanks.", ZVesselList) },
  { method: "post", path: "/api/v1/vessels", tag: "Vessels", summary: "Add a vessel (admin)", body: ZVesselInput, response: ok("The new vessel.", 201) },
  { method: "get", path: "/api/v1/vessels/{vesselId}", tag: "Vessels", summary: "One vessel", response: ok("The vessel's particulars.") },
  { method: "patch", path: "/api/v1/vessels/{vesselId}", tag: "Vessels", summary: "Change a vessel's particulars", body: ZVesselInput, response: ok("The vessel as saved.") },
  { method: "get", path: "/api/v1/vessels/{vesselId}/tanks", tag: "Tanks", summary: "The vessel's tanks", response: okJson("Every tank of the vessel.", ZTankList) },
  { method: "post", path: "/api/v1/vessels/{vesselId}/tanks", tag: "Tanks", summary: "Add a tank (frames inside the vessel's)", body: ZTank, response: ok("The new tank.", 201) },
  {
    method: "post", path: "/api/v1/vessels/{vesselId}/tanks/import", tag: "Tanks", summary: "Import tanks from CSV (preview, or write with ?commit=1)",
    rawBody: { contentTypes: ["text/csv"], description: "The CSV file: code,name,side,kind,frame_from,frame_to, …" },
    query: z.object({ commit: z.enum(["1"]).optional().describe("1 writes when every row is valid; without it only the preview.") }),
    response: ok("Each row with its problems; 201 when written, 422 when a row is refused."),
  },
  { method: "get", path: "/api/v1/vessels/{vesselId}/tanks/{tankId}", tag: "Tanks", summary: "One tank with its structure catalogue", response: ok("The tank, its members and special frames.") },
  { method: "patch", path: "/api/v1/vessels/{vesselId}/tanks/{tankId}", tag: "Tanks", summary: "Change a tank", body: ZTank, response: ok("The tank as saved.") },
  { method: "delete", path: "/api/v1/vessels/{vesselId}/tanks/{tankId}", tag: "Tanks", summary: "Remove a tank that has no inspections", response: ok("The tank is removed.") },
  { method: "get", path: "/api/v1/vessels/{vesselId}/tanks/{tankId}/history", tag: "Tanks", summary: "A tank's history: every inspection, plotted series of the signed ones, recurring findings", response: ok("The history.") },
  { method: "get", path: "/api/v1/vessels/{vesselId}/tanks/{tankId}/history.pdf", tag: "Tanks", summary: "A tank's history as PDF: inspections with their signed PDFs' fingerprints, the three plots, recurring findings", response: okFile("The history.", PDF, "attachment") },
  { method: "get", path: "/api/v1/vessels/{vesselId}/tanks/{tankId}/brief.pdf", tag: "Tanks", summary: "The pre-entry brief of a tank as PDF", response: okFile("The brief.", PDF, "attachment") },
  { method: "post", path: "/api/v1/vessels/{vesselId}/tanks/{tankId}/members", tag: "Tanks", summary: "Add a structural member to the tank's catalogue", body: memberInputSchema(ANY_TANK), response: ok("The new member.", 201) },
  { method: "delete", path: "/api/v1/vessels/{vesselId}/tanks/{tankId}/members/{memberId}", tag: "Tanks", summary: "Remove a structural member", response: ok("The member is removed.") },
  { method: "post", path: "/api/v1/vessels/{vesselId}/tanks/{tankId}/special-frames", tag: "Tanks", summary: "Add a special frame (landmark)", body: specialFrameInputSchema(ANY_TANK), response: ok("The new special frame.", 201) },
  { method: "delete", path: "/api/v1/vessels/{vesselId}/tanks/{tankId}/special-frames/{specialFrameId}", tag: "Tanks", summary: "Remove a special frame", response: ok("The special frame is removed.") },
  { method: "post", path: "/api/v1/vessels/{vesselId}/tanks/{tankId}/mirror", tag: "Tanks", summary: "Create the tank's twin on the other side", response: ok("The new tank.", 201) },
  // ---- drawings and recipients
  { method: "get", path: "/api/v1/vessels/{vesselId}/drawings", tag: "Drawings", summary: "The vessel's drawings", response: ok("Every drawing.") },
  { method: "post", path: "/api/v1/vessels/{vesselId}/drawings", tag: "Drawings", summary: "Announce a drawing upload", body: ZDrawingUploadRequest, response: ok("The drawing row and a presigned PUT URL.", 201) },
  { method: "delete", path: "/api/v1/vessels/{vesselId}/drawings/{drawingId}", tag: "Drawings", summary: "Remove a drawing", response: ok("The drawing is removed.") },
  { method: "post", path: "/api/v1/vessels/{vesselId}/drawings/{drawingId}/complete", tag: "Drawings", summary: "Finish a drawing upload (the bytes are checked)", response: ok("The drawing, ready.") },
  { method: "get", path: "/api/v1/vessels/{vesselId}/drawings/{drawingId}/file", tag: "Drawings", summary: "Open a drawing", response: ok("Redirect (302) to a short-lived storage URL.", 302) },
  { method: "get", path: "/api/v1/vessels/{vesselId}/recipients", tag: "Recipients", summary: "The vessel's report recipients", response: ok("Office and class addresses.") },
  { method: "post", path: "/api/v1/vessels/{vesselId}/recipients", tag: "Recipients", summary: "Add a report recipient (office)", body: ZRecipientInput, response: ok("The new recipient.", 201) },
  { method: "put", path: "/api/v1/vessels/{vesselId}/recipients/{recipientId}", tag: "Recipients", summary: "Change a report recipient (office)", body: ZRecipientInput, response: ok("The recipient as saved.") },
  { method: "delete", path: "/api/v1/vessels/{vesselId}/recipients/{recipientId}", tag: "Recipients", summary: "Remove a report recipient (office)", response: ok("The recipient is removed.") },
  // ---- inspections
  { method: "get", path: "/api/v1/vessels/{vesselId}/inspections", tag: "Inspections", summary: "The vessel's inspections with their status and ratings", response: okJson("The vessel's inspections, newest first, each with its tank's coating rating.", ZInspectionList) },
  { method: "post", path: "/api/v1/vessels/{vesselId}/inspections", tag: "Inspections", summary: "Start an inspection (officer, master)", body: ZInspectionStart, response: ok("The new inspection.", 201) },
  { method: "get", path: "/api/v1/inspections/{inspectionId}", tag: "Inspections", summary: "One inspection with every part", response: ok("The inspection as the wizard reads it.") },
  {
    method: "put", path: "/api/v1/inspections/{inspectionId}/sections/{section}", tag: "Inspections", summary: "Save one part of an inspection (versioned; Idempotency-Key header)",
    body: z.union(Object.values(SECTION_BODIES).map(versioned)).describe(`One of the parts, chosen by {section}: ${Object.keys(SECTION_BODIES).join(", ")}.`),
    response: ok("The new version."),
  },
  { method: "post", path: "/api/v1/inspections/{inspectionId}/readings", tag: "Inspections", summary: "Add an atmosphere reading (versioned)", body: versioned(ZReadingInput), response: ok("The new version.") },
  { method: "put", path: "/api/v1/inspections/{inspectionId}/findings/{findingId}", tag: "Inspections", summary: "Create or update a finding with a client-chosen id (versioned)", body: versioned(ZFinding), response: ok("The new version, the finding's number and its quantities.") },
  { method: "delete", path: "/api/v1/inspections/{inspectionId}/findings/{findingId}", tag: "Inspections", summary: "Remove a finding (versioned)", body: ZWriteVersion, response: ok("The new version.") },
  { method: "get", path: "/api/v1/inspections/{inspectionId}/photos", tag: "Photos", summary: "The inspection's photos", response: ok("Every photo with its caption and links.") },
  { method: "post", path: "/api/v1/inspections/{inspectionId}/photos", tag: "Photos", summary: "Announce a photo upload", body: ZPhotoUploadRequest, response: ok("The photo row and a presigned PUT URL.", 201) },
  { method: "put", path: "/api/v1/inspections/{inspectionId}/photos/{photoId}", tag: "Photos", summary: "Caption a photo (versioned)", body: versioned(ZPhotoCaption), response: ok("The new version.") },
  { method: "delete", path: "/api/v1/inspections/{inspectionId}/photos/{photoId}", tag: "Photos", summary: "Remove a photo (versioned)", body: ZWriteVersion, response: ok("The new version.") },
  { method: "post", path: "/api/v1/inspections/{inspectionId}/photos/{photoId}/complete", tag: "Photos", summary: "Finish a photo upload (the bytes are checked, variants are made)", response: ok("The photo.") },
  {
    method: "get", path: "/api/v1/inspections/{inspectionId}/photos/{photoId}/file", tag: "Photos", summary: "Open a photo",
    query: z.object({ variant: z.enum(["thumb", "report", "original"]).optional().describe("Default: report.") }),
    response: ok("Redirect (302) to a short-lived storage URL.", 302),
  },
  // ---- signing and reports
  { method: "post", path: "/api/v1/inspections/{inspectionId}/submit", tag: "Reports", summary: "Sign and submit for countersignature (officer)", body: ZSignInput, response: ok("The inspection, submitted.") },
  { method: "post", path: "/api/v1/inspections/{inspectionId}/return", tag: "Reports", summary: "Return to the officer with comments (master)", body: ZReturnInput, response: ok("The inspection, returned.") },
  { method: "post", path: "/api/v1/inspections/{inspectionId}/countersign", tag: "Reports", summary: "Countersign (master): the signed PDF is rendered and sent", body: ZSignInput, response: ok("The inspection, countersigned.") },
  { method: "get", path: "/api/v1/inspections/{inspectionId}/revisions", tag: "Reports", summary: "Every revision of the report", response: ok("The revisions.") },
  { method: "post", path: "/api/v1/inspections/{inspectionId}/revisions", tag: "Reports", summary: "Open a new revision of a countersigned report", response: ok("The new revision.", 201) },
  { method: "get", path: "/api/v1/inspections/{inspectionId}/signatures", tag: "Reports", summary: "Signatures, return comments and the signed PDF's fingerprint", response: okJson("The signing state: signatures, return comments, the signed PDF's fingerprint and every revision.", ZSigningState) },
  { method: "get", path: "/api/v1/inspections/{inspectionId}/report", tag: "Reports", summary: "The report as it stands (draft mark until countersigned)", response: okFile("The PDF, rendered now (not the stored signed PDF, whose fingerprint is at …/signed-report?format=json).", PDF, "inline") },
  {
    method: "get", path: "/api/v1/inspections/{inspectionId}/signed-report", tag: "Reports", summary: "The signed PDF, or with ?format=json its SHA-256 fingerprint and size",
    query: z.object({ format: z.enum(["json"]).optional().describe("json: the fingerprint and size instead of the PDF.") }),
    response: [
      redirect("Redirect (302) to the stored signed PDF (application/pdf); 404 until it is rendered."),
      okJson("With format=json: the signed PDF's SHA-256 fingerprint, size and time, or null before it is rendered.", ZSignedReportFingerprint),
    ],
  },
  { method: "get", path: "/api/v1/inspections/{inspectionId}/deliveries", tag: "Reports", summary: "The e-mail deliveries of the signed report", response: ok("Each recipient and every try.") },
  { method: "post", path: "/api/v1/deliveries/{deliveryId}/resend", tag: "Reports", summary: "Send the signed report to a recipient again", response: ok("The new delivery.", 201) },
  {
    method: "post", path: "/api/v1/verify", tag: "Reports", auth: "public", summary: "Is this a signed Tankwright report? (by fingerprint or the PDF itself)",
    body: ZVerifyInput, rawBody: { contentTypes: [PDF, "multipart/form-data"], description: "The PDF itself, or a form with a \"file\" field." },
    response: ok("Vessel, tank, date and revision of the signed report, or that it is not one."),
  },
  // ---- company settings
  { method: "get", path: "/api/v1/settings/intervals", tag: "Fleet", summary: "The company's inspection intervals and the vessels with their own (office)", response: ok("The intervals.") },
  { method: "put", path: "/api/v1/settings/intervals", tag: "Fleet", summary: "Set the company's or one vessel's inspection intervals (office)", body: ZIntervalsInput, response: ok("The intervals as saved.") },
  { method: "delete", path: "/api/v1/settings/intervals", tag: "Fleet", summary: "A vessel goes back to the company's intervals (?vesselId=)", response: ok("Done.") },
  // ---- comments from the office
  { method: "get", path: "/api/v1/inspections/{inspectionId}/comments", tag: "Reports", summary: "Comments on the report and its findings", response: ok("The comments, oldest first, and whether you may add one.") },
  { method: "post", path: "/api/v1/inspections/{inspectionId}/comments", tag: "Reports", summary: "Comment on the report or one finding (office); the ship is told by e-mail", body: ZCommentInput, response: ok("The new comment.", 201) },
  // ---- sharing with class
  { method: "get", path: "/api/v1/inspections/{inspectionId}/shares", tag: "Sharing", summary: "Who a report is shared with and who acknowledged it", response: ok("The shares; for the office, also the surveyors to share with.") },
  { method: "post", path: "/api/v1/inspections/{inspectionId}/shares", tag: "Sharing", summary: "Share a countersigned report with a surveyor (office)", body: ZShareInput, response: ok("The new share; the surveyor gets an e-mail notice.", 201) },
  { method: "delete", path: "/api/v1/inspections/{inspectionId}/shares/{shareId}", tag: "Sharing", summary: "Withdraw a share (office)", response: ok("The share is withdrawn.") },
  { method: "get", path: "/api/v1/shares", tag: "Sharing", summary: "The reports shared with you (surveyor)", response: ok("Exactly the reports shared with you.") },
  { method: "get", path: "/api/v1/shares/{shareId}/report", tag: "Sharing", summary: "The shared report's signed PDF (surveyor)", response: ok("Redirect (302) to a short-lived storage URL.", 302) },
  { method: "post", path: "/api/v1/shares/{shareId}/acknowledge", tag: "Sharing", summary: "Acknowledge a shared report, with an optional comment (surveyor)", body: ZAcknowledgeInput, response: ok("The acknowledgement; once.") },
  // ---- fleet
  { method: "get", path: "/api/v1/fleet", tag: "Fleet", summary: "The fleet overview: each tank's latest countersigned rating and due date, one page", query: ZFleetQuery, response: okJson("Counts, and one page of tanks with rating, last inspection, next due date and overdue mark.", ZFleetOverview) },
  // ---- dockings (office)
  { method: "get", path: "/api/v1/vessels/{vesselId}/dockings", tag: "Dockings", summary: "The vessel's dockings, latest planned first (office)", response: okJson("Every docking of the vessel with its rates, status, grand total and item counts.", ZDockingList) },
  { method: "post", path: "/api/v1/vessels/{vesselId}/dockings", tag: "Dockings", summary: "Plan a docking with its unit rates; its work list is gathered", body: ZDockingInput, response: ok("The new docking.", 201) },
  { method: "get", path: "/api/v1/dockings/{dockingId}", tag: "Dockings", summary: "A docking with one page of its priced work list", query: ZWorkListQuery, response: okJson("The docking, one page of items (optionally one tank's) with the cost of each, and the totals over every item.", ZDockingWithWorkList) },
  { method: "put", path: "/api/v1/dockings/{dockingId}", tag: "Dockings", summary: "Change a docking's details (yard, place, planned date, currency, unit rates) while it is planned or in progress", query: ZWorkListQuery, body: ZDockingInput, response: okJson("The docking as saved, with the page of items asked for, priced at the new rates.", ZDockingWithWorkList) },
  { method: "put", path: "/api/v1/dockings/{dockingId}/items", tag: "Dockings", summary: "Include, exclude or adjust work-list items, with a reason", query: ZWorkListQuery, body: ZDockingDecisions, response: ok("The docking as saved, with the page of items asked for.") },
  { method: "post", path: "/api/v1/dockings/{dockingId}/items", tag: "Dockings", summary: "Add work no finding asks for (staging, gas-freeing, cleaning, attendance, a lump sum) at its own unit rate, with a reason", query: ZWorkListQuery, body: ZDockingOtherItemInput, response: ok("The new item's id and the docking, with the page of items asked for.", 201) },
  { method: "delete", path: "/api/v1/dockings/{dockingId}/items/{itemId}", tag: "Dockings", summary: "Remove an item added by hand (a gathered item is excluded instead: 409)", query: ZWorkListQuery, response: ok("The docking, with the page of items asked for.") },
  { method: "post", path: "/api/v1/dockings/{dockingId}/rebuild", tag: "Dockings", summary: "Gather the work list again from the latest countersigned reports", query: ZWorkListQuery, response: ok("The docking; decisions stay with their items.") },
  { method: "get", path: "/api/v1/dockings/{dockingId}/work-list.csv", tag: "Dockings", summary: "The priced work list as CSV", response: okFile("Header, one row per item, totals per kind and the grand total.", "text/csv", "attachment") },
  { method: "put", path: "/api/v1/dockings/{dockingId}/status", tag: "Dockings", summary: "Start, complete or cancel a docking; completed and cancelled are final", query: ZWorkListQuery, body: ZDockingStatusInput, response: ok("The docking with its new status.") },
  { method: "put", path: "/api/v1/dockings/{dockingId}/done", tag: "Dockings", summary: "Mark items done while the docking is in progress; a finding closes when all its items are done", query: ZWorkListQuery, body: ZDockingDoneInput, response: ok("The closed and reopened findings, and the docking.") },
  { method: "get", path: "/api/v1/dockings/{dockingId}/work-list.pdf", tag: "Dockings", summary: "The priced work list as PDF", response: okFile("Items, totals per kind and the grand total.", PDF, "attachment") },
  { method: "get", path: "/api/v1/openapi.json", tag: "API", auth: "public", summary: "This document", response: ok("The OpenAPI 3.1 document.") },
];

const JSON_SCHEMA_OPTIONS = { target: "draft-2020-12", unrepresentable: "any" } as const;
/** "input" for what a request may send (defaults may be left out), "output" for what a response carries. */
type TSchemaIo = "input" | "output";

type TJson = Record<string, unknown>;

/** Replaces `#/$defs/x` references by the names the definitions get under components.schemas. */
function renameRefs(value: unknown, names: Map<string, string>): unknown {
  if (Array.isArray(value)) return value.map((v) => renameRefs(v, names));
  if (!value || typeof value !== "object") return value;
  return Object.fromEntries(
    Object.entries(value).map(([k, v]) => [k, k === "$ref" && typeof v === "string" && names.has(v) ? names.get(v) : renameRefs(v, names)]),
  );
}

/**
 * A zod schema as an OpenAPI 3.1 Schema Object (JSON Schema 2020-12 without its own
 * $schema). Definitions zod puts in `$defs` (recursive schemas such as the remarks'
 * rich text) move to `components` (the same definition once), so every `$ref` resolves.
 */
export function toSchemaObject(schema: z.ZodType, components: TJson = {}, io: TSchemaIo = "input"): TJson {
  const { $schema: _drop, $defs, ...rest } = z.toJSONSchema(schema, { ...JSON_SCHEMA_OPTIONS, io }) as TJson & { $defs?: Record<string, TJson> };
  if (!$defs) return rest;
  const names = new Map<string, string>();
  for (const key of Object.keys($defs)) {
    const text = JSON.stringify($defs[key]);
    const same = Object.entries(components).find(([, v]) => JSON.stringify(v) === text)?.[0];
    names.set(`#/$defs/${key}`, `#/components/schemas/${same ?? `Definition${Object.keys(components).length + names.size + 1}`}`);
  }
  for (const [key, def] of Object.entries($defs)) components[names.get(`#/$defs/${key}`)!.split("/").pop()!] = renameRefs(def, names);
  return renameRefs(rest, names) as TJson;
}

function pathParameters(path: string) {
  return [...path.matchAll(/\{(\w+)\}/g)].map(([, name]) => ({
    name: name!,
    in: "path",
    required: true,
    schema: name === "section" ? { type: "string", enum: Object.keys(SECTION_BODIES) } : name!.endsWith("Id") ? { type: "string", format: "uuid" } : { type: "string" },
  }));
}

function queryParameters(query: z.ZodObject | undefined) {
  if (!query) return [];
  const schema = toSchemaObject(query, {}) as { properties?: Record<string, Record<string, unknown>>; required?: string[] };
  return Object.entries(schema.properties ?? {}).map(([name, property]) => {
    const { description, ...rest } = property;
    return { name, in: "query", required: schema.required?.includes(name) ?? false, ...(description ? { description } : {}), schema: rest };
  });
}

const SECURITY: Record<TAuth, Record<string, string[]>[]> = {
  "session-or-token": [{ sessionCookie: [] }, { bearerToken: [] }],
  session: [{ sessionCookie: [] }],
  public: [],
};

const errorResponse = (description: string) => ({ description, content: { "application/json": { schema: { $ref: "#/components/schemas/ErrorBody" } } } });

/** Response schemas by their name under components.schemas: each is written once and referred to by $ref. */
const RESPONSE_SCHEMAS = new Map<z.ZodType, string>([
  [ZVesselList, "VesselList"],
  [ZTankList, "TankList"],
  [ZInspectionList, "InspectionList"],
  [ZSigningState, "SigningState"],
  [ZSignedReportFingerprint, "SignedReportFingerprint"],
  [ZFleetOverview, "FleetOverview"],
  [ZDockingList, "DockingList"],
  [ZDockingWithWorkList, "DockingWithWorkList"],
]);

function responseSchema(schema: z.ZodType, components: TJson) {
  const name = RESPONSE_SCHEMAS.get(schema);
  if (!name) return toSchemaObject(schema, components, "output");
  components[name] ??= toSchemaObject(schema, components, "output");
  return { $ref: `#/components/schemas/${name}` };
}

function successResponse(r: TResponse, components: TJson) {
  const headers = r.headers ? Object.fromEntries(Object.entries(r.headers).map(([name, h]) => [name, { description: h.description, schema: { type: "string" } }])) : undefined;
  const content = r.contentType ? { [r.contentType]: r.schema ? { schema: responseSchema(r.schema, components) } : {} } : undefined;
  return { description: r.description, ...(headers ? { headers } : {}), ...(content ? { content } : {}) };
}

/** The refusals an operation can answer with, each with the one error body. */
function refusals(op: TApiOperation, auth: TAuth) {
  const takesInput = Boolean(op.body || op.rawBody || op.query);
  return {
    ...(takesInput ? { "400": errorResponse("The body or query is not valid: `issues` names each field.") } : {}),
    ...(auth === "public" ? {} : { "401": errorResponse("No session, or a missing, malformed, unknown or revoked API token.") }),
    ...(auth === "public" ? {} : { "403": errorResponse("Your role does not allow this.") }),
    ...(op.path.includes("{") ? { "404": errorResponse("No such record, or one of another company or vessel than yours.") } : {}),
    ...(op.method !== "get" && auth !== "public" ? { "409": errorResponse("Someone else changed it in the meantime, the record is locked, or the value is already used.") } : {}),
    ...(op.body || op.rawBody ? { "422": errorResponse("The entry cannot be accepted as it is: `issues` says why.") } : {}),
    default: errorResponse("Another refusal (413, 415, 429) or an error, with a message safe to show."),
  };
}

function operationObject(op: TApiOperation, components: TJson) {
  const auth = op.auth ?? "session-or-token";
  const content: Record<string, unknown> = {};
  if (op.body) content["application/json"] = { schema: toSchemaObject(op.body, components) };
  for (const type of op.rawBody?.contentTypes ?? []) content[type] = { schema: { description: op.rawBody!.description } };
  const responses: Record<string, unknown> = {
    ...Object.fromEntries([op.response].flat().map((r) => [String(r.status), successResponse(r, components)])),
    ...refusals(op, auth),
  };
  return {
    operationId: `${op.method}${op.path.replace(/^\/api\/v1/, "").replace(/[{}]/g, "").replace(/[^A-Za-z0-9]+(.)?/g, (_m, c: string | undefined) => (c ?? "").toUpperCase())}`,
    summary: op.summary,
    tags: [op.tag],
    parameters: [...pathParameters(op.path), ...queryParameters(op.query)],
    ...(Object.keys(content).length ? { requestBody: { required: true, content } } : {}),
    responses,
    security: SECURITY[auth],
  };
}

/** The OpenAPI 3.1 document of /api/v1. */
export function buildOpenApiDocument() {
  const paths: Record<string, Record<string, unknown>> = {};
  const schemas: TJson = { ErrorBody: toSchemaObject(ZErrorBody, {}, "output") };
  for (const op of API_OPERATIONS) (paths[op.path] ??= {})[op.method] = operationObject(op, schemas);
  return {
    openapi: "3.1.1",
    info: {
      title: "Tankwright API",
      version: "1",
      description:
        "Ballast tank inspection reports. Authenticate with the browser session, or with a personal API token " +
        "(created by an admin or superintendent on the API tokens page) sent as `Authorization: Bearer tw_…`; " +
        "a token acts with its owner's current roles. Refusals carry `{ error: { code, message, issues } }`.",
    },
    jsonSchemaDialect: "https://spec.openapis.org/oas/3.1/dialect/base",
    servers: [{ url: "/" }],
    paths,
    components: {
      schemas,
      securitySchemes: {
        sessionCookie: { type: "apiKey", in: "cookie", name: "next-auth.session-token", description: "The browser session (__Secure-next-auth.session-token over HTTPS)." },
        bearerToken: { type: "http", scheme: "bearer", bearerFormat: "tw_ followed by 43 base64url characters", description: "A personal API token." },
      },
    },
  };
}
