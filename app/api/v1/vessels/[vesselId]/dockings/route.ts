import { requireActor } from "@/lib/auth/actor";
import { created, readJsonValue, route } from "@/lib/http/route";
import type { TDockingList, TServed } from "@/lib/schemas/responses";
import { createDockingAs, listDockingsAs } from "@/lib/services/dockings";

type P = { vesselId: string };

/** The vessel's dockings, latest planned first (superintendent, admin). */
export const GET = route<P>(async (_req, { vesselId }) => (await listDockingsAs(await requireActor(), vesselId)) satisfies TServed<TDockingList>);

/** Plans a docking (yard, place, planned date, currency, unit rates) and gathers its work list. */
export const POST = route<P>(async (req, { vesselId }) => {
  const actor = await requireActor();
  return created({ docking: await createDockingAs(actor, vesselId, await readJsonValue(req)) });
});
