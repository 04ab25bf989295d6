// The fleet overview's filters and paging, as URL search params. The page and
// GET /api/v1/fleet read them with the same schema; a bad value is refused with
// a message that names the parameter, never a crash.
import { z } from "zod";
import { blankParam, searchParamReader, wholeParam } from "./common";

export const FLEET_RATING_FILTERS = ["GOOD", "FAIR", "POOR", "unrated", "never"] as const;
export type TFleetRatingFilter = (typeof FLEET_RATING_FILTERS)[number];
export const FLEET_RATING_FILTER_LABELS: Record<TFleetRatingFilter, string> = {
  GOOD: "GOOD",
  FAIR: "FAIR",
  POOR: "POOR",
  unrated: "Inspected, coating not rated",
  never: "Never inspected",
};
/** vessel: by vessel, then the structure map's order; due: the most urgent first (overdue, oldest due date first; then due now: never inspected or no interval; then the soonest). */
export const FLEET_SORTS = ["vessel", "due"] as const;
export type TFleetSort = (typeof FLEET_SORTS)[number];
export const FLEET_SORT_LABELS: Record<TFleetSort, string> = {
  vessel: "Vessel and tank",
  due: "Most urgent first",
};
export const FLEET_PAGE_SIZE_MAX = 200;
export const FLEET_DUE_WITHIN_MAX = 3650;

export const ZFleetQuery = z.object({
  vessel: z.preprocess(blankParam, z.uuid({ error: "vessel must be the id of a vessel" }).optional()),
  rating: z.preprocess(blankParam, z.enum(FLEET_RATING_FILTERS, { error: `rating must be one of ${FLEET_RATING_FILTERS.join(", ")}` }).optional()),
  dueWithin: z.preprocess(blankParam, wholeParam("dueWithin (days)", 0, FLEET_DUE_WITHIN_MAX).optional()),
  sort: z.preprocess(blankParam, z.enum(FLEET_SORTS, { error: `sort must be one of ${FLEET_SORTS.join(", ")}` }).default("vessel")),
  page: z.preprocess(blankParam, wholeParam("page", 1, 100_000).default(1)),
  pageSize: z.preprocess(blankParam, wholeParam("pageSize", 1, FLEET_PAGE_SIZE_MAX).default(50)),
});
export type TFleetQuery = z.infer<typeof ZFleetQuery>;

export function fleetQueryFromParams(params: Parameters<typeof searchParamReader>[0]) {
  const get = searchParamReader(params);
  return ZFleetQuery.safeParse({ vessel: get("vessel"), rating: get("rating"), dueWithin: get("dueWithin"), sort: get("sort"), page: get("page"), pageSize: get("pageSize") });
}
