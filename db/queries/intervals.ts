import "server-only";
// The company's inspection intervals: one company-wide row (vessel_id null) and
// optional rows of vessels with their own.
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { inspectionIntervals, vessels } from "@/db/schema";
import { writeAudit } from "./audit";

export async function listIntervals({ orgId }: { orgId: string }) {
  return db()
    .select({ vesselId: inspectionIntervals.vesselId, vesselName: vessels.name, defaultMonths: inspectionIntervals.defaultMonths, belowGoodMonths: inspectionIntervals.belowGoodMonths })
    .from(inspectionIntervals)
    .leftJoin(vessels, eq(vessels.id, inspectionIntervals.vesselId))
    .where(eq(inspectionIntervals.orgId, orgId))
    .orderBy(asc(vessels.name));
}

export async function setIntervals(v: { orgId: string; vesselId: string | null; defaultMonths: number; belowGoodMonths: number; actorUserId: string }) {
  return db().transaction(async (tx) => {
    const values = { orgId: v.orgId, vesselId: v.vesselId, defaultMonths: v.defaultMonths, belowGoodMonths: v.belowGoodMonths };
    const [row] = await tx
      .insert(inspectionIntervals)
      .values(values)
      .onConflictDoUpdate({ target: [inspectionIntervals.orgId, inspectionIntervals.vesselId], set: { defaultMonths: v.defaultMonths, belowGoodMonths: v.belowGoodMonths } })
      .returning();
    await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: "intervals.set", entity: "inspection_intervals", entityId: row!.id, detail: values });
    return row!;
  });
}

/** A vessel goes back to the company's intervals. */
export async function clearVesselIntervals({ orgId, vesselId, actorUserId }: { orgId: string; vesselId: string; actorUserId: string }) {
  return db().transaction(async (tx) => {
    const [row] = await tx.delete(inspectionIntervals).where(and(eq(inspectionIntervals.orgId, orgId), eq(inspectionIntervals.vesselId, vesselId))).returning();
    if (row) await writeAudit(tx, { orgId, actorUserId, action: "intervals.clear", entity: "inspection_intervals", entityId: row.id, detail: { vesselId } });
    return row ?? null;
  });
}
