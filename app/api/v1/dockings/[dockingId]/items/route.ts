import { requireActor } from "@/lib/auth/actor";
import { created, readJsonValue, route } from "@/lib/http/route";
import { addDockingItemAs, decideDockingItemsAs } from "@/lib/services/dockings";

type P = { dockingId: string };

/** `{ items: [{ id, included, adjustedQuantity?, adjustmentReason? }] }`: include, exclude or adjust items, with a reason. */
export const PUT = route<P>(async (req, { dockingId }) => {
  const actor = await requireActor();
  return decideDockingItemsAs(actor, dockingId, await readJsonValue(req), new URL(req.url).searchParams);
});

/** `{ description, tankId?, quantity, unit, unitRate, reason }`: adds work no finding asks for, at its own rate (201 with the docking). */
export const POST = route<P>(async (req, { dockingId }) => {
  const actor = await requireActor();
  return created(await addDockingItemAs(actor, dockingId, await readJsonValue(req), new URL(req.url).searchParams));
});
