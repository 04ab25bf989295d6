import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import { markDockingItemsDoneAs } from "@/lib/services/dockings";

type P = { dockingId: string };

/** `{ itemIds: [...], done: true | false }` while the docking is in progress; a finding closes when all its items are done. */
export const PUT = route<P>(async (req, { dockingId }) => {
  const actor = await requireActor();
  return markDockingItemsDoneAs(actor, dockingId, await readJsonValue(req), new URL(req.url).searchParams);
});
