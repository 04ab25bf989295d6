import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { unshareReportAs } from "@/lib/services/shares";

type P = { inspectionId: string; shareId: string };

/** The office withdraws a share. */
export const DELETE = route<P>(async (_req, { inspectionId, shareId }) => unshareReportAs(await requireActor(), inspectionId, shareId));
