import { authorizeVessel } from "@/lib/auth/authorize";
import { requireActor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { readJson, route } from "@/lib/http/route";
import { ZVesselInput } from "@/lib/schemas/vessel";
import { updateVesselAs, VESSEL_EDITORS, VESSEL_READERS } from "@/lib/services/vessels";

type P = { vesselId: string };

export const GET = route<P>(async (_req, { vesselId }) => {
  const { vessel } = await authorizeVessel({ vesselId, allow: VESSEL_READERS });
  return { vessel };
});

export const PATCH = route<P>(async (req, { vesselId }) => {
  const actor = await requireActor();
  // Authorize before reading the body, so that a stranger learns nothing from validation messages.
  await authorizeVessel({ actor, vesselId, allow: VESSEL_EDITORS });
  const input = await readJson(req, ZVesselInput);
  const vessel = await updateVesselAs(actor, vesselId, input);
  if (!vessel) throw new AppError("not_found", "No such vessel.");
  return { vessel };
});
