import "server-only";
// Where a vessel's signed reports go: its office and class addresses. The ship
// reads the list (to see where its report goes); the office keeps it.
import { z } from "zod";
import * as q from "@/db/queries/recipients";
import type { TActor } from "@/lib/auth/actor";
import { authorizeVessel } from "@/lib/auth/authorize";
import { AppError, databaseErrorCode } from "@/lib/errors";
import { validateInput } from "@/lib/http/route";
import { RECIPIENTS_PER_VESSEL, ZRecipientInput, type TRecipientInput } from "@/lib/schemas/recipient";
import type { TRole } from "@/lib/vocabulary";
import { VESSEL_READERS } from "./vessels";

export const RECIPIENT_EDITORS = ["superintendent", "admin"] as const;

export const canManageRecipients = (roles: readonly TRole[]) => roles.some((r) => (RECIPIENT_EDITORS as readonly TRole[]).includes(r));

const checkRecipientId = (id: string) => {
  if (!z.uuid().safeParse(id).success) throw new AppError("not_found", "No such recipient.");
};

const duplicateEmail = (error: unknown, input: TRecipientInput): never => {
  if (databaseErrorCode(error) === "23505") {
    throw new AppError("conflict", `${input.email} is already a recipient of this vessel.`, [{ path: "email", message: "is already a recipient of this vessel" }]);
  }
  throw error;
};

export async function listRecipientsAs(actor: TActor, vesselId: string) {
  const { orgId, roles } = await authorizeVessel({ actor, vesselId, allow: VESSEL_READERS });
  return { recipients: await q.listRecipients({ orgId, vesselId }), canEdit: canManageRecipients(roles), max: RECIPIENTS_PER_VESSEL };
}

export async function addRecipientAs(actor: TActor, vesselId: string, body: unknown) {
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: RECIPIENT_EDITORS });
  const input = validateInput(ZRecipientInput, body);
  const row = await q.addRecipient({ orgId, vesselId, actorUserId: actor.userId, input, max: RECIPIENTS_PER_VESSEL }).catch((e) => duplicateEmail(e, input));
  if (!row) {
    throw new AppError("conflict", `This vessel already has ${RECIPIENTS_PER_VESSEL} recipients, the most it can have; remove one first.`, [
      { path: "email", message: `the vessel already has ${RECIPIENTS_PER_VESSEL} recipients` },
    ]);
  }
  return row;
}

export async function updateRecipientAs(actor: TActor, vesselId: string, recipientId: string, body: unknown) {
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: RECIPIENT_EDITORS });
  checkRecipientId(recipientId);
  const input = validateInput(ZRecipientInput, body);
  const row = await q.updateRecipient({ orgId, vesselId, recipientId, actorUserId: actor.userId, input }).catch((e) => duplicateEmail(e, input));
  if (!row) throw new AppError("not_found", "No such recipient.");
  return row;
}

export async function deleteRecipientAs(actor: TActor, vesselId: string, recipientId: string) {
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: RECIPIENT_EDITORS });
  checkRecipientId(recipientId);
  const row = await q.deleteRecipient({ orgId, vesselId, recipientId, actorUserId: actor.userId });
  if (!row) throw new AppError("not_found", "No such recipient.");
  return { ok: true };
}
