import { requireActor } from "@/lib/auth/actor";
import { created, readJsonValue, route } from "@/lib/http/route";
import { listInspectionsAs, startInspectionAs } from "@/lib/services/inspections";

type P = { vesselId: string };

export const GET = route<P>(async (_req, { vesselId }) => ({ inspections: await listInspectionsAs(await requireActor(), vesselId) }));

/** Starts an inspection (draft). A client-chosen `id` makes a retried start return the same inspection. */
export const POST = route<P>(async (req, { vesselId }) => {
  const actor = await requireActor();
  return created({ inspection: await startInspectionAs(actor, vesselId, await readJsonValue(req)) });
});
