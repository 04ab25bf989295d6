import { z } from "zod";
import { ERROR_STATUS, type TErrorCode } from "@/lib/errors";
import { GATHERED_KINDS, WORK_KINDS } from "@/lib/office/work-list";
import {
  COATING_AREAS,
  COATING_SYSTEMS,
  DOCKING_STATUSES,
  INSPECTION_STATUSES,
  SIGNATURE_KINDS,
  TANK_KINDS,
  TANK_SIDES,
  VESSEL_TYPES,
} from "@/lib/vocabulary";
import { FLEET_RATING_FILTERS, FLEET_SORTS } from "./fleet";

// What the public API answers: the JSON bodies of its main reads, as zod schemas.
// lib/http/openapi.ts turns them into the response schemas of /api/v1/openapi.json,
// the route handlers and services check their answers against them with
// `satisfies TServed<…>`, and tests/integration/openapi-responses.test.ts validates
// real answers against the served document. Objects are strict: a field the
// schema does not name is a field the document does not promise.

/**
 * What a service may hand to `route()` for a body of type T: JSON.stringify turns
 * a Date into its ISO string, so a timestamp may still be a Date on the server.
 */
export type TServed<T> = T extends string
  ? T | Date
  : T extends readonly (infer U)[]
    ? readonly TServed<U>[]
    : T extends object
      ? { [K in keyof T]: TServed<T[K]> }
      : T;

const ZId = z.uuid();
const ZTimestamp = z.iso.datetime().describe("UTC, ISO 8601 (2026-03-14T09:30:00.000Z).");
const ZDate = z.iso.date().describe("A calendar date, 2026-03-14.");
const ZCount = z.number().int().min(0);
const ZRating = z.enum(["GOOD", "FAIR", "POOR"]);

// ---------------------------------------------------------------- errors

export const ZErrorBody = z
  .strictObject({
    error: z.strictObject({
      code: z.enum(Object.keys(ERROR_STATUS) as [TErrorCode, ...TErrorCode[]]),
      message: z.string().describe("Safe to show to a person."),
      issues: z.array(z.strictObject({ path: z.string().describe("The field, dotted (items.0.adjustmentReason), or (body)."), message: z.string() })),
    }),
  })
  .describe("Every refusal: the code, a message for the user, and one issue per field that needs attention.");

// ---------------------------------------------------------------- vessels and tanks

/** What every vessel answer says of the vessel. */
const vesselIdentity = {
  id: ZId,
  orgId: ZId,
  name: z.string(),
  imoNumber: z.string().regex(/^[0-9]{7}$/),
  vesselType: z.enum(VESSEL_TYPES),
  flag: z.string().nullable(),
  classSociety: z.string().nullable(),
};

export const ZVesselSummary = z.strictObject({ ...vesselIdentity, tankCount: ZCount });

/** GET /api/v1/vessels */
export const ZVesselList = z.strictObject({ vessels: z.array(ZVesselSummary).describe("By name.") });

/** A vessel's particulars as stored. */
export const ZVesselRecord = z.strictObject({
  ...vesselIdentity,
  yearBuilt: z.number().int().nullable(),
  frameFirst: z.number().int(),
  frameLast: z.number().int(),
  frameSpacingMm: z.number().int().nullable(),
  midshipFromFrame: z.number().int().nullable(),
  midshipToFrame: z.number().int().nullable(),
  engineRoomFwdBulkheadFrame: z.number().int().nullable(),
  collisionBulkheadFrame: z.number().int().nullable(),
  utcOffsetMinutes: z.number().int().nullable().describe("The ship's clock against UTC, where it is known."),
  createdAt: ZTimestamp,
  updatedAt: ZTimestamp,
});

export const ZTankRecord = z.strictObject({
  id: ZId,
  orgId: ZId,
  vesselId: ZId,
  code: z.string(),
  name: z.string(),
  side: z.enum(TANK_SIDES),
  kind: z.enum(TANK_KINDS),
  frameFrom: z.number().int(),
  frameTo: z.number().int(),
  bottomAreaM2: z.number().nullable(),
  coatingSystem: z.enum(COATING_SYSTEMS),
  heatedBoundary: z.string().nullable(),
  atWaterline: z.boolean(),
  atCollisionBulkhead: z.boolean(),
  note: z.string().nullable(),
  sortOrder: z.number().int(),
  createdAt: ZTimestamp,
  updatedAt: ZTimestamp,
});

/** GET /api/v1/vessels/{vesselId}/tanks */
export const ZTankList = z.strictObject({ tanks: z.array(ZTankRecord) });

// ---------------------------------------------------------------- inspections and signed reports

export const ZInspectionSummary = z.strictObject({
  id: ZId,
  status: z.enum(INSPECTION_STATUSES),
  inspectedOn: ZDate,
  revision: z.number().int().min(1),
  place: z.string(),
  tankId: ZId,
  tankCode: z.string(),
  updatedAt: ZTimestamp,
  rating: ZRating.nullable().describe(
    "The tank's coating rating, that of its worst area (GOOD/FAIR/POOR by the IMO/IACS thresholds and the company's 20 % setting); null without a coating record. A draft is rated as recorded so far.",
  ),
});

/** GET /api/v1/vessels/{vesselId}/inspections */
export const ZInspectionList = z.strictObject({ inspections: z.array(ZInspectionSummary).describe("Newest inspection date first; at most 200.") });

export const ZSignedReportFile = z
  .strictObject({
    sha256: z.string().regex(/^[0-9a-f]{64}$/).describe("SHA-256 of the signed PDF's bytes, lower-case hex: what /api/v1/verify checks."),
    sizeBytes: z.number().int().positive(),
    createdAt: ZTimestamp,
  })
  .describe("The signed PDF; null until the master countersigns and the PDF is rendered (within a minute).");

/** GET /api/v1/inspections/{inspectionId}/signed-report?format=json */
export const ZSignedReportFingerprint = z.strictObject({ report: ZSignedReportFile.nullable() });

/** GET /api/v1/inspections/{inspectionId}/signatures */
export const ZSigningState = z.strictObject({
  may: z
    .strictObject({ countersign: z.boolean(), returnIt: z.boolean(), revise: z.boolean(), resend: z.boolean() })
    .describe("The next steps you may take, by the rules the routes enforce."),
  signatures: z.array(
    z.strictObject({
      kind: z.enum(SIGNATURE_KINDS),
      signerName: z.string(),
      signerRank: z.string().nullable(),
      typedSignature: z.string().nullable(),
      drawn: z.boolean().describe("Whether a drawn signature is stored with it."),
      signedAt: ZTimestamp,
    }),
  ),
  returnComments: z.array(z.strictObject({ id: ZId, body: z.string(), createdAt: ZTimestamp, authorName: z.string(), authorRank: z.string().nullable() })).describe("Newest first."),
  report: ZSignedReportFile.nullable(),
  revisions: z
    .array(z.strictObject({ id: ZId, revision: z.number().int().min(1), status: z.enum(INSPECTION_STATUSES), countersignedAt: ZTimestamp.nullable(), sha256: z.string().regex(/^[0-9a-f]{64}$/).nullable() }))
    .describe("Every revision of the report, oldest first, with its signed PDF's fingerprint where there is one."),
});

// ---------------------------------------------------------------- fleet

const ZDueReason = z.strictObject({
  kind: z.enum(["interval", "not_rated", "never_inspected", "class_annual", "class_may_be_annual"]),
  text: z.string(),
  source: z.string().optional().describe("The published rule the reason rests on, where there is one."),
});

export const ZFleetTank = z.strictObject({
  tankId: ZId,
  vesselId: ZId,
  vesselName: z.string(),
  code: z.string(),
  name: z.string(),
  lastInspection: z.strictObject({ id: ZId, inspectedOn: ZDate, revision: z.number().int().min(1) }).nullable().describe("The latest countersigned inspection."),
  rating: z
    .strictObject({ rating: ZRating, worstArea: z.enum(COATING_AREAS), worstAreaLabel: z.string(), breakdownPct: z.number(), rustedPct: z.number(), decidedBy: z.string() })
    .nullable()
    .describe("null: never inspected, or countersigned without a coating record."),
  due: z
    .strictObject({
      status: z.enum(["never_inspected", "overdue", "not_due"]),
      lastInspectedOn: ZDate.nullable(),
      rating: ZRating.nullable(),
      intervalMonths: z.number().int().nullable(),
      dueOn: ZDate.nullable(),
      daysUntilDue: z.number().int().nullable().describe("0 on the day, negative once overdue; null when never inspected."),
      overdue: z.boolean(),
      reasons: z.array(ZDueReason),
    })
    .nullable()
    .describe("null when the company has set no inspection interval for this vessel."),
  reasons: z.array(ZDueReason),
});

/** GET /api/v1/fleet */
export const ZFleetOverview = z.strictObject({
  orgId: ZId,
  today: ZDate,
  query: z.strictObject({
    vessel: ZId.optional(),
    rating: z.enum(FLEET_RATING_FILTERS).optional(),
    dueWithin: z.number().int().min(0).optional(),
    sort: z.enum(FLEET_SORTS),
    page: z.number().int().min(1),
    pageSize: z.number().int().min(1),
  }).describe("The filters and page as read."),
  vessels: z.array(z.strictObject({ id: ZId, name: z.string() })).describe("The vessels you may filter by."),
  counts: z
    .strictObject({ tanks: ZCount, overdue: ZCount, dueSoon: ZCount, poor: ZCount, fair: ZCount, good: ZCount, unrated: ZCount, neverInspected: ZCount, matching: ZCount })
    .describe(
      "Over every tank in scope, not narrowed by the filters; `matching` is how many the filters match. `dueSoon` counts the tanks that `dueWithin=30` lists: due by today + 30 days, overdue, never inspected, or with no interval set.",
    ),
  paging: z.strictObject({ page: z.number().int().min(1), pageSize: z.number().int().min(1), matching: ZCount, totalPages: z.number().int().min(1) }),
  tanks: z.array(ZFleetTank).describe("One page of tanks."),
});

// ---------------------------------------------------------------- dockings

export const ZDockingRecord = z.strictObject({
  id: ZId,
  orgId: ZId,
  vesselId: ZId,
  yard: z.string(),
  place: z.string(),
  plannedOn: ZDate,
  currency: z.string().regex(/^[A-Z]{3}$/).describe("ISO 4217."),
  steelRatePerKg: z.number().min(0),
  coatingRatePerM2: z.number().min(0),
  anodeRatePerPiece: z.number().min(0),
  sedimentRatePerM3: z.number().min(0),
  status: z.enum(DOCKING_STATUSES),
  createdAt: ZTimestamp,
  updatedAt: ZTimestamp,
});

/** GET /api/v1/vessels/{vesselId}/dockings */
export const ZDockingList = z.strictObject({
  vessel: z.strictObject({ id: ZId, name: z.string() }),
  dockings: z
    .array(
      z.strictObject({
        ...ZDockingRecord.shape,
        minorUnits: z.number().int().min(0).describe("Digits after the decimal point of the currency."),
        grandTotal: z.number().describe("Over every included item, in the docking's currency; rounded once, as in the docking's work list."),
        counts: z.strictObject({ included: ZCount, excluded: ZCount, adjusted: ZCount }).describe("Over every item."),
      }),
    )
    .describe("Latest planned first."),
});

const ZKindTotal = z.strictObject({
  quantity: z.number().describe("Σ quantity priced over the included items, unrounded."),
  cost: z.number().describe("Rounded to the currency's minor unit."),
  included: ZCount,
  excluded: ZCount,
});
/** Work added by hand comes in mixed units: no total quantity, only the cost and the counts. */
const ZOtherTotal = z.strictObject({ quantity: z.null(), cost: z.number(), included: ZCount, excluded: ZCount });

export const ZWorkListItem = z.strictObject({
  id: ZId,
  key: z.string().describe("The item's id."),
  tankId: ZId.nullable(),
  tankCode: z.string().nullable(),
  findingId: ZId.nullable(),
  kind: z.enum(WORK_KINDS),
  description: z.string(),
  quantity: z.number().min(0).describe("As gathered from the report."),
  unit: z.string(),
  adjustedQuantity: z.number().min(0).nullable(),
  adjustmentReason: z.string().nullable(),
  adjusted: z.boolean(),
  included: z.boolean(),
  doneAt: ZTimestamp.nullable(),
  quantityPriced: z.number().min(0).describe("The adjusted quantity where there is one."),
  unitRate: z.number().min(0).describe("The docking's rate for the kind, or a hand-added item's own rate."),
  addedReason: z.string().nullable().describe("Work added by hand (kind other): why it was added."),
  addedByName: z.string().nullable().describe("Work added by hand: who added it."),
  cost: z.number().describe("quantityPriced × unitRate, rounded; shown for excluded items too, never added to the totals."),
});

/** GET /api/v1/dockings/{dockingId}: the docking with one page of its priced work list. */
export const ZDockingWithWorkList = z.strictObject({
  vessel: ZVesselRecord,
  docking: ZDockingRecord,
  workList: z.strictObject({
    currency: z.string().regex(/^[A-Z]{3}$/),
    minorUnits: z.number().int().min(0).describe("Digits after the decimal point of the currency."),
    totals: z
      .strictObject({ ...(Object.fromEntries(GATHERED_KINDS.map((k) => [k, ZKindTotal])) as Record<(typeof GATHERED_KINDS)[number], typeof ZKindTotal>), other: ZOtherTotal })
      .describe("Per kind, over every included item (not only this page)."),
    grandTotal: z.number(),
    counts: z.strictObject({ included: ZCount, excluded: ZCount, adjusted: ZCount }).describe("Over every item."),
    items: z.array(ZWorkListItem).describe("This page's items: by tank code, kind, description."),
  }),
  paging: z.strictObject({ page: z.number().int().min(1), pageSize: z.number().int().min(1), tank: ZId.nullable(), matching: ZCount, totalPages: z.number().int().min(1) }),
  unpriced: z
    .array(z.strictObject({ tankId: ZId, tankCode: z.string(), findingId: ZId, description: z.string() }))
    .describe("Open findings the yard cannot price (no quantities)."),
  sources: z.array(z.strictObject({ tankId: ZId, tankCode: z.string(), inspectionId: ZId, inspectedOn: ZDate })).describe("Each tank's latest countersigned inspection the list was gathered from."),
});

export type TErrorBodyResponse = z.infer<typeof ZErrorBody>;
export type TVesselList = z.infer<typeof ZVesselList>;
export type TTankList = z.infer<typeof ZTankList>;
export type TInspectionList = z.infer<typeof ZInspectionList>;
export type TSignedReportFingerprint = z.infer<typeof ZSignedReportFingerprint>;
export type TSigningStateResponse = z.infer<typeof ZSigningState>;
export type TFleetOverviewResponse = z.infer<typeof ZFleetOverview>;
export type TDockingList = z.infer<typeof ZDockingList>;
export type TDockingWithWorkList = z.infer<typeof ZDockingWithWorkList>;
