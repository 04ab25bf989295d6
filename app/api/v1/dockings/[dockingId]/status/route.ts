import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import { setDockingStatusAs, workListViewFromParams } from "@/lib/services/dockings";

type P = { dockingId: string };

/** `{ status: "in_progress" | "completed" | "cancelled" }`: a completed or cancelled docking is final. */
export const PUT = route<P>(async (req, { dockingId }) => {
  const actor = await requireActor();
  const view = workListViewFromParams(new URL(req.url).searchParams);
  return setDockingStatusAs(actor, dockingId, await readJsonValue(req), view);
});
