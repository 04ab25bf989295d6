import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { photoFileUrlAs } from "@/lib/services/photos";

/** Redirects to a short-lived storage URL of the photo's thumbnail, report variant or original. */
export const GET = route<{ inspectionId: string; photoId: string }>(async (req, { inspectionId, photoId }) => {
  const variant = new URL(req.url).searchParams.get("variant") ?? "report";
  const url = await photoFileUrlAs(await requireActor(), inspectionId, photoId, variant);
  return new Response(null, { status: 302, headers: { location: url, "cache-control": "private, max-age=240" } });
});
