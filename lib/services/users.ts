import "server-only";
import { addMembership, createOrgUser, getOrgUser, listOrgUsers, removeMembership } from "@/db/queries/users";
import type { TActor } from "@/lib/auth/actor";
import { authorizeOrg } from "@/lib/auth/authorize";
import { hashPassword } from "@/lib/auth/password";
import { AppError, databaseErrorCode } from "@/lib/errors";
import type { TMembershipInput, TUserInput } from "@/lib/schemas/user";
import { z } from "zod";

const ZId = z.uuid();

export async function listUsersAs(actor: TActor) {
  const { orgId } = await authorizeOrg({ actor, allow: ["admin"] });
  return listOrgUsers({ orgId });
}

export async function createUserAs(actor: TActor, input: TUserInput) {
  const { orgId } = await authorizeOrg({ actor, allow: ["admin"] });
  const passwordHash = await hashPassword(input.password);
  try {
    return await createOrgUser({
      orgId,
      actorUserId: actor.userId,
      input: { email: input.email, name: input.name, rank: input.rank, passwordHash, role: input.role, vesselId: input.vesselId },
    });
  } catch (error) {
    if (databaseErrorCode(error) === "23505") throw new AppError("conflict", "A user with this e-mail address already exists.", [{ path: "email", message: "is already in use" }]);
    throw error;
  }
}

export async function grantRoleAs(actor: TActor, userId: string, input: TMembershipInput) {
  const { orgId } = await authorizeOrg({ actor, allow: ["admin"] });
  if (!ZId.safeParse(userId).success || !(await getOrgUser({ orgId, userId }))) {
    throw new AppError("not_found", "No such user.");
  }
  try {
    return await addMembership({ orgId, actorUserId: actor.userId, userId, role: input.role, vesselId: input.vesselId });
  } catch (error) {
    if (databaseErrorCode(error) === "23505") throw new AppError("conflict", "The user already holds this role.");
    throw error;
  }
}

export async function revokeRoleAs(actor: TActor, membershipId: string) {
  const { orgId } = await authorizeOrg({ actor, allow: ["admin"] });
  if (!ZId.safeParse(membershipId).success) throw new AppError("not_found", "No such role.");
  if (actor.memberships.some((m) => m.id === membershipId && m.role === "admin")) {
    throw new AppError("conflict", "You cannot remove your own administrator role; ask another administrator.");
  }
  const removed = await removeMembership({ orgId, actorUserId: actor.userId, membershipId });
  if (!removed) throw new AppError("not_found", "No such role.");
  return removed;
}
