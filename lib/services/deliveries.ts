import "server-only";
// The log of e-mails that carried a signed report, and sending one again.
import { writeAudit } from "@/db/queries/audit";
import * as q from "@/db/queries/signing";
import { db } from "@/db";
import type { TActor } from "@/lib/auth/actor";
import { authorizeInspection, authorizeVessel } from "@/lib/auth/authorize";
import { AppError } from "@/lib/errors";
import { QUEUES, sendJob } from "@/lib/jobs/queue";
import { z } from "zod";
import { VESSEL_READERS } from "./vessels";

/** The office re-sends a report (after a bounce, or to a recipient who lost it). */
export const RESENDERS = ["superintendent", "admin"] as const;

export async function listDeliveriesAs(actor: TActor, inspectionId: string) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: VESSEL_READERS });
  const file = await q.getReportFile({ orgId: auth.orgId, inspectionId });
  if (!file) return [];
  const rows = await q.listDeliveries({ orgId: auth.orgId, reportFileId: file.id });
  return rows.map((d) => ({
    id: d.id, recipient: d.recipient, status: d.status, attempts: d.attempts, lastError: d.lastError, method: d.method,
    linkExpiresAt: d.linkExpiresAt, sentAt: d.sentAt, createdAt: d.createdAt, resent: d.queuedBy !== null,
  }));
}

/** Queues the same report to the same address again, as a new logged delivery. */
export async function resendDeliveryAs(actor: TActor, deliveryId: string) {
  if (!z.uuid().safeParse(deliveryId).success) throw new AppError("not_found", "No such delivery.");
  const scope = await q.unsafeGetDeliveryScope({ deliveryId });
  if (!scope) throw new AppError("not_found", "No such delivery.");
  let auth;
  try {
    auth = await authorizeVessel({ actor, vesselId: scope.vesselId, allow: RESENDERS });
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") throw new AppError("not_found", "No such delivery.");
    throw error;
  }
  const found = await q.getDeliveryWithReport({ orgId: auth.orgId, deliveryId });
  if (!found) throw new AppError("not_found", "No such delivery.");
  const [row] = await q.insertDeliveries({ orgId: auth.orgId, reportFileId: found.file.id, recipients: [found.delivery.recipient], queuedBy: actor.userId, purpose: "signed-report" });
  await writeAudit(db(), { orgId: auth.orgId, actorUserId: actor.userId, action: "delivery.resend", entity: "email_delivery", entityId: row!.id, detail: { of: deliveryId, recipient: found.delivery.recipient } });
  await sendJob(QUEUES.emailDelivery, { orgId: auth.orgId, deliveryId: row!.id });
  return { id: row!.id, recipient: row!.recipient, status: row!.status };
}
