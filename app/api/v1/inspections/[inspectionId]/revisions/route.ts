import { requireActor } from "@/lib/auth/actor";
import { created, route } from "@/lib/http/route";
import { readSigningStateAs, reviseInspectionAs } from "@/lib/services/signing";

type P = { inspectionId: string };

/** Every revision of this report, with the fingerprints of their signed PDFs. */
export const GET = route<P>(async (_req, { inspectionId }) => ({ revisions: (await readSigningStateAs(await requireActor(), inspectionId)).revisions }));

/** A correction of a countersigned report: a new draft revision that copies it. */
export const POST = route<P>(async (_req, { inspectionId }) => created(await reviseInspectionAs(await requireActor(), inspectionId)));
