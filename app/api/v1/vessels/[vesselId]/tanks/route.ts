import { requireActor } from "@/lib/auth/actor";
import { created, readJsonValue, route } from "@/lib/http/route";
import type { TServed, TTankList } from "@/lib/schemas/responses";
import { createTankAs, readVesselTanks } from "@/lib/services/tanks";

type P = { vesselId: string };

export const GET = route<P>(async (_req, { vesselId }) => {
  const { tanks } = await readVesselTanks(await requireActor(), vesselId);
  return { tanks } satisfies TServed<TTankList>;
});

export const POST = route<P>(async (req, { vesselId }) => {
  const actor = await requireActor();
  return created({ tank: await createTankAs(actor, vesselId, await readJsonValue(req)) });
});
