import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { getDockingAs } from "@/lib/services/dockings";

type P = { dockingId: string };

/** The docking with its priced work list. */
export const GET = route<P>(async (_req, { dockingId }) => getDockingAs(await requireActor(), dockingId));
