import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { listDeliveriesAs } from "@/lib/services/deliveries";

type P = { inspectionId: string };

/** Every e-mail that carried this report's signed PDF: queued, sent or failed with its error. */
export const GET = route<P>(async (_req, { inspectionId }) => ({ deliveries: await listDeliveriesAs(await requireActor(), inspectionId) }));
