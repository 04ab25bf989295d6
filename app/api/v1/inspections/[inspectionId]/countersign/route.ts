import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import { countersignInspectionAs } from "@/lib/services/signing";

type P = { inspectionId: string };

/** The master countersigns: the inspection is locked; the PDF is rendered, fingerprinted and sent in the background. */
export const POST = route<P>(async (req, { inspectionId }) => countersignInspectionAs(await requireActor(), inspectionId, await readJsonValue(req)));
