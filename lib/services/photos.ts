import "server-only";
// Photos of an inspection: announced, uploaded by the browser straight to
// storage, checked by their bytes when they arrive, turned into variants by a
// background job, captioned through the wizard's versioned writes.
import * as q from "@/db/queries/photos";
import type { TActor } from "@/lib/auth/actor";
import { authorizeInspection } from "@/lib/auth/authorize";
import { serverEnv } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { QUEUES, sendJob } from "@/lib/jobs/queue";
import { probePhoto } from "@/lib/photos/image";
import { publicPhoto } from "@/lib/photos/public";
import { ZPhotoUploadRequest } from "@/lib/schemas/photo";
import { photoKey } from "@/lib/storage/keys";
import { deleteObjects, presignDownload, presignUpload, readObject, statObject } from "@/lib/storage/s3";
import { formatBytes, PHOTO_MAX_BYTES, PHOTOS_PER_INSPECTION } from "@/lib/uploads/limits";
import { z } from "zod";
import { INSPECTORS } from "./inspections";
import { fileLabel, validateUploadRequest } from "./uploads";
import { VESSEL_READERS } from "./vessels";

const checkPhotoId = (id: string) => {
  if (!z.uuid().safeParse(id).success) throw new AppError("not_found", "No such photo.");
};

/** Announces a photo and hands out the URL the browser uploads it to. */
export async function presignPhotoAs(actor: TActor, inspectionId: string, body: unknown) {
  const { orgId, vessel } = await authorizeInspection({ actor, inspectionId, allow: INSPECTORS });
  const input = validateUploadRequest(ZPhotoUploadRequest, body);
  const ttl = serverEnv().UPLOAD_URL_TTL_SECONDS;
  const key = photoKey({ orgId, vesselId: vessel.id, inspectionId, photoId: input.id }, "original");
  const row = await q.announcePhoto({
    orgId, vesselId: vessel.id, inspectionId, photoId: input.id, originalKey: key, contentType: input.contentType, sizeBytes: input.sizeBytes,
    fileLabel: fileLabel(input.fileName), uploadedBy: actor.userId, maxPerInspection: PHOTOS_PER_INSPECTION,
    // An upload may still be under way on a slow link after its URL expires: keep the record an hour longer.
    uploadExpiresAt: new Date(Date.now() + (ttl + 3600) * 1000),
  });
  const upload = await presignUpload({ key: row.originalKey, contentType: input.contentType, sizeBytes: input.sizeBytes, expiresIn: ttl });
  return { photo: publicPhoto(row), upload, expiresAt: new Date(Date.now() + ttl * 1000).toISOString() };
}

/**
 * The browser says the upload is done: check what arrived by its bytes, refuse
 * and delete anything that is not a whole photo within the limits, and queue
 * the variants. Calling it again for a photo already accepted changes nothing.
 */
export async function completePhotoAs(actor: TActor, inspectionId: string, photoId: string) {
  checkPhotoId(photoId);
  const { orgId, actor: who } = await authorizeInspection({ actor, inspectionId, allow: INSPECTORS });
  const row = await q.getPhoto({ orgId, inspectionId, photoId });
  if (!row) throw new AppError("not_found", "No such photo.");
  if (row.status !== "awaiting_upload") return publicPhoto(row);
  const stat = await statObject(row.originalKey);
  if (!stat) throw new AppError("conflict", "The file has not reached storage: upload it again.", [{ path: "upload", message: "no file was uploaded" }]);
  const refuse = async (code: "bad_request" | "payload_too_large" | "unsupported_media_type", message: string): Promise<never> => {
    await deleteObjects([row.originalKey]);
    await q.deletePhotoRow({ orgId, inspectionId, photoId });
    throw new AppError(code, message, [{ path: "file", message }]);
  };
  if (stat.sizeBytes === 0) return refuse("bad_request", "The file is empty (0 bytes).");
  if (stat.sizeBytes > PHOTO_MAX_BYTES) return refuse("payload_too_large", `The file is ${formatBytes(stat.sizeBytes)}; photos of up to ${formatBytes(PHOTO_MAX_BYTES)} are accepted.`);
  if (stat.sizeBytes !== row.sizeBytes) return refuse("bad_request", `The file that arrived (${formatBytes(stat.sizeBytes)}) is not the one announced (${formatBytes(row.sizeBytes)}); upload it again.`);
  const probe = await probePhoto(await readObject(row.originalKey, PHOTO_MAX_BYTES));
  if (!probe.ok) return refuse(probe.refusal.status === 413 ? "payload_too_large" : "unsupported_media_type", probe.refusal.message);
  const updated = await q.markPhotoProcessing({ orgId, inspectionId, photoId, contentType: probe.contentType, width: probe.width, height: probe.height, actorUserId: who.userId });
  if (!updated) return publicPhoto((await q.getPhoto({ orgId, inspectionId, photoId }))!);
  await sendJob(QUEUES.photoVariants, { orgId, photoId });
  return publicPhoto(updated);
}

export async function listPhotosAs(actor: TActor, inspectionId: string) {
  const { orgId } = await authorizeInspection({ actor, inspectionId, allow: VESSEL_READERS });
  return (await q.listPhotos({ orgId, inspectionId })).map(publicPhoto);
}

export const PHOTO_VARIANTS = ["thumb", "report", "original"] as const;

/** A short-lived storage URL for one of the photo's files, for whoever may read the inspection. */
export async function photoFileUrlAs(actor: TActor, inspectionId: string, photoId: string, variant: string) {
  checkPhotoId(photoId);
  const { orgId } = await authorizeInspection({ actor, inspectionId, allow: VESSEL_READERS });
  const row = await q.getPhoto({ orgId, inspectionId, photoId });
  if (!row) throw new AppError("not_found", "No such photo.");
  if (!(PHOTO_VARIANTS as readonly string[]).includes(variant)) throw new AppError("bad_request", "Check variant: it must be thumb, report or original.", [{ path: "variant", message: "must be thumb, report or original" }]);
  const key = variant === "thumb" ? row.thumbKey : variant === "report" ? row.reportKey : row.status === "ready" || row.status === "processing" ? row.originalKey : null;
  if (!key) throw new AppError("not_found", "This photo's file is not ready yet.");
  const name = variant === "original" ? row.fileLabel ?? "photo" : `${row.fileLabel?.replace(/\.\w+$/, "") ?? "photo"}-${variant}.jpg`;
  return presignDownload({ key, fileName: name, inline: true, expiresIn: 300 });
}
