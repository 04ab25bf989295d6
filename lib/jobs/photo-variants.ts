import "server-only";
// The background job that turns an accepted upload into its report variant and
// thumbnail. Idempotent: it works only on a photo still marked "processing", and
// writing the same variants twice is harmless, so a retry after a crash is safe.
import { getPhotoForJob, setPhotoRejected, setPhotoVariants } from "@/db/queries/photos";
import { unsafeGetVesselById } from "@/db/queries/vessels";
import { makeVariants, type TVariants } from "@/lib/photos/image";
import { photoKey } from "@/lib/storage/keys";
import { deleteObjects, readObject, writeObject } from "@/lib/storage/s3";
import { PHOTO_MAX_BYTES } from "@/lib/uploads/limits";

export type TPhotoVariantsJob = { orgId: string; photoId: string };

export async function runPhotoVariants({ orgId, photoId }: TPhotoVariantsJob) {
  const photo = await getPhotoForJob({ orgId, photoId });
  if (!photo || photo.status !== "processing") return { skipped: true };
  const original = await readObject(photo.originalKey, PHOTO_MAX_BYTES);
  const vessel = await unsafeGetVesselById({ vesselId: photo.vesselId });
  let variants: TVariants;
  try {
    variants = await makeVariants(original, { utcOffsetMinutes: vessel?.utcOffsetMinutes ?? null });
  } catch (error) {
    // The bytes cannot be decoded: retrying will not help. Say so, and keep nothing of it.
    console.error(`[tankwright] photo ${photoId} could not be decoded`, error);
    await setPhotoRejected({ orgId, photoId, message: "The photo could not be decoded (the file is damaged); delete it and upload it again." });
    await deleteObjects([photo.originalKey]);
    return { rejected: true };
  }
  const ids = { orgId, vesselId: photo.vesselId, inspectionId: photo.inspectionId, photoId };
  const reportKey = photoKey(ids, "report");
  const thumbKey = photoKey(ids, "thumb");
  await writeObject({ key: reportKey, body: variants.report.data, contentType: "image/jpeg" });
  await writeObject({ key: thumbKey, body: variants.thumb.data, contentType: "image/jpeg" });
  const stored = await setPhotoVariants({ orgId, photoId, reportKey, thumbKey, width: variants.width, height: variants.height, capturedAt: variants.capturedAt });
  // Deleted while the job ran: remove what it wrote.
  if (!stored && !(await getPhotoForJob({ orgId, photoId }))) await deleteObjects([reportKey, thumbKey]);
  return { reportBytes: variants.report.data.length, thumbBytes: variants.thumb.data.length };
}
