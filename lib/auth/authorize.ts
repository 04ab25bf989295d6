import "server-only";
// The one authorization module. Every route handler, server action and page
// calls these before it reads or writes: they resolve the signed-in user's
// memberships and either return the scoped record or throw.
//   - no session                         → 401 (pages redirect to sign-in)
//   - a record of another vessel/company → 404, the same as a record that does not exist
//   - own record, role not allowed       → 403
import { z } from "zod";
import { unsafeGetInspectionScope } from "@/db/queries/inspections";
import { unsafeGetVesselById } from "@/db/queries/vessels";
import { AppError } from "@/lib/errors";
import type { TRole } from "@/lib/vocabulary";
import { requireActor, type TActor } from "./actor";
import { rolesInOrg, rolesOnVessel } from "./roles";

const ZId = z.uuid();

export async function authorizeVessel({
  vesselId,
  allow,
  actor,
}: {
  vesselId: string;
  allow: readonly TRole[];
  actor?: TActor;
}) {
  const who = actor ?? (await requireActor());
  if (!ZId.safeParse(vesselId).success) throw new AppError("not_found", "No such vessel.");
  const vessel = await unsafeGetVesselById({ vesselId });
  const roles = vessel ? rolesOnVessel(who.memberships, vessel) : [];
  if (!vessel || roles.length === 0) throw new AppError("not_found", "No such vessel.");
  if (!roles.some((r) => allow.includes(r))) throw new AppError("forbidden");
  return { actor: who, vessel, roles, orgId: vessel.orgId };
}

/**
 * A company-wide permission (admin pages, settings). Returns the company in
 * which the actor holds one of the roles; a user with none of them gets 403.
 */
export async function authorizeOrg({ allow, actor }: { allow: readonly TRole[]; actor?: TActor }) {
  const who = actor ?? (await requireActor());
  const orgIds = [...new Set(who.memberships.map((m) => m.orgId))];
  const orgId = orgIds.find((id) => rolesInOrg(who.memberships, id).some((r) => allow.includes(r)));
  if (!orgId) throw new AppError("forbidden");
  return { actor: who, orgId, roles: rolesInOrg(who.memberships, orgId) };
}

/** Any signed-in user (their own profile, the shared-report list of a surveyor). */
export async function authorizeSignedIn() {
  return { actor: await requireActor() };
}

/** An inspection, through the vessel it belongs to: the same 404 / 403 rules as the vessel. */
export async function authorizeInspection({ inspectionId, allow, actor }: { inspectionId: string; allow: readonly TRole[]; actor?: TActor }) {
  const who = actor ?? (await requireActor());
  if (!ZId.safeParse(inspectionId).success) throw new AppError("not_found", "No such inspection.");
  const scope = await unsafeGetInspectionScope({ inspectionId });
  if (!scope) throw new AppError("not_found", "No such inspection.");
  try {
    return { ...(await authorizeVessel({ actor: who, vesselId: scope.vesselId, allow })), inspectionId };
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") throw new AppError("not_found", "No such inspection.");
    throw error;
  }
}
