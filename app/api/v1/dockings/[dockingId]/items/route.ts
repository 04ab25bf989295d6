import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import { decideDockingItemsAs, workListViewFromParams } from "@/lib/services/dockings";

type P = { dockingId: string };

/** `{ items: [{ id, included, adjustedQuantity?, adjustmentReason? }] }`: include, exclude or adjust items, with a reason. */
export const PUT = route<P>(async (req, { dockingId }) => {
  const actor = await requireActor();
  const view = workListViewFromParams(new URL(req.url).searchParams);
  return decideDockingItemsAs(actor, dockingId, await readJsonValue(req), view);
});
