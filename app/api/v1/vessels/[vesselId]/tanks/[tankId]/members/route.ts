import { requireActor } from "@/lib/auth/actor";
import { created, readJsonValue, route } from "@/lib/http/route";
import { addMemberAs } from "@/lib/services/tanks";

export const POST = route<{ vesselId: string; tankId: string }>(async (req, { vesselId, tankId }) => {
  const actor = await requireActor();
  return created({ member: await addMemberAs(actor, vesselId, tankId, await readJsonValue(req)) });
});
