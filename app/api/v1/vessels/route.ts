import { requireActor } from "@/lib/auth/actor";
import { authorizeOrg } from "@/lib/auth/authorize";
import { created, readJson, route } from "@/lib/http/route";
import type { TServed, TVesselList } from "@/lib/schemas/responses";
import { ZVesselInput } from "@/lib/schemas/vessel";
import { createVesselAs, listVisibleVessels } from "@/lib/services/vessels";

export const GET = route(async () => {
  const actor = await requireActor();
  return { vessels: await listVisibleVessels(actor) } satisfies TServed<TVesselList>;
});

export const POST = route(async (req) => {
  const actor = await requireActor();
  await authorizeOrg({ actor, allow: ["admin"] });
  const input = await readJson(req, ZVesselInput);
  return created({ vessel: await createVesselAs(actor, input) });
});
