import "server-only";
// A tank's history behind the one authorization module, with the same rule as
// the tank page (readTank: the vessel's readers). Lists every inspection; plots
// only the countersigned and superseded ones (signed measurements), rated by
// lib/calc/coating.ts, projected by lib/calc/anodes.ts with the company's
// renewal threshold, and marked recurring by lib/office/recurring.ts.
import { listHistoryMeasurements, listTankInspections, PLOTTED_STATUSES } from "@/db/queries/history";
import { getOrgSettings } from "@/db/queries/organisations";
import type { TActor } from "@/lib/auth/actor";
import { projectThresholdDate } from "@/lib/calc/anodes";
import { rateCoatingArea, rateTank, type TRating } from "@/lib/calc/coating";
import { markRecurring } from "@/lib/office/recurring";
import { COATING_AREA_LABELS, COATING_AREAS, type TCoatingArea, type TInspectionStatus } from "@/lib/vocabulary";
import { readTank } from "./tanks";

export type TTankHistoryInspection = {
  id: string;
  inspectedOn: string;
  revision: number;
  status: TInspectionStatus;
  plotted: boolean;
  rating: TRating | null;
  /** The signed PDF, when one was rendered: GET /api/v1/inspections/{id}/signed-report. */
  signedReportUrl: string | null;
  /** SHA-256 of the signed PDF, as /verify checks it. */
  reportSha256: string | null;
  pageUrl: string;
};

export async function getTankHistoryAs(actor: TActor, vesselId: string, tankId: string) {
  const { orgId, tank, vessel } = await readTank(actor, vesselId, tankId);
  const [all, settings] = await Promise.all([listTankInspections({ orgId, vesselId, tankId }), getOrgSettings({ orgId })]);
  const rule = settings?.twentyPercentRule ?? "table";
  const thresholdPct = settings?.anodeRenewThresholdPct ?? 50;
  const plotted = all.filter((i) => (PLOTTED_STATUSES as readonly string[]).includes(i.status)).sort((a, b) => a.inspectedOn.localeCompare(b.inspectedOn) || a.revision - b.revision);
  const m = await listHistoryMeasurements({ orgId, inspectionIds: plotted.map((i) => i.id) });
  const dateOf = new Map(plotted.map((i) => [i.id, i.inspectedOn]));

  const ratingOf = new Map<string, TRating>();
  for (const i of plotted) {
    const areas = m.coating.filter((c) => c.inspectionId === i.id).map((c) => ({ ...c, rating: rateCoatingArea(c, rule) }));
    const rated = rateTank(areas);
    if (rated) ratingOf.set(i.id, rated.rating);
  }

  const coating = COATING_AREAS.map((area: TCoatingArea) => ({
    area,
    label: COATING_AREA_LABELS[area],
    points: plotted.flatMap((i) => m.coating.filter((c) => c.inspectionId === i.id && c.area === area).map((c) => ({ inspectionId: i.id, date: i.inspectedOn, breakdownPct: c.breakdownPct }))),
  })).filter((s) => s.points.length);

  const anodePoints = plotted.flatMap((i) => m.anodes.filter((a) => a.inspectionId === i.id).map((a) => ({ inspectionId: i.id, date: i.inspectedOn, meanWastagePct: a.meanWastagePct, toRenewCount: a.toRenewCount })));
  const projection = projectThresholdDate(anodePoints, thresholdPct);

  const sediment = plotted.map((i) => {
    const zones = m.sediment.filter((z) => z.inspectionId === i.id);
    return { inspectionId: i.id, date: i.inspectedOn, volumeM3: Math.round(zones.reduce((s, z) => s + z.volumeM3, 0) * 1000) / 1000, zones: zones.length };
  });

  const marks = markRecurring(m.findings.map((f) => ({ ...f, tankId, inspectedOn: dateOf.get(f.inspectionId)! })));
  const findingNo = new Map(m.findings.map((f) => [f.id, { number: f.number, inspectionId: f.inspectionId }]));
  const findings = m.findings
    .map((f) => {
      const of = marks.get(f.id);
      const earlier = of ? findingNo.get(of)! : null;
      return {
        ...f,
        inspectedOn: dateOf.get(f.inspectionId)!,
        recurring: earlier ? { findingId: of!, number: earlier.number, inspectionId: earlier.inspectionId, inspectedOn: dateOf.get(earlier.inspectionId)! } : null,
      };
    })
    .sort((a, b) => b.inspectedOn.localeCompare(a.inspectedOn) || a.number - b.number);

  const inspections: TTankHistoryInspection[] = all.map((i) => ({
    id: i.id,
    inspectedOn: i.inspectedOn,
    revision: i.revision,
    status: i.status,
    plotted: (PLOTTED_STATUSES as readonly string[]).includes(i.status),
    rating: ratingOf.get(i.id) ?? null,
    signedReportUrl: i.reportSha256 ? `/api/v1/inspections/${i.id}/signed-report` : null,
    reportSha256: i.reportSha256 ?? null,
    pageUrl: `/inspections/${i.id}`,
  }));

  return {
    vessel: { id: vessel.id, name: vessel.name },
    tank: { id: tank.id, code: tank.code, name: tank.name },
    inspections,
    coating,
    anodes: { thresholdPct, points: anodePoints, projection },
    sediment,
    findings,
  };
}

export type TTankHistory = Awaited<ReturnType<typeof getTankHistoryAs>>;
