import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import { deleteRecipientAs, updateRecipientAs } from "@/lib/services/recipients";

type P = { vesselId: string; recipientId: string };

export const PUT = route<P>(async (req, { vesselId, recipientId }) => {
  const actor = await requireActor();
  return { recipient: await updateRecipientAs(actor, vesselId, recipientId, await readJsonValue(req)) };
});

export const DELETE = route<P>(async (_req, { vesselId, recipientId }) => deleteRecipientAs(await requireActor(), vesselId, recipientId));
