import { requireActor } from "@/lib/auth/actor";
import { created, readJsonValue, route } from "@/lib/http/route";
import { listPhotosAs, presignPhotoAs } from "@/lib/services/photos";

type P = { inspectionId: string };

export const GET = route<P>(async (_req, { inspectionId }) => ({ photos: await listPhotosAs(await requireActor(), inspectionId) }));

/** Announces a photo (client-chosen id, file name, type, size) and returns the URL to PUT it to. */
export const POST = route<P>(async (req, { inspectionId }) => {
  const actor = await requireActor();
  return created(await presignPhotoAs(actor, inspectionId, await readJsonValue(req)));
});
