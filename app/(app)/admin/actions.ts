"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { runFormAction, type TActionState } from "@/lib/http/action";
import { ZMembershipInput, ZUserInput } from "@/lib/schemas/user";
import { ZVesselInput } from "@/lib/schemas/vessel";
import { createUserAs, grantRoleAs, revokeRoleAs } from "@/lib/services/users";
import { createVesselAs, updateVesselAs } from "@/lib/services/vessels";

// Server actions are public endpoints: each one signs in the actor and the
// service it calls authorizes through lib/auth/authorize.ts.

export async function createVesselAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  return runFormAction(form, ZVesselInput, async (input, actor) => {
    const vessel = await createVesselAs(actor, input);
    revalidatePath("/admin/vessels");
    return `Vessel ${vessel.name} (IMO ${vessel.imoNumber}) created.`;
  });
}

export async function updateVesselAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  const vesselId = String(form.get("$vesselId") ?? "");
  return runFormAction(form, ZVesselInput, async (input, actor) => {
    const vessel = await updateVesselAs(actor, vesselId, input);
    revalidatePath(`/vessels/${vesselId}`);
    return `Vessel ${vessel?.name ?? ""} saved.`;
  });
}

export async function createUserAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  return runFormAction(form, ZUserInput, async (input, actor) => {
    const user = await createUserAs(actor, input);
    revalidatePath("/admin/users");
    return `User ${user.email} created.`;
  });
}

const ZGrant = z.object({ userId: z.uuid("choose a user") }).and(ZMembershipInput);

export async function grantRoleAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  return runFormAction(form, ZGrant, async (input, actor) => {
    await grantRoleAs(actor, input.userId, input);
    revalidatePath("/admin/users");
    return "Role granted.";
  });
}

const ZRevoke = z.object({ membershipId: z.uuid() });

export async function revokeRoleAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  return runFormAction(form, ZRevoke, async (input, actor) => {
    await revokeRoleAs(actor, input.membershipId);
    revalidatePath("/admin/users");
    return "Role removed.";
  });
}
