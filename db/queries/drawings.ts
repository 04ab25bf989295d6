import "server-only";
import { and, desc, eq, inArray, lt } from "drizzle-orm";
import { db } from "@/db";
import { drawings, users } from "@/db/schema";
import { writeAudit } from "./audit";

type TScope = { orgId: string; vesselId: string };

/** The vessel's drawings that have arrived, newest first. */
export async function listDrawings({ orgId, vesselId }: TScope) {
  return db()
    .select({
      id: drawings.id, kind: drawings.kind, title: drawings.title, contentType: drawings.contentType, sizeBytes: drawings.sizeBytes,
      createdAt: drawings.createdAt, uploadedByName: users.name,
    })
    .from(drawings)
    .leftJoin(users, eq(users.id, drawings.uploadedBy))
    .where(and(eq(drawings.orgId, orgId), eq(drawings.vesselId, vesselId), eq(drawings.status, "ready")))
    .orderBy(desc(drawings.createdAt))
    .limit(200);
}

export async function getDrawing({ orgId, vesselId, drawingId }: TScope & { drawingId: string }) {
  const [row] = await db()
    .select()
    .from(drawings)
    .where(and(eq(drawings.orgId, orgId), eq(drawings.vesselId, vesselId), eq(drawings.id, drawingId)));
  return row;
}

export async function announceDrawing(v: TScope & { drawingId: string; kind: (typeof drawings.$inferInsert)["kind"]; title: string; objectKey: string; contentType: string; sizeBytes: number; fileLabel: string; uploadedBy: string; uploadExpiresAt: Date }) {
  const [row] = await db()
    .insert(drawings)
    .values({ id: v.drawingId, orgId: v.orgId, vesselId: v.vesselId, kind: v.kind, title: v.title, objectKey: v.objectKey, contentType: v.contentType, sizeBytes: v.sizeBytes, fileLabel: v.fileLabel, uploadedBy: v.uploadedBy, uploadExpiresAt: v.uploadExpiresAt })
    .onConflictDoNothing({ target: drawings.id })
    .returning();
  return row;
}

export async function markDrawingReady(v: TScope & { drawingId: string; contentType: string; sha256: string; actorUserId: string }) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .update(drawings)
      .set({ status: "ready", contentType: v.contentType, sha256: v.sha256, uploadExpiresAt: null })
      .where(and(eq(drawings.orgId, v.orgId), eq(drawings.vesselId, v.vesselId), eq(drawings.id, v.drawingId), eq(drawings.status, "awaiting_upload")))
      .returning();
    if (row) await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: "upload", entity: "drawing", entityId: v.drawingId, detail: { title: row.title, kind: row.kind } });
    return row;
  });
}

export async function deleteDrawing(v: TScope & { drawingId: string; actorUserId?: string }) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .delete(drawings)
      .where(and(eq(drawings.orgId, v.orgId), eq(drawings.vesselId, v.vesselId), eq(drawings.id, v.drawingId)))
      .returning();
    if (row && v.actorUserId && row.status === "ready") {
      await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: "delete", entity: "drawing", entityId: v.drawingId, detail: { title: row.title } });
    }
    return row;
  });
}

export async function unsafeListExpiredDrawingUploads(now: Date, limit = 200) {
  return db()
    .select({ id: drawings.id, objectKey: drawings.objectKey })
    .from(drawings)
    .where(and(eq(drawings.status, "awaiting_upload"), lt(drawings.uploadExpiresAt, now)))
    .limit(limit);
}

export async function unsafeDeleteDrawingUploads(ids: string[]) {
  if (!ids.length) return;
  await db().delete(drawings).where(and(inArray(drawings.id, ids), eq(drawings.status, "awaiting_upload")));
}
