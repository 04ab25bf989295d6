import { z } from "zod";
import { DOCKING_STATUSES } from "@/lib/vocabulary";
import { blankParam, numberFromForm, optionalText, searchParamReader, wholeParam } from "./common";

// A docking (yard, place, planned date, currency, unit rates) and the
// superintendent's decision on one work-list item.

const CURRENCIES = new Set(Intl.supportedValuesOf("currency"));
const MAX_RATE = 1_000_000_000;

const isCalendarDate = (iso: string) => {
  const [y, m, d] = iso.split("-").map(Number) as [number, number, number];
  const at = new Date(Date.UTC(y, m - 1, d));
  return at.getUTCFullYear() === y && at.getUTCMonth() === m - 1 && at.getUTCDate() === d;
};
const isoDate = z
  .string({ error: "is required" })
  .regex(/^\d{4}-\d{2}-\d{2}$/, { error: "must be a date like 2026-03-14", abort: true })
  .refine(isCalendarDate, "is not a calendar date");

const rate = (per: string) =>
  z.preprocess(
    numberFromForm,
    z
      .number({ error: (i) => (i.input === undefined ? `is required: the price ${per}` : `must be a number: the price ${per}`) })
      .min(0, "cannot be negative")
      .max(MAX_RATE, `must be at most ${MAX_RATE.toLocaleString("en")}`),
  );

/** An ISO 4217 code the runtime knows as a currency (USD, EUR, JPY …); lower case is accepted and upper-cased. */
export const ZCurrencyCode = z
  .string({ error: "is required: a currency code such as USD or EUR" })
  .trim()
  .toUpperCase()
  .refine((c) => /^[A-Z]{3}$/.test(c) && CURRENCIES.has(c), "must be an ISO 4217 currency code such as USD or EUR");

export const ZDockingInput = z.object({
  yard: z.string({ error: "is required" }).trim().min(2, "name the yard").max(120, "must be at most 120 characters"),
  place: z.string({ error: "is required" }).trim().min(2, "name the place or port").max(120, "must be at most 120 characters"),
  plannedOn: isoDate,
  currency: ZCurrencyCode,
  steelRatePerKg: rate("per kg of steel"),
  coatingRatePerM2: rate("per m² of coating repair"),
  anodeRatePerPiece: rate("per anode"),
  sedimentRatePerM3: rate("per m³ of sediment"),
});
export type TDockingInput = z.infer<typeof ZDockingInput>;

/** Include or exclude an item, or replace its quantity: an adjustment needs a reason (kept in the audit log). */
export const ZDockingItemDecisionInput = z
  .object({
    included: z.boolean({ error: "say whether the item is included" }),
    adjustedQuantity: z.preprocess(
      numberFromForm,
      z.number({ error: "must be a number" }).min(0, "cannot be negative").max(MAX_RATE, `must be at most ${MAX_RATE.toLocaleString("en")}`).nullable().optional(),
    ),
    adjustmentReason: optionalText(500),
  })
  .superRefine((d, ctx) => {
    const adjusted = d.adjustedQuantity !== undefined && d.adjustedQuantity !== null;
    if (adjusted && !d.adjustmentReason) ctx.addIssue({ code: "custom", path: ["adjustmentReason"], message: "is required: say why the quantity was changed" });
    if (adjusted && d.adjustmentReason && d.adjustmentReason.length < 3) ctx.addIssue({ code: "custom", path: ["adjustmentReason"], message: "say why the quantity was changed, in a few words" });
  });
export type TDockingItemDecisionInput = z.infer<typeof ZDockingItemDecisionInput>;

/** The body of PUT /api/v1/dockings/{id}/items: decisions on one or more items at once. */
export const ZDockingDecisions = z.object({
  items: z
    .array(z.object({ id: z.string({ error: "is required" }) }).and(ZDockingItemDecisionInput))
    .min(1, "name at least one item")
    .max(1000, "at most 1000 items at once"),
});

/**
 * Words that only say "something else" and give a yard nothing to price:
 * a hand-added item must say what the yard is to do.
 */
const CATCH_ALL = /^(misc(ellaneous)?\.?|sundr(y|ies)|various|extras?|other( works?)?|etc\.?|as (required|needed|per (yard|quote|quotation))|see (quote|quotation|attached)|tbd|tba|n\/?a)( (works?|items?|jobs?|services?))?$/i;

/** What the yard is to do, in a few words: "Staging in 3P for bracket renewal", "Gas-freeing and ventilation, 4 tanks". */
const workDescription = z
  .string({ error: "is required: say what the yard is to do" })
  .trim()
  .max(300, "must be at most 300 characters")
  .refine((d) => d.length > 0, { error: "is required: say what the yard is to do", abort: true })
  .refine((d) => !CATCH_ALL.test(d.replace(/\s+/g, " ")), { error: "only says \"other work\": say what the yard is to do, e.g. \"Staging in 3P for bracket renewal\"", abort: true })
  .refine((d) => d.split(/\s+/).filter((w) => /[\p{L}\d]/u.test(w)).length >= 3 && d.length >= 10, "is too short for a yard to price: say what is to be done, and where, in at least three words");

const measureOf = (what: string) =>
  z.preprocess(
    numberFromForm,
    z
      .number({ error: (i) => (i.input === undefined ? `is required: ${what}` : `must be a number: ${what}`) })
      .min(0, "cannot be negative")
      .max(MAX_RATE, `must be at most ${MAX_RATE.toLocaleString("en")}`),
  );

/**
 * Work the superintendent adds by hand ("other"): not asked for by any
 * finding, priced at its own rate in the docking's currency. The tank is
 * optional (a surveyor's attendance belongs to no tank); the server checks
 * that a given tank is one of the docking's vessel.
 */
export const ZDockingOtherItemInput = z.object({
  description: workDescription,
  tankId: z.preprocess(blankParam, z.uuid({ error: "must be a tank of the vessel" }).optional()),
  quantity: measureOf("how many units"),
  unit: z
    .string({ error: "is required: lump sum, days, m², pcs …" })
    .trim()
    .min(1, "is required: lump sum, days, m², pcs …")
    .max(20, "must be at most 20 characters"),
  unitRate: rate("per unit, in the docking's currency"),
  reason: z
    .string({ error: "is required: say why the item is added" })
    .trim()
    .min(1, "is required: say why the item is added")
    .max(500, "must be at most 500 characters")
    .refine((r) => r.length >= 5, "say why the item is added, in a few words"),
});
export type TDockingOtherItemInput = z.infer<typeof ZDockingOtherItemInput>;

/** Start, complete or cancel a docking. */
export const ZDockingStatusInput = z.object({ status: z.enum(DOCKING_STATUSES, { error: `must be one of ${DOCKING_STATUSES.join(", ")}` }) });

/** Mark included items done (or not done) while the docking is in progress. */
export const ZDockingDoneInput = z.object({
  itemIds: z.array(z.string({ error: "must be item ids" })).min(1, "name at least one item").max(1000, "at most 1000 items at once"),
  done: z.boolean({ error: "say whether the items are done" }),
});

export const WORK_LIST_PAGE_SIZE_MAX = 500;

/** One page of a work list's items (the totals always cover every item), optionally one tank's. */
export const ZWorkListQuery = z.object({
  tank: z.preprocess(blankParam, z.uuid({ error: "tank must be the id of a tank" }).optional()),
  page: z.preprocess(blankParam, wholeParam("page", 1, 100_000).default(1)),
  pageSize: z.preprocess(blankParam, wholeParam("pageSize", 1, WORK_LIST_PAGE_SIZE_MAX).default(100)),
});
export type TWorkListQuery = z.infer<typeof ZWorkListQuery>;

export function workListQueryFromParams(params: Parameters<typeof searchParamReader>[0]) {
  const get = searchParamReader(params);
  return ZWorkListQuery.safeParse({ tank: get("tank"), page: get("page"), pageSize: get("pageSize") });
}
