import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { rebuildDockingAs, workListViewFromParams } from "@/lib/services/dockings";

type P = { dockingId: string };

/** Gathers the work list again from the latest countersigned reports; decisions stay with their items. */
export const POST = route<P>(async (req, { dockingId }) => {
  const view = workListViewFromParams(new URL(req.url).searchParams);
  return rebuildDockingAs(await requireActor(), dockingId, view);
});
