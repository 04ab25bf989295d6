import "server-only";
// A tank's history: every inspection of the tank (any status, for the list) and
// the measurements of its countersigned and superseded inspections (for the
// plots and the recurring marks). Every table is read with the company, the
// vessel and the tank in its where; inspections walk inspections_tank_idx.
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { anodeRecords, coatingAreas, findings, inspections, reportFiles, sedimentZones } from "@/db/schema";

/** The statuses whose measurements are signed and therefore plotted. */
export const PLOTTED_STATUSES = ["countersigned", "superseded"] as const;

type TTankScope = { orgId: string; vesselId: string; tankId: string };

export async function listTankInspections({ orgId, vesselId, tankId }: TTankScope) {
  return db()
    .select({
      id: inspections.id,
      inspectedOn: inspections.inspectedOn,
      revision: inspections.revision,
      seriesId: inspections.seriesId,
      status: inspections.status,
      countersignedAt: inspections.countersignedAt,
      reportSha256: reportFiles.sha256,
    })
    .from(inspections)
    .leftJoin(reportFiles, and(eq(reportFiles.inspectionId, inspections.id), eq(reportFiles.orgId, orgId)))
    .where(and(eq(inspections.orgId, orgId), eq(inspections.vesselId, vesselId), eq(inspections.tankId, tankId)))
    .orderBy(desc(inspections.inspectedOn), desc(inspections.revision));
}

/** Coating, anode, sediment and finding rows of the given (already tank-scoped) inspections. */
export async function listHistoryMeasurements({ orgId, inspectionIds }: { orgId: string; inspectionIds: readonly string[] }) {
  if (!inspectionIds.length) return { coating: [], anodes: [], sediment: [], findings: [] };
  const ids = [...inspectionIds];
  const [coating, anodes, sediment, found] = await Promise.all([
    db()
      .select({ inspectionId: coatingAreas.inspectionId, area: coatingAreas.area, breakdownPct: coatingAreas.breakdownPct, rustedPct: coatingAreas.rustedPct, hardScalePct: coatingAreas.hardScalePct, edgesRustedPct: coatingAreas.edgesRustedPct })
      .from(coatingAreas)
      .where(and(eq(coatingAreas.orgId, orgId), inArray(coatingAreas.inspectionId, ids))),
    db()
      .select({ inspectionId: anodeRecords.inspectionId, meanWastagePct: anodeRecords.meanWastagePct, toRenewCount: anodeRecords.toRenewCount, inspectedCount: anodeRecords.inspectedCount })
      .from(anodeRecords)
      .where(and(eq(anodeRecords.orgId, orgId), inArray(anodeRecords.inspectionId, ids))),
    db()
      .select({ inspectionId: sedimentZones.inspectionId, volumeM3: sedimentZones.volumeM3 })
      .from(sedimentZones)
      .where(and(eq(sedimentZones.orgId, orgId), inArray(sedimentZones.inspectionId, ids))),
    db()
      .select({
        id: findings.id,
        inspectionId: findings.inspectionId,
        number: findings.number,
        type: findings.type,
        frameFrom: findings.frameFrom,
        frameTo: findings.frameTo,
        memberKind: findings.memberKind,
        memberNumber: findings.memberNumber,
        platingRegion: findings.platingRegion,
        description: findings.description,
        status: findings.status,
      })
      .from(findings)
      .where(and(eq(findings.orgId, orgId), inArray(findings.inspectionId, ids)))
      .orderBy(asc(findings.number)),
  ]);
  return { coating, anodes, sediment, findings: found };
}
