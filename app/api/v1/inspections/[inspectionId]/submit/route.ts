import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import { submitInspectionAs } from "@/lib/services/signing";

type P = { inspectionId: string };

/** The officer signs (password again, typed and optionally drawn signature) and submits for countersigning. */
export const POST = route<P>(async (req, { inspectionId }) => submitInspectionAs(await requireActor(), inspectionId, await readJsonValue(req)));
