import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { removeSpecialFrameAs } from "@/lib/services/tanks";

export const DELETE = route<{ vesselId: string; tankId: string; specialFrameId: string }>(async (_req, { vesselId, tankId, specialFrameId }) => {
  await removeSpecialFrameAs(await requireActor(), vesselId, tankId, specialFrameId);
  return { ok: true };
});
