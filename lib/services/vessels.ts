import "server-only";
// What the API and the admin pages do with vessels, behind the one authorization module.
import { listTanks } from "@/db/queries/tanks";
import { createVessel, listVessels, updateVessel } from "@/db/queries/vessels";
import { AppError, databaseErrorCode } from "@/lib/errors";
import { authorizeOrg, authorizeVessel } from "@/lib/auth/authorize";
import type { TActor } from "@/lib/auth/actor";
import { visibleVesselScope } from "@/lib/auth/roles";
import type { TVesselInput } from "@/lib/schemas/vessel";

export const VESSEL_READERS = ["officer", "master", "superintendent", "admin"] as const;
/** Who keeps a vessel's particulars: its officers and master, and the office. */
export const VESSEL_EDITORS = ["officer", "master", "superintendent", "admin"] as const;

/** Every vessel the actor may open, across the companies they hold roles in. */
export async function listVisibleVessels(actor: TActor) {
  const out = [];
  for (const [orgId, ids] of visibleVesselScope(actor.memberships)) {
    out.push(...(await listVessels({ orgId, vesselIds: ids ? [...ids] : undefined })));
  }
  return out;
}

const duplicateImo = (error: unknown, imo: string): never => {
  if (databaseErrorCode(error) === "23505") {
    throw new AppError("conflict", `IMO ${imo} is already a vessel of this company.`, [{ path: "imoNumber", message: "is already used by a vessel of this company" }]);
  }
  throw error;
};

export async function createVesselAs(actor: TActor, input: TVesselInput) {
  const { orgId } = await authorizeOrg({ actor, allow: ["admin"] });
  return createVessel({ orgId, actorUserId: actor.userId, input }).catch((e) => duplicateImo(e, input.imoNumber));
}

export async function updateVesselAs(actor: TActor, vesselId: string, input: TVesselInput) {
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: VESSEL_EDITORS });
  const outside = (await listTanks({ orgId, vesselId })).filter((t) => t.frameFrom < input.frameFirst || t.frameTo > input.frameLast);
  if (outside.length) {
    throw new AppError("conflict", `The new frames would leave ${outside.map((t) => t.code).join(", ")} outside the vessel; change those tanks first.`, [
      { path: "frameLast", message: "would leave tanks outside the vessel's frames" },
    ]);
  }
  return updateVessel({ orgId, vesselId, actorUserId: actor.userId, input }).catch((e) => duplicateImo(e, input.imoNumber));
}
