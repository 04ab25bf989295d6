import "server-only";
// The scheduled clean-up: uploads that were announced but never arrived are
// removed with whatever part of them reached storage; photos whose variant job
// was lost are sent to the queue again.
import { unsafeDeleteDrawingUploads, unsafeListExpiredDrawingUploads } from "@/db/queries/drawings";
import { unsafeDeletePhotoUploads, unsafeListExpiredPhotoUploads, unsafeListStuckPhotos } from "@/db/queries/photos";
import { deleteObjects } from "@/lib/storage/s3";
import { QUEUES, sendJob } from "./queue";

export async function runUploadsCleanup(now = new Date()) {
  const photos = await unsafeListExpiredPhotoUploads(now);
  await deleteObjects(photos.map((p) => p.originalKey));
  await unsafeDeletePhotoUploads(photos.map((p) => p.id));
  const drawings = await unsafeListExpiredDrawingUploads(now);
  await deleteObjects(drawings.map((d) => d.objectKey));
  await unsafeDeleteDrawingUploads(drawings.map((d) => d.id));
  const stuck = await unsafeListStuckPhotos(new Date(+now - 30 * 60_000));
  for (const p of stuck) await sendJob(QUEUES.photoVariants, { orgId: p.orgId, photoId: p.id });
  return { photos: photos.length, drawings: drawings.length, resent: stuck.length };
}
