import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { drawingFileUrlAs } from "@/lib/services/drawings";

/** Redirects to a short-lived storage URL that opens the drawing in the browser. */
export const GET = route<{ vesselId: string; drawingId: string }>(async (_req, { vesselId, drawingId }) => {
  const url = await drawingFileUrlAs(await requireActor(), vesselId, drawingId);
  return new Response(null, { status: 302, headers: { location: url, "cache-control": "private, no-store" } });
});
