import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { removeMemberAs } from "@/lib/services/tanks";

export const DELETE = route<{ vesselId: string; tankId: string; memberId: string }>(async (_req, { vesselId, tankId, memberId }) => {
  await removeMemberAs(await requireActor(), vesselId, tankId, memberId);
  return { ok: true };
});
