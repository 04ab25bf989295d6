import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { completePhotoAs } from "@/lib/services/photos";

export const runtime = "nodejs";

/** The browser's upload is done: the server checks the bytes and queues the variants. */
export const POST = route<{ inspectionId: string; photoId: string }>(async (_req, { inspectionId, photoId }) => ({
  photo: await completePhotoAs(await requireActor(), inspectionId, photoId),
}));
