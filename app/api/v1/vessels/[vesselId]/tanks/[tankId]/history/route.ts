import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { getTankHistoryAs } from "@/lib/services/history";

/** Every inspection of the tank, the plotted series of its signed inspections and the recurring findings. */
export const GET = route<{ vesselId: string; tankId: string }>(async (_req, { vesselId, tankId }) => getTankHistoryAs(await requireActor(), vesselId, tankId));
