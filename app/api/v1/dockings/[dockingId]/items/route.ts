import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import { decideDockingItemsAs } from "@/lib/services/dockings";

type P = { dockingId: string };

/** `{ items: [{ id, included, adjustedQuantity?, adjustmentReason? }] }`: include, exclude or adjust items, with a reason. */
export const PUT = route<P>(async (req, { dockingId }) => {
  const actor = await requireActor();
  return decideDockingItemsAs(actor, dockingId, await readJsonValue(req));
});
