import { requireActor } from "@/lib/auth/actor";
import { created, readJsonValue, route } from "@/lib/http/route";
import { listDrawingsAs, presignDrawingAs } from "@/lib/services/drawings";

type P = { vesselId: string };

export const GET = route<P>(async (_req, { vesselId }) => ({ drawings: await listDrawingsAs(await requireActor(), vesselId) }));

/** Announces a drawing (client-chosen id, kind, title, file name, type, size) and returns the URL to PUT it to. */
export const POST = route<P>(async (req, { vesselId }) => {
  const actor = await requireActor();
  return created(await presignDrawingAs(actor, vesselId, await readJsonValue(req)));
});
