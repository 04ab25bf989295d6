import "server-only";
import { and, asc, count, eq } from "drizzle-orm";
import { db } from "@/db";
import { vesselRecipients, vessels } from "@/db/schema";
import type { TRecipientInput } from "@/lib/schemas/recipient";
import { writeAudit } from "./audit";

type TScope = { orgId: string; vesselId: string };

const columns = { id: vesselRecipients.id, kind: vesselRecipients.kind, name: vesselRecipients.name, email: vesselRecipients.email };
const scoped = ({ orgId, vesselId }: TScope) => and(eq(vesselRecipients.orgId, orgId), eq(vesselRecipients.vesselId, vesselId));

/** The vessel's recipients: office first, then class, each by address. */
export async function listRecipients(scope: TScope) {
  return db().select(columns).from(vesselRecipients).where(scoped(scope)).orderBy(asc(vesselRecipients.kind), asc(vesselRecipients.email));
}

/** The addresses a signed report of the vessel is sent to (the delivery job). */
export async function listRecipientsForDelivery(scope: TScope) {
  return listRecipients(scope);
}

/**
 * Adds a recipient unless the vessel already has `max`. The vessel row is locked
 * for the count, so two adds at the same moment cannot both pass the limit.
 * Returns null when the limit is reached.
 */
export async function addRecipient(v: TScope & { actorUserId: string; input: TRecipientInput; max: number }) {
  return db().transaction(async (tx) => {
    await tx.select({ id: vessels.id }).from(vessels).where(and(eq(vessels.orgId, v.orgId), eq(vessels.id, v.vesselId))).for("no key update");
    const [{ n } = { n: 0 }] = await tx.select({ n: count() }).from(vesselRecipients).where(scoped(v));
    if (n >= v.max) return null;
    const [row] = await tx
      .insert(vesselRecipients)
      .values({ orgId: v.orgId, vesselId: v.vesselId, kind: v.input.kind, name: v.input.name ?? null, email: v.input.email })
      .returning(columns);
    await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: "create", entity: "vessel_recipient", entityId: row!.id, detail: { vesselId: v.vesselId, kind: row!.kind, email: row!.email } });
    return row!;
  });
}

export async function updateRecipient(v: TScope & { recipientId: string; actorUserId: string; input: TRecipientInput }) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .update(vesselRecipients)
      .set({ kind: v.input.kind, name: v.input.name ?? null, email: v.input.email })
      .where(and(scoped(v), eq(vesselRecipients.id, v.recipientId)))
      .returning(columns);
    if (row) await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: "update", entity: "vessel_recipient", entityId: row.id, detail: { vesselId: v.vesselId, kind: row.kind, email: row.email } });
    return row;
  });
}

export async function deleteRecipient(v: TScope & { recipientId: string; actorUserId: string }) {
  return db().transaction(async (tx) => {
    const [row] = await tx.delete(vesselRecipients).where(and(scoped(v), eq(vesselRecipients.id, v.recipientId))).returning(columns);
    if (row) await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: "delete", entity: "vessel_recipient", entityId: row.id, detail: { vesselId: v.vesselId, email: row.email } });
    return row;
  });
}
