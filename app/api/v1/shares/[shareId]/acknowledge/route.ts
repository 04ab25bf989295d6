import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import { acknowledgeShareAs } from "@/lib/services/shares";

type P = { shareId: string };

/** The surveyor acknowledges a shared report, with an optional comment; once. */
export const POST = route<P>(async (req, { shareId }) => acknowledgeShareAs(await requireActor(), shareId, await readJsonValue(req)));
