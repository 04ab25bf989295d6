import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { listMySharesAs } from "@/lib/services/shares";

/** A surveyor's reports: exactly those shared with them. */
export const GET = route(async () => ({ shares: await listMySharesAs(await requireActor()) }));
