import { authorizeSignedIn } from "@/lib/auth/authorize";
import { route } from "@/lib/http/route";

export const GET = route(async () => {
  const { actor } = await authorizeSignedIn();
  return {
    user: { id: actor.userId, email: actor.email, name: actor.name, rank: actor.rank },
    memberships: actor.memberships,
  };
});
