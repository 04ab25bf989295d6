import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { revokeRoleAs } from "@/lib/services/users";

export const DELETE = route<{ membershipId: string }>(async (_req, { membershipId }) => {
  const actor = await requireActor();
  await revokeRoleAs(actor, membershipId);
  return { ok: true };
});
