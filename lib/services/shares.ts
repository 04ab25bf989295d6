import "server-only";
// Sharing countersigned reports with class: the office shares a report with
// one of the company's surveyors; the surveyor sees only what was shared and
// acknowledges it; the office sees who acknowledged what and when.
import { z } from "zod";
import { randomBytes } from "node:crypto";
import { listCoatingForInspections } from "@/db/queries/fleet";
import { getOrganisation, getOrgSettings } from "@/db/queries/organisations";
import { unsafeIssueResetToken } from "@/db/queries/password-reset";
import { addMembership, createOrgUser, getUserWithMemberships, unsafeGetUserByEmail } from "@/db/queries/users";
import { hashPassword } from "@/lib/auth/password";
import * as q from "@/db/queries/shares";
import { getInspectionSummary, getReportFile } from "@/db/queries/signing";
import type { TActor } from "@/lib/auth/actor";
import { rateCoatingArea, rateTank, type TRating } from "@/lib/calc/coating";
import { authorizeInspection, authorizeOrg } from "@/lib/auth/authorize";
import { serverEnv } from "@/lib/env";
import { reportFileName } from "@/lib/format";
import { AppError } from "@/lib/errors";
import { validateInput } from "@/lib/http/route";
import { sendMail } from "@/lib/mail/mailer";
import { ZAcknowledgeInput, ZShareInput } from "@/lib/schemas/share";
import { presignDownload } from "@/lib/storage/s3";
import { reportSharedEmail, surveyorInvitationEmail } from "@/templates/email/report-shared";
import { newResetToken, resetLink } from "./password-reset";
import { VESSEL_READERS } from "./vessels";

/** How long an invitation's "choose your password" link works. */
export const INVITATION_TTL_SECONDS = 7 * 24 * 60 * 60;

/**
 * The surveyor behind an e-mail address: an existing account becomes a
 * surveyor of this company (only if it holds no other kind of role anywhere);
 * an unknown address gets an account with no usable password and a link to choose one.
 */
async function inviteSurveyor(actor: TActor, orgId: string, input: { email: string; name: string }) {
  const existing = await unsafeGetUserByEmail({ email: input.email });
  if (existing) {
    const roles = (await getUserWithMemberships({ userId: existing.id }))?.memberships ?? [];
    if (existing.disabledAt || roles.some((m) => m.role !== "surveyor")) {
      throw new AppError("bad_request", "Check email: this address belongs to an account that is not a class surveyor's; share with a surveyor's address.", [{ path: "email", message: "is not a surveyor's account" }]);
    }
    if (!roles.some((m) => m.orgId === orgId)) await addMembership({ orgId, actorUserId: actor.userId, userId: existing.id, role: "surveyor" });
    return { surveyor: { id: existing.id, name: existing.name, email: existing.email }, inviteLink: null };
  }
  const user = await createOrgUser({ orgId, actorUserId: actor.userId, input: { email: input.email, name: input.name, role: "surveyor", passwordHash: await hashPassword(randomBytes(32).toString("base64url")) } });
  const { token, tokenHash } = newResetToken();
  await unsafeIssueResetToken({ userId: user.id, tokenHash, ttlSeconds: INVITATION_TTL_SECONDS, maxPerWindow: 1, windowSeconds: 60 });
  return { surveyor: { id: user.id, name: user.name, email: user.email }, inviteLink: resetLink(serverEnv().APP_URL, token) };
}

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
  const ins = (await getInspectionSummary({ orgId: auth.orgId, inspectionId }))!;
  if (ins.status !== "countersigned" && ins.status !== "superseded") {
    throw new AppError("conflict", `Only a countersigned report can be shared with class; this one is ${ins.status}.`, [{ path: "status", message: ins.status }]);
  }
  if (!(await getReportFile({ orgId: auth.orgId, inspectionId }))) throw new AppError("conflict", "The signed PDF is still being prepared: share it in a minute.");
  let surveyor: { id: string; name: string; email: string } | undefined;
  let inviteLink: string | null = null;
  if ("surveyorUserId" in input) {
    surveyor = (await q.listOrgSurveyors({ orgId: auth.orgId })).find((u) => u.id === input.surveyorUserId);
    if (!surveyor) throw new AppError("bad_request", "Check surveyorUserId: it is not a surveyor of this company.", [{ path: "surveyorUserId", message: "is not a surveyor of this company" }]);
  } else {
    ({ surveyor, inviteLink } = await inviteSurveyor(actor, auth.orgId, input));
  }
  const row = await q.insertShare({ orgId: auth.orgId, inspectionId, surveyorUserId: surveyor.id, sharedBy: actor.userId });
  const company = (await getOrganisation({ orgId: auth.orgId }))?.name ?? "";
  if (inviteLink) {
    const mail = surveyorInvitationEmail({ company, invitedBy: actor.name, name: surveyor.name, link: inviteLink, vesselName: ins.vesselName, tankCode: ins.tankCode });
    await sendMail({ to: surveyor.email, ...mail }).catch((error) => console.error("[tankwright] surveyor invitation e-mail failed", error));
  } else if (row) {
    const env = serverEnv();
    const mail = reportSharedEmail({
      company, vesselName: ins.vesselName, tankCode: ins.tankCode, inspectedOn: ins.inspectedOn, revision: ins.revision,
      url: `${env.APP_URL}/shared`, sharedBy: actor.name,
    });
    // The share stands even if the notice cannot be sent; the surveyor sees it on their list.
    await sendMail({ to: surveyor.email, ...mail }).catch((error) => console.error("[tankwright] share notice e-mail failed", error));
  }
  return { shared: Boolean(row), invited: Boolean(inviteLink), surveyor: { id: surveyor.id, name: surveyor.name } };
}

export async function unshareReportAs(actor: TActor, inspectionId: string, shareId: string) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: SHARERS });
  if (!z.uuid().safeParse(shareId).success || !(await q.deleteShare({ orgId: auth.orgId, inspectionId, shareId, actorUserId: actor.userId }))) {
    throw new AppError("not_found", "No such share.");
  }
  return { ok: true };
}

/**
 * The surveyor's own list: every report shared with them, in every company,
 * each with the coating rating the signed report states (worst area, under the
 * company's reading of the 20 % boundary; null without a coating record).
 */
export async function listMySharesAs(actor: TActor) {
  await authorizeOrg({ actor, allow: ["surveyor"] });
  const shares = await q.listSharesForSurveyor({ surveyorUserId: actor.userId });
  const rating = new Map<string, TRating | null>();
  for (const orgId of new Set(shares.map((x) => x.orgId))) {
    const ids = shares.filter((x) => x.orgId === orgId).map((x) => x.inspectionId);
    const [settings, coating] = await Promise.all([getOrgSettings({ orgId }), listCoatingForInspections({ orgId, inspectionIds: ids })]);
    const rule = settings?.twentyPercentRule ?? "table";
    for (const id of ids) rating.set(id, rateTank(coating.filter((c) => c.inspectionId === id).map((c) => ({ ...c, rating: rateCoatingArea(c, rule) })))?.rating ?? null);
  }
  return shares.map((x) => ({ ...x, rating: rating.get(x.inspectionId) ?? null }));
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
  return presignDownload({ key: share.objectKey, fileName: reportFileName({ vesselName: share.vessel, tankCode: share.tank, revision: share.revision }), contentType: "application/pdf" });
}

export async function acknowledgeShareAs(actor: TActor, shareId: string, body: unknown) {
  const share = await ownShare(actor, shareId);
  const input = validateInput(ZAcknowledgeInput, body);
  if (share.acknowledgedAt) throw new AppError("conflict", "You have already acknowledged this report.");
  const row = await q.acknowledgeShare({ surveyorUserId: actor.userId, shareId, comment: input.comment ?? null });
  if (!row) throw new AppError("conflict", "You have already acknowledged this report.");
  return { acknowledgedAt: row.acknowledgedAt, comment: row.acknowledgementComment };
}
