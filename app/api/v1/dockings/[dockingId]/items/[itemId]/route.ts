import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { removeDockingItemAs, workListViewFromParams } from "@/lib/services/dockings";

type P = { dockingId: string; itemId: string };

/** Removes an item added by hand; a gathered item is refused (409: exclude it instead). */
export const DELETE = route<P>(async (req, { dockingId, itemId }) => {
  const actor = await requireActor();
  const view = workListViewFromParams(new URL(req.url).searchParams);
  return removeDockingItemAs(actor, dockingId, itemId, view);
});
