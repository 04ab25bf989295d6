import { listTanks } from "@/db/queries/tanks";
import { authorizeVessel } from "@/lib/auth/authorize";
import { route } from "@/lib/http/route";
import { VESSEL_READERS } from "@/lib/services/vessels";

export const GET = route<{ vesselId: string }>(async (_req, { vesselId }) => {
  const { orgId } = await authorizeVessel({ vesselId, allow: VESSEL_READERS });
  return { tanks: await listTanks({ orgId, vesselId }) };
});
