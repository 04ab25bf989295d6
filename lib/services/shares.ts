import "server-only";
// Sharing countersigned reports with class: the office shares a report with
// one of the company's surveyors; the surveyor sees only what was shared and
// acknowledges it; the office sees who acknowledged what and when.
import { z } from "zod";
import { getOrganisation } from "@/db/queries/organisations";
import * as q from "@/db/queries/shares";
import { getReportFile } from "@/db/queries/signing";
import type { TActor } from "@/lib/auth/actor";
import { authorizeInspection, authorizeOrg } from "@/lib/auth/authorize";
import { serverEnv } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { validateInput } from "@/lib/http/route";
import { sendMail } from "@/lib/mail/mailer";
import { ZAcknowledgeInput, ZShareInput } from "@/lib/schemas/share";
import { presignDownload } from "@/lib/storage/s3";
import { reportSharedEmail } from "@/templates/email/report-shared";
import { readInspectionView } from "./inspections";
import { VESSEL_READERS } from "./vessels";

/** Who shares reports with class: the office. */
export const SHARERS = ["superintendent", "admin"] as const;

export async function listSharesAs(actor: TActor, inspectionId: string) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: VESSEL_READERS });
  const canShare = auth.roles.some((r) => (SHARERS as readonly string[]).includes(r));
  return {
    shares: await q.listSharesOfInspection({ orgId: auth.orgId, inspectionId }),
    surveyors: canShare ? await q.listOrgSurveyors({ orgId: auth.orgId }) : [],
    canShare,
  };
}

export async function shareReportAs(actor: TActor, inspectionId: string, body: unknown) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: SHARERS });
  const input = validateInput(ZShareInput, body);
  const view = await readInspectionView(actor, inspectionId);
  if (view.inspection.status !== "countersigned" && view.inspection.status !== "superseded") {
    throw new AppError("conflict", `Only a countersigned report can be shared with class; this one is ${view.inspection.status}.`, [{ path: "status", message: view.inspection.status }]);
  }
  if (!(await getReportFile({ orgId: auth.orgId, inspectionId }))) throw new AppError("conflict", "The signed PDF is still being prepared: share it in a minute.");
  const surveyor = (await q.listOrgSurveyors({ orgId: auth.orgId })).find((u) => u.id === input.surveyorUserId);
  if (!surveyor) throw new AppError("bad_request", "Check surveyorUserId: it is not a surveyor of this company.", [{ path: "surveyorUserId", message: "is not a surveyor of this company" }]);
  const row = await q.insertShare({ orgId: auth.orgId, inspectionId, surveyorUserId: surveyor.id, sharedBy: actor.userId });
  if (row) {
    const env = serverEnv();
    const mail = reportSharedEmail({
      company: (await getOrganisation({ orgId: auth.orgId }))?.name ?? "",
      vesselName: view.vessel.name, tankCode: view.tank.code, inspectedOn: view.inspection.inspectedOn, revision: view.inspection.revision,
      url: `${env.APP_URL}/shared`, sharedBy: actor.name,
    });
    // The share stands even if the notice cannot be sent; the surveyor sees it on their list.
    await sendMail({ to: surveyor.email, ...mail }).catch((error) => console.error("[tankwright] share notice e-mail failed", error));
  }
  return { shared: Boolean(row), surveyor: { id: surveyor.id, name: surveyor.name } };
}

export async function unshareReportAs(actor: TActor, inspectionId: string, shareId: string) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: SHARERS });
  if (!z.uuid().safeParse(shareId).success || !(await q.deleteShare({ orgId: auth.orgId, inspectionId, shareId, actorUserId: actor.userId }))) {
    throw new AppError("not_found", "No such share.");
  }
  return { ok: true };
}

/** The surveyor's own list: every report shared with them, in every company. */
export async function listMySharesAs(actor: TActor) {
  await authorizeOrg({ actor, allow: ["surveyor"] });
  return q.listSharesForSurveyor({ surveyorUserId: actor.userId });
}

async function ownShare(actor: TActor, shareId: string) {
  await authorizeOrg({ actor, allow: ["surveyor"] });
  const share = z.uuid().safeParse(shareId).success ? await q.getShareForSurveyor({ surveyorUserId: actor.userId, shareId }) : null;
  if (!share) throw new AppError("not_found", "No such shared report.");
  return share;
}

/** A short-lived link to a shared report's signed PDF, for its surveyor only. */
export async function sharedReportUrlAs(actor: TActor, shareId: string) {
  const share = await ownShare(actor, shareId);
  return presignDownload({ key: share.objectKey, fileName: `TW-${share.vessel}-${share.tank}-rev${share.revision}.pdf`.replace(/[^A-Za-z0-9.-]+/g, "-"), contentType: "application/pdf" });
}

export async function acknowledgeShareAs(actor: TActor, shareId: string, body: unknown) {
  const share = await ownShare(actor, shareId);
  const input = validateInput(ZAcknowledgeInput, body);
  if (share.acknowledgedAt) throw new AppError("conflict", "You have already acknowledged this report.");
  const row = await q.acknowledgeShare({ surveyorUserId: actor.userId, shareId, comment: input.comment ?? null });
  if (!row) throw new AppError("conflict", "You have already acknowledged this report.");
  return { acknowledgedAt: row.acknowledgedAt, comment: row.acknowledgementComment };
}
