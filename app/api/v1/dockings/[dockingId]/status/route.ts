import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import { setDockingStatusAs } from "@/lib/services/dockings";

type P = { dockingId: string };

/** `{ status: "in_progress" | "completed" | "cancelled" }`: a completed or cancelled docking is final. */
export const PUT = route<P>(async (req, { dockingId }) => {
  const actor = await requireActor();
  return setDockingStatusAs(actor, dockingId, await readJsonValue(req), new URL(req.url).searchParams);
});
