import "server-only";
import { and, asc, eq, inArray, lt, or, sql } from "drizzle-orm";
import { db } from "@/db";
import { findings, inspections, photos } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { writeAudit } from "./audit";
import type { TTx } from "./inspections";

type TScope = { orgId: string; inspectionId: string };
export type TPhotoRow = typeof photos.$inferSelect;

export async function listPhotos({ orgId, inspectionId }: TScope) {
  return db()
    .select()
    .from(photos)
    .where(and(eq(photos.orgId, orgId), eq(photos.inspectionId, inspectionId)))
    .orderBy(asc(photos.sortOrder), asc(photos.createdAt));
}

export async function getPhoto({ orgId, inspectionId, photoId }: TScope & { photoId: string }) {
  const [row] = await db()
    .select()
    .from(photos)
    .where(and(eq(photos.orgId, orgId), eq(photos.inspectionId, inspectionId), eq(photos.id, photoId)));
  return row;
}

/** For the background job, which holds the company from its payload. */
export async function getPhotoForJob({ orgId, photoId }: { orgId: string; photoId: string }) {
  const [row] = await db().select().from(photos).where(and(eq(photos.orgId, orgId), eq(photos.id, photoId)));
  return row;
}

/**
 * Records a photo that is about to be uploaded, inside a transaction that locks
 * the inspection so that it cannot be submitted half-way. Returns the existing
 * row when the same id was announced before (a retried request).
 */
export async function announcePhoto(v: {
  orgId: string; vesselId: string; inspectionId: string; photoId: string; originalKey: string; contentType: string; sizeBytes: number;
  fileLabel: string; uploadedBy: string; uploadExpiresAt: Date; maxPerInspection: number;
}) {
  return db().transaction(async (tx) => {
    await lockEditable(tx, v);
    const [existing] = await tx.select().from(photos).where(eq(photos.id, v.photoId));
    if (existing) {
      if (existing.orgId !== v.orgId || existing.inspectionId !== v.inspectionId || existing.status !== "awaiting_upload") {
        throw new AppError("conflict", "This photo id is already in use.", [{ path: "id", message: "is already used" }]);
      }
      const [row] = await tx
        .update(photos)
        .set({ contentType: v.contentType, sizeBytes: v.sizeBytes, fileLabel: v.fileLabel, uploadExpiresAt: v.uploadExpiresAt })
        .where(eq(photos.id, v.photoId))
        .returning();
      return row!;
    }
    const [{ count, next }] = (await tx
      .select({ count: sql<number>`count(*)::int`, next: sql<number>`coalesce(max(${photos.sortOrder}), 0) + 1` })
      .from(photos)
      .where(and(eq(photos.orgId, v.orgId), eq(photos.inspectionId, v.inspectionId)))) as [{ count: number; next: number }];
    if (count >= v.maxPerInspection) throw new AppError("unprocessable", `An inspection holds at most ${v.maxPerInspection} photos.`);
    const [row] = await tx
      .insert(photos)
      .values({
        id: v.photoId, orgId: v.orgId, vesselId: v.vesselId, inspectionId: v.inspectionId, kind: "overview", status: "awaiting_upload",
        originalKey: v.originalKey, contentType: v.contentType, sizeBytes: v.sizeBytes, fileLabel: v.fileLabel, uploadedBy: v.uploadedBy,
        uploadExpiresAt: v.uploadExpiresAt, sortOrder: next,
      })
      .returning();
    return row!;
  });
}

/** 409 unless the inspection is a draft (or returned for changes); holds its row until the transaction ends. */
export async function lockEditable(tx: TTx, { orgId, inspectionId }: TScope) {
  const [row] = await tx
    .select({ status: inspections.status })
    .from(inspections)
    .where(and(eq(inspections.orgId, orgId), eq(inspections.id, inspectionId)))
    .for("update");
  if (!row) throw new AppError("not_found", "No such inspection.");
  if (row.status !== "draft" && row.status !== "returned") {
    throw new AppError("conflict", `The inspection is ${row.status} and can no longer be changed; a correction is a new revision.`, [{ path: "status", message: row.status }]);
  }
}

/** Marks an arrived, checked upload as waiting for its variants. */
export async function markPhotoProcessing(v: TScope & { photoId: string; contentType: string; width: number; height: number; actorUserId: string }) {
  return db().transaction(async (tx) => {
    await lockEditable(tx, v);
    const [row] = await tx
      .update(photos)
      .set({ status: "processing", contentType: v.contentType, width: v.width, height: v.height, uploadExpiresAt: null })
      .where(and(eq(photos.orgId, v.orgId), eq(photos.inspectionId, v.inspectionId), eq(photos.id, v.photoId), eq(photos.status, "awaiting_upload")))
      .returning();
    if (row) await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: "upload", entity: "photo", entityId: v.photoId, detail: { inspectionId: v.inspectionId, sizeBytes: row.sizeBytes } });
    return row;
  });
}

export async function deletePhotoRow({ orgId, inspectionId, photoId }: TScope & { photoId: string }) {
  await db().delete(photos).where(and(eq(photos.orgId, orgId), eq(photos.inspectionId, inspectionId), eq(photos.id, photoId)));
}

export async function setPhotoVariants(v: { orgId: string; photoId: string; reportKey: string; thumbKey: string; width: number; height: number; capturedAt: Date | null }) {
  const [row] = await db()
    .update(photos)
    .set({ status: "ready", reportKey: v.reportKey, thumbKey: v.thumbKey, width: v.width, height: v.height, capturedAt: v.capturedAt, statusMessage: null })
    .where(and(eq(photos.orgId, v.orgId), eq(photos.id, v.photoId), eq(photos.status, "processing")))
    .returning({ id: photos.id });
  return Boolean(row);
}

export async function setPhotoRejected(v: { orgId: string; photoId: string; message: string }) {
  await db()
    .update(photos)
    .set({ status: "rejected", statusMessage: v.message })
    .where(and(eq(photos.orgId, v.orgId), eq(photos.id, v.photoId), eq(photos.status, "processing")));
}

// ---------------------------------------------------------------- writes inside claimVersion's transaction

export async function listPhotoPeers(tx: TTx, { orgId, inspectionId }: TScope) {
  return tx
    .select({ id: photos.id, kind: photos.kind, frameFrom: photos.frameFrom, frameTo: photos.frameTo, status: photos.status, overviewPhotoId: photos.overviewPhotoId })
    .from(photos)
    .where(and(eq(photos.orgId, orgId), eq(photos.inspectionId, inspectionId)));
}

export async function listFindingIds(tx: TTx, { orgId, inspectionId }: TScope) {
  const rows = await tx.select({ id: findings.id }).from(findings).where(and(eq(findings.orgId, orgId), eq(findings.inspectionId, inspectionId)));
  return rows.map((r) => r.id);
}

export async function setPhotoCaption(
  tx: TTx,
  { orgId, inspectionId }: TScope,
  photoId: string,
  v: Pick<typeof photos.$inferInsert, "kind" | "frameFrom" | "frameTo" | "memberKind" | "platingRegion" | "memberNumber" | "findingId" | "overviewPhotoId" | "caption">,
) {
  const [row] = await tx
    .update(photos)
    .set(v)
    .where(and(eq(photos.orgId, orgId), eq(photos.inspectionId, inspectionId), eq(photos.id, photoId)))
    .returning({ id: photos.id });
  if (!row) throw new AppError("not_found", "No such photo.");
}

export async function removePhoto(tx: TTx, { orgId, inspectionId }: TScope, photoId: string) {
  const closeUps = await tx
    .select({ id: photos.id, caption: photos.caption })
    .from(photos)
    .where(and(eq(photos.orgId, orgId), eq(photos.inspectionId, inspectionId), eq(photos.overviewPhotoId, photoId)));
  if (closeUps.length) {
    throw new AppError("unprocessable", `${closeUps.length} close-up${closeUps.length > 1 ? "s name" : " names"} this overview: delete ${closeUps.length > 1 ? "them" : "it"} or choose another overview first.`, [
      { path: "overviewPhotoId", message: "is named by a close-up" },
    ]);
  }
  const [row] = await tx
    .delete(photos)
    .where(and(eq(photos.orgId, orgId), eq(photos.inspectionId, inspectionId), eq(photos.id, photoId)))
    .returning();
  if (!row) throw new AppError("not_found", "No such photo.");
  // A later revision shares the files of the one it corrects: keep what another row still names.
  const keys = [row.originalKey, row.reportKey, row.thumbKey].filter((k): k is string => Boolean(k));
  const shared = keys.length
    ? await tx.select({ o: photos.originalKey, r: photos.reportKey, t: photos.thumbKey }).from(photos)
        .where(and(eq(photos.orgId, orgId), or(inArray(photos.originalKey, keys), inArray(photos.reportKey, keys), inArray(photos.thumbKey, keys))))
    : [];
  const stillNamed = new Set(shared.flatMap((x) => [x.o, x.r, x.t]));
  return { ...row, unsharedKeys: keys.filter((k) => !stillNamed.has(k)) };
}

export async function setPhotoOrder(tx: TTx, { orgId, inspectionId }: TScope, order: readonly string[]) {
  const rows = await tx.select({ id: photos.id }).from(photos).where(and(eq(photos.orgId, orgId), eq(photos.inspectionId, inspectionId)));
  const known = new Set(rows.map((r) => r.id));
  const unknown = order.filter((id) => !known.has(id));
  if (unknown.length || new Set(order).size !== order.length) throw new AppError("bad_request", "Check order: it must list photos of this inspection, each once.", [{ path: "order", message: "lists unknown or repeated photos" }]);
  for (const [i, id] of order.entries()) {
    await tx.update(photos).set({ sortOrder: i + 1 }).where(and(eq(photos.orgId, orgId), eq(photos.id, id)));
  }
}

// ---------------------------------------------------------------- clean-up (the scheduled job)

/** Announced uploads that never arrived, across companies: the clean-up job removes them and their objects. */
export async function unsafeListExpiredPhotoUploads(now: Date, limit = 200) {
  return db()
    .select({ id: photos.id, orgId: photos.orgId, originalKey: photos.originalKey })
    .from(photos)
    .where(and(eq(photos.status, "awaiting_upload"), lt(photos.uploadExpiresAt, now)))
    .limit(limit);
}

export async function unsafeDeletePhotoUploads(ids: string[]) {
  if (!ids.length) return;
  await db().delete(photos).where(and(inArray(photos.id, ids), eq(photos.status, "awaiting_upload")));
}

/** Photos stuck in processing for longer than a job can take: their job is sent again. */
export async function unsafeListStuckPhotos(olderThan: Date, limit = 200) {
  return db()
    .select({ id: photos.id, orgId: photos.orgId })
    .from(photos)
    .where(and(eq(photos.status, "processing"), lt(photos.createdAt, olderThan)))
    .limit(limit);
}
