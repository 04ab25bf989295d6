import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { rebuildDockingAs } from "@/lib/services/dockings";

type P = { dockingId: string };

/** Gathers the work list again from the latest countersigned reports; decisions stay with their items. */
export const POST = route<P>(async (req, { dockingId }) => {
  return rebuildDockingAs(await requireActor(), dockingId, new URL(req.url).searchParams);
});
