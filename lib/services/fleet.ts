import "server-only";
// The fleet overview behind the one authorization module: the office sees every
// vessel of its company, a ship's officer or master only their own vessel.
// The database filters, counts and pages (db/queries/fleet.ts); the rows of the
// page are rated by lib/calc/coating.ts and dated by lib/office/due-dates.ts.
import { z } from "zod";
import { countFleetTanks, listCoatingForInspections, listFleetTanks, type TFleetScope, type TFleetTankRow } from "@/db/queries/fleet";
import { getOrgSettings } from "@/db/queries/organisations";
import { listVessels } from "@/db/queries/vessels";
import type { TActor } from "@/lib/auth/actor";
import { authorizeOrg, authorizeVessel } from "@/lib/auth/authorize";
import { visibleVesselScope } from "@/lib/auth/roles";
import { rateCoatingArea, rateTank, type TRating, type TTwentyPercentRule } from "@/lib/calc/coating";
import { AppError } from "@/lib/errors";
import { annualExaminationTriggers, nextInspectionDue, type TDueDate, type TDueReason } from "@/lib/office/due-dates";
import { fleetQueryFromParams, type TFleetQuery } from "@/lib/schemas/fleet";
import type { TFleetOverviewResponse, TServed } from "@/lib/schemas/responses";
import { COATING_AREA_LABELS, type TCoatingArea } from "@/lib/vocabulary";

/** Who may open a vessel's overview: its officer and master, and the office. */
export const FLEET_READERS = ["officer", "master", "superintendent", "admin"] as const;
const OFFICE = ["superintendent", "admin"] as const;

/** Today's calendar date in UTC. */
export const todayUtc = () => new Date().toISOString().slice(0, 10);

/**
 * Which vessels the actor's overview covers. A named vessel: the usual vessel
 * rules (another vessel or company → 404, a surveyor → 404 as for any vessel
 * record). No vessel: the office sees the company; an officer or master sees
 * their own vessel(s); anyone else → 403.
 */
export async function resolveFleetScope(actor: TActor, vesselId?: string): Promise<{ orgId: string; vesselIds: string[] | null; office: boolean }> {
  if (vesselId) {
    const { orgId, roles } = await authorizeVessel({ actor, vesselId, allow: FLEET_READERS });
    return { orgId, vesselIds: [vesselId], office: roles.some((r) => r === "superintendent" || r === "admin") };
  }
  try {
    const { orgId } = await authorizeOrg({ actor, allow: OFFICE });
    return { orgId, vesselIds: null, office: true };
  } catch (error) {
    if (!(error instanceof AppError && error.code === "forbidden")) throw error;
  }
  for (const [orgId, ids] of visibleVesselScope(actor.memberships)) {
    if (ids && ids.size) return { orgId, vesselIds: [...ids], office: false };
  }
  throw new AppError("forbidden", "The fleet overview is for the office, and for a vessel's officers and master.");
}

/**
 * Authorizes a request for the overview from its raw search params, then
 * validates them: a well-formed vessel id is authorized as that vessel (404 for
 * another vessel or company), anything else as the actor's own scope, so a
 * bad filter value earns a validation message only from someone allowed in.
 */
export async function authorizeFleetQuery(actor: TActor, params: Parameters<typeof fleetQueryFromParams>[0]) {
  const raw = params instanceof URLSearchParams ? params.get("vessel") : params.vessel;
  const vessel = z.uuid().safeParse(Array.isArray(raw) ? raw[0] : raw);
  await resolveFleetScope(actor, vessel.success ? vessel.data : undefined);
  return fleetQueryFromParams(params);
}

export type TFleetTankRating = { rating: TRating; worstArea: TCoatingArea; worstAreaLabel: string; breakdownPct: number; rustedPct: number; decidedBy: string };
export type TFleetTank = {
  tankId: string;
  vesselId: string;
  vesselName: string;
  code: string;
  name: string;
  lastInspection: { id: string; inspectedOn: string; revision: number } | null;
  /** null: countersigned inspections without a coating record, or never inspected. */
  rating: TFleetTankRating | null;
  /** null when the company has set no inspection interval for this vessel. */
  due: TDueDate | null;
  reasons: TDueReason[];
};

function rateRow(coating: Awaited<ReturnType<typeof listCoatingForInspections>>, rule: TTwentyPercentRule): TFleetTankRating | null {
  const areas = coating.map((c) => ({ ...c, rating: rateCoatingArea(c, rule) }));
  const rated = rateTank(areas);
  if (!rated) return null;
  // Among the areas that share the tank's rating, show the one with the most breakdown or rust.
  const extent = (a: (typeof areas)[number]) => Math.max(a.breakdownPct, a.rustedPct);
  const w = areas.filter((a) => a.rating.rating === rated.rating).reduce((x, a) => (extent(a) > extent(x) ? a : x));
  return { rating: rated.rating, worstArea: w.area, worstAreaLabel: COATING_AREA_LABELS[w.area], breakdownPct: w.breakdownPct, rustedPct: w.rustedPct, decidedBy: w.rating.decidedBy };
}

function dueOf(row: TFleetTankRow, rating: TRating | null, today: string): { due: TDueDate | null; reasons: TDueReason[] } {
  const tank = { vesselType: row.vesselType, tankKind: row.kind, coatingSystem: row.coatingSystem };
  const last = row.inspectedOn ? { inspectedOn: row.inspectedOn, rating } : null;
  if (!row.intervals) {
    const reasons: TDueReason[] = [
      { kind: "interval", text: "The company has not set inspection intervals for this vessel: ask the superintendent to set them." },
      ...annualExaminationTriggers({ tank, rating, today }),
    ];
    return { due: null, reasons };
  }
  const due = nextInspectionDue({ tank, last, intervals: row.intervals, today });
  return { due, reasons: due.reasons };
}

const RANK: Record<TRating, number> = { GOOD: 0, FAIR: 1, POOR: 2 };

export async function getFleetOverviewAs(actor: TActor, query: TFleetQuery, today: string = todayUtc()) {
  const { orgId, vesselIds, office } = await resolveFleetScope(actor, query.vessel);
  const settings = await getOrgSettings({ orgId });
  const scope: TFleetScope = { orgId, vesselIds, twentyPercentRule: settings?.twentyPercentRule ?? "table", today };
  const filters = { rating: query.rating, dueWithin: query.dueWithin };
  const offset = (query.page - 1) * query.pageSize;
  const [counts, rows, vessels] = await Promise.all([
    countFleetTanks({ scope, filters }),
    listFleetTanks({ scope, filters, sort: query.sort, limit: query.pageSize, offset }),
    // The vessels the actor may choose between in the filter.
    office ? listVessels({ orgId }) : listVessels({ orgId, vesselIds: [...visibleVesselScope(actor.memberships).get(orgId) ?? vesselIds ?? []] }),
  ]);
  const coating = await listCoatingForInspections({ orgId, inspectionIds: rows.flatMap((r) => (r.inspectionId ? [r.inspectionId] : [])) });
  const tanks: TFleetTank[] = rows.map((row) => {
    const rating = row.inspectionId ? rateRow(coating.filter((c) => c.inspectionId === row.inspectionId), scope.twentyPercentRule) : null;
    if ((rating ? RANK[rating.rating] : null) !== row.ratingRank) {
      console.error(`[tankwright] fleet overview: SQL rank ${row.ratingRank} and lib rating ${rating?.rating ?? "none"} disagree for inspection ${row.inspectionId}`);
    }
    return {
      tankId: row.tankId,
      vesselId: row.vesselId,
      vesselName: row.vesselName,
      code: row.code,
      name: row.tankName,
      lastInspection: row.inspectionId && row.inspectedOn ? { id: row.inspectionId, inspectedOn: row.inspectedOn, revision: row.revision ?? 1 } : null,
      rating,
      ...dueOf(row, rating?.rating ?? null, today),
    };
  });
  const totalPages = Math.max(1, Math.ceil(counts.matching / query.pageSize));
  return {
    orgId,
    today,
    query,
    vessels: vessels.map((v) => ({ id: v.id, name: v.name })),
    counts,
    paging: { page: query.page, pageSize: query.pageSize, matching: counts.matching, totalPages },
    tanks,
  } satisfies TServed<TFleetOverviewResponse>;
}
export type TFleetOverview = Awaited<ReturnType<typeof getFleetOverviewAs>>;
