import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import { returnInspectionAs } from "@/lib/services/signing";

type P = { inspectionId: string };

/** The master returns a submitted report to the officer with comments. */
export const POST = route<P>(async (req, { inspectionId }) => returnInspectionAs(await requireActor(), inspectionId, await readJsonValue(req)));
