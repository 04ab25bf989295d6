import { requireActor } from "@/lib/auth/actor";
import { authorizeOrg } from "@/lib/auth/authorize";
import { created, readJson, route } from "@/lib/http/route";
import { ZUserInput } from "@/lib/schemas/user";
import { createUserAs, listUsersAs } from "@/lib/services/users";

export const GET = route(async () => {
  const actor = await requireActor();
  return { users: await listUsersAs(actor) };
});

export const POST = route(async (req) => {
  const actor = await requireActor();
  await authorizeOrg({ actor, allow: ["admin"] });
  const input = await readJson(req, ZUserInput);
  return created({ user: await createUserAs(actor, input) });
});
