import { requireActor } from "@/lib/auth/actor";
import { created, route } from "@/lib/http/route";
import { resendDeliveryAs } from "@/lib/services/deliveries";

type P = { deliveryId: string };

/** The office sends the same signed report to the same address again (a new, logged delivery). */
export const POST = route<P>(async (_req, { deliveryId }) => created(await resendDeliveryAs(await requireActor(), deliveryId)));
