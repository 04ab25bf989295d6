import "server-only";
// The fleet overview in SQL: every tank in scope with its latest countersigned
// inspection and the coating rank of its worst area (tank_latest_inspections,
// kept by database triggers, see db/schema.ts), the interval that applies (the
// vessel's own inspection_intervals row, else the company's) and the due date. Filters, ordering, LIMIT/OFFSET and the
// counts run in the database: no page loads the fleet into memory.
//
// Rating and due date are computed here to filter, count and page. The rows
// shown are rated again by lib/calc/coating.ts and dated by
// lib/office/due-dates.ts, where the rules live; tests/integration/fleet.test.ts
// checks that the two agree at every threshold.
import { and, eq, inArray, sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { coatingAreas } from "@/db/schema";
import type { TTwentyPercentRule } from "@/lib/calc/coating";
import type { TCoatingSystem } from "@/lib/office/due-dates";
import type { TFleetRatingFilter, TFleetSort } from "@/lib/schemas/fleet";
import type { TCoatingArea, TTankKind, TTankSide, TVesselType } from "@/lib/vocabulary";

export type TFleetScope = {
  orgId: string;
  /** null: every vessel of the company; otherwise these vessels only. */
  vesselIds: readonly string[] | null;
  twentyPercentRule: TTwentyPercentRule;
  /** The calendar day (YYYY-MM-DD, UTC) that "overdue" and "due within" count from. */
  today: string;
};
export type TFleetFilters = { rating?: TFleetRatingFilter; dueWithin?: number };

/** Days ahead that the "due within 30 days" count looks; its card links to `dueWithin=DUE_SOON_DAYS`. */
export const DUE_SOON_DAYS = 30;

/**
 * "Due within N days", the one definition the filter and the count share: due
 * by today + N, so an overdue tank is included, and a tank never inspected or
 * with no interval set (no due date) is due now (as isDueWithin in
 * lib/office/due-dates.ts).
 */
function dueWithinWhere(days: number, today: string): SQL {
  return sql`(due_on is null or due_on <= ${today}::date + ${days}::int)`;
}

/** Tie-breaks shared by both orders: vessel, the structure map's order, code, id. */
const VESSEL_ORDER = sql`vessel_name, vessel_id, sort_order, code, tank_id`;
const orderBy = (sort: TFleetSort, today: string): SQL =>
  sort === "vessel"
    ? VESSEL_ORDER
    : // Most urgent first: overdue (oldest due date first), then due now (never inspected, no interval: due today), then the soonest.
      sql`coalesce(due_on, ${today}::date) asc, due_on is null, ${VESSEL_ORDER}`;

/** `with … dated`: one row per tank in scope. Every table is read with the company in its where. */
function datedTanks(scope: TFleetScope): SQL {
  const { orgId, vesselIds } = scope;
  const vesselWhere = vesselIds ? sql`and t.vessel_id in (${sql.join(vesselIds.map((id) => sql`${id}::uuid`), sql`, `)})` : sql``;
  // The stored rank under the company's reading of the 20 % boundary (db/schema.ts tankLatestInspections).
  const rank = scope.twentyPercentRule === "wording" ? sql`tl.rank_wording` : sql`tl.rank_table`;
  return sql`
    with scoped as (
      select t.id as tank_id, t.vessel_id, t.code, t.name as tank_name, t.kind, t.side, t.coating_system, t.sort_order,
             v.name as vessel_name, v.vessel_type,
             tl.inspection_id, tl.inspected_on, tl.revision,
             iv.default_months, iv.below_good_months, iv.vessel_id is not null as intervals_vessel_own, ${rank} as rating_rank
      from tanks t
      join vessels v on v.id = t.vessel_id and v.org_id = ${orgId}::uuid
      left join tank_latest_inspections tl on tl.tank_id = t.id and tl.org_id = ${orgId}::uuid
      left join lateral (
        select ii.default_months, ii.below_good_months, ii.vessel_id from inspection_intervals ii
        where ii.org_id = ${orgId}::uuid and (ii.vessel_id = t.vessel_id or ii.vessel_id is null)
        order by ii.vessel_id nulls last
        limit 1
      ) iv on true
      where t.org_id = ${orgId}::uuid ${vesselWhere}
    ), dated as (
      select s.*,
        case
          when s.inspection_id is null or s.default_months is null then null
          when s.rating_rank = 0 then (s.inspected_on + make_interval(months => s.default_months))::date
          else (s.inspected_on + make_interval(months => least(s.below_good_months, s.default_months)))::date
        end as due_on
      from scoped s
    )`;
}

function filterWhere(filters: TFleetFilters, today: string): SQL {
  const parts: SQL[] = [sql`true`];
  const rank = { GOOD: 0, FAIR: 1, POOR: 2 } as const;
  if (filters.rating === "never") parts.push(sql`inspection_id is null`);
  else if (filters.rating === "unrated") parts.push(sql`inspection_id is not null and rating_rank is null`);
  else if (filters.rating) parts.push(sql`rating_rank = ${rank[filters.rating]}`);
  if (filters.dueWithin !== undefined) parts.push(dueWithinWhere(filters.dueWithin, today));
  return sql.join(parts, sql` and `);
}

export type TFleetTankRow = {
  tankId: string;
  vesselId: string;
  vesselName: string;
  vesselType: TVesselType;
  code: string;
  tankName: string;
  kind: TTankKind;
  side: TTankSide;
  coatingSystem: TCoatingSystem;
  inspectionId: string | null;
  inspectedOn: string | null;
  revision: number | null;
  /** vesselOwn: the vessel's own inspection_intervals row applies, not the company's. */
  intervals: { defaultMonths: number; belowGoodMonths: number; vesselOwn: boolean } | null;
  /** SQL's rank (0 GOOD, 1 FAIR, 2 POOR, null unrated): for the parity test; the page shows lib's rating. */
  ratingRank: number | null;
  dueOn: string | null;
};

/** One page of tanks, ordered by vessel (then the structure map's order, then code) or most urgent first. */
export async function listFleetTanks({ scope, filters, sort = "vessel", limit, offset }: { scope: TFleetScope; filters: TFleetFilters; sort?: TFleetSort; limit: number; offset: number }): Promise<TFleetTankRow[]> {
  const res = await db().execute<Record<string, unknown>>(sql`
    ${datedTanks(scope)}
    select tank_id, vessel_id, vessel_name, vessel_type, code, tank_name, kind, side, coating_system,
           inspection_id, to_char(inspected_on, 'YYYY-MM-DD') as inspected_on, revision,
           default_months, below_good_months, intervals_vessel_own, rating_rank, to_char(due_on, 'YYYY-MM-DD') as due_on
    from dated
    where ${filterWhere(filters, scope.today)}
    order by ${orderBy(sort, scope.today)}
    limit ${limit} offset ${offset}`);
  return res.rows.map((r) => ({
    tankId: String(r.tank_id),
    vesselId: String(r.vessel_id),
    vesselName: String(r.vessel_name),
    vesselType: r.vessel_type as TVesselType,
    code: String(r.code),
    tankName: String(r.tank_name),
    kind: r.kind as TTankKind,
    side: r.side as TTankSide,
    coatingSystem: r.coating_system as TCoatingSystem,
    inspectionId: (r.inspection_id as string | null) ?? null,
    inspectedOn: (r.inspected_on as string | null) ?? null,
    revision: r.revision === null ? null : Number(r.revision),
    intervals: r.default_months === null ? null : { defaultMonths: Number(r.default_months), belowGoodMonths: Number(r.below_good_months), vesselOwn: r.intervals_vessel_own === true },
    ratingRank: r.rating_rank === null ? null : Number(r.rating_rank),
    dueOn: (r.due_on as string | null) ?? null,
  }));
}

/** dueSoon: the tanks `dueWithin: DUE_SOON_DAYS` lists (overdue, never inspected and no interval included). */
export type TFleetCounts = { tanks: number; overdue: number; dueSoon: number; poor: number; fair: number; good: number; unrated: number; neverInspected: number; matching: number };

/** The counts at the top, over every tank in scope (not narrowed by the filters), and how many tanks the filters match. */
export async function countFleetTanks({ scope, filters }: { scope: TFleetScope; filters: TFleetFilters }): Promise<TFleetCounts> {
  const today = sql`${scope.today}::date`;
  const res = await db().execute<Record<string, unknown>>(sql`
    ${datedTanks(scope)}
    select count(*)::int as tanks,
           count(*) filter (where due_on < ${today})::int as overdue,
           count(*) filter (where ${dueWithinWhere(DUE_SOON_DAYS, scope.today)})::int as due_soon,
           count(*) filter (where rating_rank = 2)::int as poor,
           count(*) filter (where rating_rank = 1)::int as fair,
           count(*) filter (where rating_rank = 0)::int as good,
           count(*) filter (where inspection_id is not null and rating_rank is null)::int as unrated,
           count(*) filter (where inspection_id is null)::int as never_inspected,
           count(*) filter (where ${filterWhere(filters, scope.today)})::int as matching
    from dated`);
  const r = res.rows[0]!;
  const n = (k: string) => Number(r[k] ?? 0);
  return { tanks: n("tanks"), overdue: n("overdue"), dueSoon: n("due_soon"), poor: n("poor"), fair: n("fair"), good: n("good"), unrated: n("unrated"), neverInspected: n("never_inspected"), matching: n("matching") };
}

/** The coating areas of the inspections on one page (at most a page's worth of inspections). */
export async function listCoatingForInspections({ orgId, inspectionIds }: { orgId: string; inspectionIds: readonly string[] }) {
  if (!inspectionIds.length) return [];
  return db()
    .select({
      inspectionId: coatingAreas.inspectionId,
      area: coatingAreas.area,
      breakdownPct: coatingAreas.breakdownPct,
      rustedPct: coatingAreas.rustedPct,
      hardScalePct: coatingAreas.hardScalePct,
      edgesRustedPct: coatingAreas.edgesRustedPct,
    })
    .from(coatingAreas)
    .where(and(eq(coatingAreas.orgId, orgId), inArray(coatingAreas.inspectionId, [...inspectionIds]))) as Promise<
    { inspectionId: string; area: TCoatingArea; breakdownPct: number; rustedPct: number; hardScalePct: number; edgesRustedPct: number | null }[]
  >;
}
