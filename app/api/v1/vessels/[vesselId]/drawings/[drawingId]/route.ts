import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { deleteDrawingAs } from "@/lib/services/drawings";

export const DELETE = route<{ vesselId: string; drawingId: string }>(async (_req, { vesselId, drawingId }) => deleteDrawingAs(await requireActor(), vesselId, drawingId));
