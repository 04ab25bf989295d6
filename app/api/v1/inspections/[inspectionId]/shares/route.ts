import { requireActor } from "@/lib/auth/actor";
import { created, readJsonValue, route } from "@/lib/http/route";
import { listSharesAs, shareReportAs } from "@/lib/services/shares";

type P = { inspectionId: string };

/** Who this report is shared with, who acknowledged it and when; for the office, the surveyors to share with. */
export const GET = route<P>(async (_req, { inspectionId }) => listSharesAs(await requireActor(), inspectionId));

/** The office shares a countersigned report with one of the company's surveyors (who gets an e-mail notice). */
export const POST = route<P>(async (req, { inspectionId }) => created(await shareReportAs(await requireActor(), inspectionId, await readJsonValue(req))));
