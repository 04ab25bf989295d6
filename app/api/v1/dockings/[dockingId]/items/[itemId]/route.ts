import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { removeDockingItemAs } from "@/lib/services/dockings";

type P = { dockingId: string; itemId: string };

/** Removes an item added by hand; a gathered item is refused (409: exclude it instead). */
export const DELETE = route<P>(async (req, { dockingId, itemId }) => {
  const actor = await requireActor();
  return removeDockingItemAs(actor, dockingId, itemId, new URL(req.url).searchParams);
});
