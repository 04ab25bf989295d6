import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import type { TDockingWithWorkList, TServed } from "@/lib/schemas/responses";
import { getDockingAs, updateDockingAs } from "@/lib/services/dockings";

type P = { dockingId: string };

/** The docking with one page of its priced work list (?tank=&page=&pageSize=; the totals cover every item). */
export const GET = route<P>(async (req, { dockingId }) => (await getDockingAs(await requireActor(), dockingId, new URL(req.url).searchParams)) satisfies TServed<TDockingWithWorkList>);

/** Changes the docking's details (the body of creating one) while it is planned or in progress; answers like GET, priced at the new rates. */
export const PUT = route<P>(async (req, { dockingId }) => {
  const actor = await requireActor();
  return (await updateDockingAs(actor, dockingId, await readJsonValue(req), new URL(req.url).searchParams)) satisfies TServed<TDockingWithWorkList>;
});
