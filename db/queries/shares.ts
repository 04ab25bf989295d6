import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { inspections, organisations, reportShares, tanks, vessels } from "@/db/schema";

/** Reports shared with one surveyor; the surveyor is the scope (shares cross companies). */
export async function listSharesForSurveyor({ surveyorUserId }: { surveyorUserId: string }) {
  return db()
    .select({
      shareId: reportShares.id,
      sharedAt: reportShares.sharedAt,
      acknowledgedAt: reportShares.acknowledgedAt,
      company: organisations.name,
      vessel: vessels.name,
      imoNumber: vessels.imoNumber,
      tank: tanks.code,
      inspectedOn: inspections.inspectedOn,
      revision: inspections.revision,
    })
    .from(reportShares)
    .innerJoin(inspections, and(eq(inspections.id, reportShares.inspectionId), eq(inspections.orgId, reportShares.orgId)))
    .innerJoin(vessels, eq(vessels.id, inspections.vesselId))
    .innerJoin(tanks, eq(tanks.id, inspections.tankId))
    .innerJoin(organisations, eq(organisations.id, reportShares.orgId))
    .where(eq(reportShares.surveyorUserId, surveyorUserId))
    .orderBy(desc(reportShares.sharedAt));
}
