import { requireActor } from "@/lib/auth/actor";
import { created, readJsonValue, route } from "@/lib/http/route";
import { addRecipientAs, listRecipientsAs } from "@/lib/services/recipients";

type P = { vesselId: string };

/** The vessel's report recipients, and whether the caller may change them. */
export const GET = route<P>(async (_req, { vesselId }) => listRecipientsAs(await requireActor(), vesselId));

/** Adds a recipient (kind, optional name, e-mail). */
export const POST = route<P>(async (req, { vesselId }) => {
  const actor = await requireActor();
  return created({ recipient: await addRecipientAs(actor, vesselId, await readJsonValue(req)) });
});
