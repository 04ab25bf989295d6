import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import type { TDockingWithWorkList, TServed } from "@/lib/schemas/responses";
import { getDockingAs } from "@/lib/services/dockings";

type P = { dockingId: string };

/** The docking with one page of its priced work list (?tank=&page=&pageSize=; the totals cover every item). */
export const GET = route<P>(async (req, { dockingId }) => (await getDockingAs(await requireActor(), dockingId, new URL(req.url).searchParams)) satisfies TServed<TDockingWithWorkList>);
