import "server-only";
import { and, desc, eq, isNull, sql } from "drizzle-orm";
import { db } from "@/db";
import { inspections, memberships, organisations, reportFiles, reportShares, tanks, users, vessels } from "@/db/schema";
import { writeAudit } from "./audit";

/** Reports shared with one surveyor; the surveyor is the scope (shares cross companies). */
export async function listSharesForSurveyor({ surveyorUserId }: { surveyorUserId: string }) {
  return db()
    .select({
      shareId: reportShares.id,
      orgId: reportShares.orgId,
      inspectionId: reportShares.inspectionId,
      sharedAt: reportShares.sharedAt,
      acknowledgedAt: reportShares.acknowledgedAt,
      acknowledgementComment: reportShares.acknowledgementComment,
      sha256: reportFiles.sha256,
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
    .leftJoin(reportFiles, eq(reportFiles.inspectionId, inspections.id))
    .where(eq(reportShares.surveyorUserId, surveyorUserId))
    .orderBy(desc(reportShares.sharedAt));
}

/** The company's surveyors (users holding the surveyor role in it), to share with. */
export async function listOrgSurveyors({ orgId }: { orgId: string }) {
  return db()
    .selectDistinct({ id: users.id, name: users.name, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.orgId, orgId), eq(memberships.role, "surveyor"), isNull(users.disabledAt)))
    .orderBy(users.name);
}

/** Who a countersigned report is shared with, and who acknowledged it when. */
export async function listSharesOfInspection({ orgId, inspectionId }: { orgId: string; inspectionId: string }) {
  return db()
    .select({
      id: reportShares.id, surveyorName: users.name, surveyorEmail: users.email, sharedAt: reportShares.sharedAt,
      acknowledgedAt: reportShares.acknowledgedAt, acknowledgementComment: reportShares.acknowledgementComment,
    })
    .from(reportShares)
    .innerJoin(users, eq(users.id, reportShares.surveyorUserId))
    .where(and(eq(reportShares.orgId, orgId), eq(reportShares.inspectionId, inspectionId)))
    .orderBy(reportShares.sharedAt);
}

/** Shares a report once per surveyor (sharing again changes nothing); audit-logged. */
export async function insertShare(v: { orgId: string; inspectionId: string; surveyorUserId: string; sharedBy: string }) {
  return db().transaction(async (tx) => {
    const [row] = await tx.insert(reportShares).values(v).onConflictDoNothing({ target: [reportShares.inspectionId, reportShares.surveyorUserId] }).returning();
    if (row) await writeAudit(tx, { orgId: v.orgId, actorUserId: v.sharedBy, action: "report.share", entity: "report_share", entityId: row.id, detail: { inspectionId: v.inspectionId, surveyorUserId: v.surveyorUserId } });
    return row ?? null;
  });
}

export async function deleteShare({ orgId, inspectionId, shareId, actorUserId }: { orgId: string; inspectionId: string; shareId: string; actorUserId: string }) {
  return db().transaction(async (tx) => {
    const [row] = await tx.delete(reportShares).where(and(eq(reportShares.orgId, orgId), eq(reportShares.inspectionId, inspectionId), eq(reportShares.id, shareId))).returning();
    if (row) await writeAudit(tx, { orgId, actorUserId, action: "report.unshare", entity: "report_share", entityId: shareId });
    return row ?? null;
  });
}

/** One share as its surveyor sees it: the surveyor is the scope, so another surveyor's share is not found. */
export async function getShareForSurveyor({ surveyorUserId, shareId }: { surveyorUserId: string; shareId: string }) {
  const [row] = await db()
    .select({
      id: reportShares.id, orgId: reportShares.orgId, inspectionId: reportShares.inspectionId, acknowledgedAt: reportShares.acknowledgedAt,
      vessel: vessels.name, tank: tanks.code, revision: inspections.revision, objectKey: reportFiles.objectKey, sha256: reportFiles.sha256,
    })
    .from(reportShares)
    .innerJoin(inspections, and(eq(inspections.id, reportShares.inspectionId), eq(inspections.orgId, reportShares.orgId)))
    .innerJoin(vessels, eq(vessels.id, inspections.vesselId))
    .innerJoin(tanks, eq(tanks.id, inspections.tankId))
    .innerJoin(reportFiles, eq(reportFiles.inspectionId, inspections.id))
    .where(and(eq(reportShares.surveyorUserId, surveyorUserId), eq(reportShares.id, shareId)));
  return row ?? null;
}

export async function acknowledgeShare({ surveyorUserId, shareId, comment }: { surveyorUserId: string; shareId: string; comment: string | null }) {
  return db().transaction(async (tx) => {
    const [row] = await tx.update(reportShares).set({ acknowledgedAt: sql`now()`, acknowledgementComment: comment })
      .where(and(eq(reportShares.surveyorUserId, surveyorUserId), eq(reportShares.id, shareId), isNull(reportShares.acknowledgedAt))).returning();
    if (row) await writeAudit(tx, { orgId: row.orgId, actorUserId: surveyorUserId, action: "report.acknowledge", entity: "report_share", entityId: shareId, detail: { comment } });
    return row ?? null;
  });
}
