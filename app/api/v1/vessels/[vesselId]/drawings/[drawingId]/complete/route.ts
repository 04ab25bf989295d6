import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { completeDrawingAs } from "@/lib/services/drawings";

export const runtime = "nodejs";

/** The browser's upload is done: the server checks the bytes and keeps the drawing, or deletes it and says why. */
export const POST = route<{ vesselId: string; drawingId: string }>(async (_req, { vesselId, drawingId }) => ({
  drawing: await completeDrawingAs(await requireActor(), vesselId, drawingId),
}));
