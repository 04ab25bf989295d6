import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import { deleteTankAs, readTank, updateTankAs } from "@/lib/services/tanks";

type P = { vesselId: string; tankId: string };

export const GET = route<P>(async (_req, { vesselId, tankId }) => {
  const { tank, rows } = await readTank(await requireActor(), vesselId, tankId);
  return { tank, members: rows.members, specialFrames: rows.specialFrames };
});

export const PATCH = route<P>(async (req, { vesselId, tankId }) => {
  const actor = await requireActor();
  return { tank: await updateTankAs(actor, vesselId, tankId, await readJsonValue(req)) };
});

export const DELETE = route<P>(async (_req, { vesselId, tankId }) => {
  await deleteTankAs(await requireActor(), vesselId, tankId);
  return { ok: true };
});
