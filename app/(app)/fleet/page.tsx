import type { Metadata } from "next";
import { FleetCounts } from "@/components/fleet/fleet-counts";
import { FleetFilters } from "@/components/fleet/fleet-filters";
import { Pager } from "@/components/ui/pager";
import { FleetTankTable } from "@/components/fleet/fleet-tank-table";
import { IntervalSettings } from "@/components/fleet/interval-settings";
import { RatingMark } from "@/components/ui/rating-mark";
import { VesselTable } from "@/components/fleet/vessel-table";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { DUE_SOON_DAYS } from "@/db/queries/fleet";
import { listVessels } from "@/db/queries/vessels";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import type { TFleetQuery } from "@/lib/schemas/fleet";
import { authorizeFleetQuery, getFleetOverviewAs, resolveFleetScope } from "@/lib/services/fleet";
import { keepsIntervals, listIntervalsAs } from "@/lib/services/intervals";

export const metadata: Metadata = { title: "Fleet" };

type TSearch = Record<string, string | string[] | undefined>;
const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

function fleetHref(q: Partial<TFleetQuery>) {
  const p = new URLSearchParams();
  if (q.vessel) p.set("vessel", q.vessel);
  if (q.rating) p.set("rating", q.rating);
  if (q.dueWithin !== undefined) p.set("dueWithin", String(q.dueWithin));
  if (q.sort && q.sort !== "vessel") p.set("sort", q.sort);
  if (q.page && q.page > 1) p.set("page", String(q.page));
  if (q.pageSize && q.pageSize !== 50) p.set("pageSize", String(q.pageSize));
  const s = p.toString();
  return s ? `/fleet?${s}` : "/fleet";
}

export default async function FleetPage({ searchParams }: { searchParams: Promise<TSearch> }) {
  const actor = await pageActor();
  const params = await searchParams;
  const parsed = await pageAuthorize(() => authorizeFleetQuery(actor, params));
  const raw = { vessel: one(params.vessel), rating: one(params.rating), dueWithin: one(params.dueWithin), sort: one(params.sort) };

  if (!parsed.success) {
    const { orgId, vesselIds } = await pageAuthorize(() => resolveFleetScope(actor));
    const vessels = await listVessels({ orgId, vesselIds: vesselIds ?? undefined });
    return (
      <>
        <PageHeader title="Fleet" />
        <div className="space-y-4">
          <Notice tone="error" title="These filters cannot be used">
            <ul className="list-disc pl-5">
              {parsed.error.issues.map((i, n) => (
                <li key={n}>{i.message}</li>
              ))}
            </ul>
          </Notice>
          <FleetFilters vessels={vessels} values={{ ...raw, vessel: vessels.some((v) => v.id === raw.vessel) ? raw.vessel : undefined }} />
        </div>
      </>
    );
  }

  const q = parsed.data;
  const overview = await getFleetOverviewAs(actor, q);
  const scopeName = q.vessel ? overview.vessels.find((v) => v.id === q.vessel)?.name : undefined;
  const showVesselList = !q.vessel && overview.vessels.length > 1;
  // The vessels the tanks and counts cover: the one filtered by, else every vessel the actor may choose.
  const vesselsInScope = q.vessel ? 1 : overview.vessels.length;
  // Past the last page the pager says so; "no tank matches" would be untrue.
  const pastLastPage = overview.paging.page > overview.paging.totalPages;
  const intervals = keepsIntervals(actor, overview.orgId) ? await listIntervalsAs(actor) : null;
  return (
    <>
      <PageHeader
        title={scopeName ? `Fleet · ${scopeName}` : "Fleet"}
        subtitle={`${vesselsInScope} vessel${vesselsInScope === 1 ? "" : "s"} · ${overview.counts.tanks} ballast tanks · dates as of ${overview.today} (UTC)`}
      />
      <div className="space-y-4">
        <FleetCounts counts={overview.counts} dueSoonDays={DUE_SOON_DAYS} hrefFor={(f) => fleetHref({ vessel: q.vessel, sort: q.sort, ...f })} />
        <FleetFilters vessels={overview.vessels} values={{ ...raw }} />
        <p className="flex flex-wrap gap-4 text-xs text-slate-600" aria-label="Legend">
          <RatingMark kind="GOOD" /> <RatingMark kind="FAIR" /> <RatingMark kind="POOR" /> <RatingMark kind="unrated" /> <RatingMark kind="never" />
          <span>Ratings from the latest countersigned report; a tank takes the rating of its worst area (IMO MSC.1/Circ.1330). Not rated: countersigned without a coating record.</span>
        </p>
        {overview.tanks.length ? <FleetTankTable tanks={overview.tanks} /> : pastLastPage ? null : <Notice>No tank matches these filters.</Notice>}
        <Pager noun="Tanks" {...overview.paging} hrefFor={(page) => fleetHref({ ...q, page })} />
        {intervals ? <IntervalSettings company={intervals.company} overrides={intervals.vessels} vessels={overview.vessels.map((v) => ({ id: v.id, name: v.name }))} /> : null}
        {showVesselList ? (
          <section className="space-y-2">
            <h2 className="text-lg font-semibold text-hull-900">Vessels</h2>
            <VesselTable vessels={await listVessels({ orgId: overview.orgId, vesselIds: overview.vessels.map((v) => v.id) })} />
          </section>
        ) : null}
      </div>
    </>
  );
}
