import { requireActor } from "@/lib/auth/actor";
import { created, readJsonValue, route } from "@/lib/http/route";
import { createApiTokenAs, listApiTokensAs } from "@/lib/services/api-tokens";

/** The signed-in admin's or superintendent's own API tokens (never their clear text). */
export const GET = route(async () => ({ tokens: await listApiTokensAs(await requireActor()) }));

/** Creates a token: the answer carries its clear text (`token`) once; only its SHA-256 is kept. */
export const POST = route(async (req) => created(await createApiTokenAs(await requireActor(), await readJsonValue(req))));
