import { requireActor } from "@/lib/auth/actor";
import { created, route } from "@/lib/http/route";
import { mirrorTankAs } from "@/lib/services/tanks";

/** Copy to the other side: creates the starboard twin of a port tank (or the reverse) with its catalogue. */
export const POST = route<{ vesselId: string; tankId: string }>(async (_req, { vesselId, tankId }) => {
  return created({ tank: await mirrorTankAs(await requireActor(), vesselId, tankId) });
});
