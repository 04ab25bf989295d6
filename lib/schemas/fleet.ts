// The fleet overview's filters and paging, as URL search params. The page and
// GET /api/v1/fleet read them with the same schema; a bad value is refused with
// a message that names the parameter, never a crash.
import { z } from "zod";

export const FLEET_RATING_FILTERS = ["GOOD", "FAIR", "POOR", "unrated", "never"] as const;
export type TFleetRatingFilter = (typeof FLEET_RATING_FILTERS)[number];
export const FLEET_RATING_FILTER_LABELS: Record<TFleetRatingFilter, string> = {
  GOOD: "GOOD",
  FAIR: "FAIR",
  POOR: "POOR",
  unrated: "Inspected, coating not rated",
  never: "Never inspected",
};
export const FLEET_PAGE_SIZE_MAX = 200;
export const FLEET_DUE_WITHIN_MAX = 3650;

/** A blank box or an absent parameter is "not given". */
const blank = (v: unknown) => (v === "" || v === null ? undefined : v);
const whole = (what: string, min: number, max: number) =>
  z.coerce
    .number({ error: `${what} must be a whole number` })
    .refine((n) => Number.isInteger(n), `${what} must be a whole number`)
    .refine((n) => n >= min && n <= max, `${what} must be between ${min} and ${max}`);

export const ZFleetQuery = z.object({
  vessel: z.preprocess(blank, z.uuid({ error: "vessel must be the id of a vessel" }).optional()),
  rating: z.preprocess(blank, z.enum(FLEET_RATING_FILTERS, { error: `rating must be one of ${FLEET_RATING_FILTERS.join(", ")}` }).optional()),
  dueWithin: z.preprocess(blank, whole("dueWithin (days)", 0, FLEET_DUE_WITHIN_MAX).optional()),
  page: z.preprocess(blank, whole("page", 1, 100_000).default(1)),
  pageSize: z.preprocess(blank, whole("pageSize", 1, FLEET_PAGE_SIZE_MAX).default(50)),
});
export type TFleetQuery = z.infer<typeof ZFleetQuery>;

/** Search params as Next.js hands them over (a repeated key is an array: the first value counts). */
export function fleetQueryFromParams(params: Record<string, string | string[] | undefined> | URLSearchParams) {
  const get = (k: string) => {
    const v = params instanceof URLSearchParams ? params.get(k) : params[k];
    return Array.isArray(v) ? v[0] : (v ?? undefined);
  };
  return ZFleetQuery.safeParse({ vessel: get("vessel"), rating: get("rating"), dueWithin: get("dueWithin"), page: get("page"), pageSize: get("pageSize") });
}
