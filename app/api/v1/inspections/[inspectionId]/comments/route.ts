import { requireActor } from "@/lib/auth/actor";
import { created, readJsonValue, route } from "@/lib/http/route";
import { addCommentAs, listCommentsAs } from "@/lib/services/comments";

type P = { inspectionId: string };

/** Comments on the report and its findings (the office's, and the master's return comments). */
export const GET = route<P>(async (_req, { inspectionId }) => listCommentsAs(await requireActor(), inspectionId));

/** The office comments on the report or one finding; the vessel's officers and master are told by e-mail. */
export const POST = route<P>(async (req, { inspectionId }) => created(await addCommentAs(await requireActor(), inspectionId, await readJsonValue(req))));
