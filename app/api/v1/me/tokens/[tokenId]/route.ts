import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { revokeApiTokenAs } from "@/lib/services/api-tokens";

/** Revokes one of the user's own API tokens; it stops working at once. */
export const DELETE = route<{ tokenId: string }>(async (_req, { tokenId }) => ({ token: await revokeApiTokenAs(await requireActor(), tokenId) }));
