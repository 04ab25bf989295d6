import "server-only";
// The office's comments on a report or one of its findings (the master's return
// comments live in the same table with kind "return").
import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import { db } from "@/db";
import { comments, findings, memberships, users } from "@/db/schema";
import { writeAudit } from "./audit";

type TIns = { orgId: string; inspectionId: string };

export async function listComments({ orgId, inspectionId }: TIns) {
  return db()
    .select({ id: comments.id, kind: comments.kind, body: comments.body, createdAt: comments.createdAt, findingId: comments.findingId, findingNumber: findings.number, authorName: users.name, authorRank: users.rank })
    .from(comments)
    .innerJoin(users, eq(users.id, comments.authorId))
    .leftJoin(findings, eq(findings.id, comments.findingId))
    .where(and(eq(comments.orgId, orgId), eq(comments.inspectionId, inspectionId)))
    .orderBy(asc(comments.createdAt));
}

/** The finding, if named, must belong to this inspection. */
export async function findingOfInspection({ orgId, inspectionId, findingId }: TIns & { findingId: string }) {
  const [row] = await db().select({ id: findings.id, number: findings.number }).from(findings)
    .where(and(eq(findings.orgId, orgId), eq(findings.inspectionId, inspectionId), eq(findings.id, findingId)));
  return row ?? null;
}

export async function insertComment(v: TIns & { authorId: string; body: string; findingId: string | null }) {
  return db().transaction(async (tx) => {
    const [row] = await tx.insert(comments).values({ ...v, kind: "comment" }).returning();
    await writeAudit(tx, { orgId: v.orgId, actorUserId: v.authorId, action: "comment.add", entity: "comment", entityId: row!.id, detail: { inspectionId: v.inspectionId, findingId: v.findingId } });
    return row!;
  });
}

/** The vessel's officers and master, who are told of a new comment. */
export async function listVesselCrewEmails({ orgId, vesselId }: { orgId: string; vesselId: string }) {
  const rows = await db()
    .selectDistinct({ email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.orgId, orgId), eq(memberships.vesselId, vesselId), inArray(memberships.role, ["officer", "master"]), isNull(users.disabledAt)));
  return rows.map((r) => r.email);
}
