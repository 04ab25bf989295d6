import { requireActor } from "@/lib/auth/actor";
import { authorizeOrg } from "@/lib/auth/authorize";
import { created, readJson, route } from "@/lib/http/route";
import { ZMembershipInput } from "@/lib/schemas/user";
import { grantRoleAs } from "@/lib/services/users";

export const POST = route<{ userId: string }>(async (req, { userId }) => {
  const actor = await requireActor();
  await authorizeOrg({ actor, allow: ["admin"] });
  const input = await readJson(req, ZMembershipInput);
  return created({ membership: await grantRoleAs(actor, userId, input) });
});
