import "server-only";
// The office comments on a report or a finding; the vessel's officers and
// master read the comments and are told by e-mail. A comment never changes the
// report itself, so a signed report can be commented on.
import * as q from "@/db/queries/comments";
import { getInspectionSummary } from "@/db/queries/signing";
import type { TActor } from "@/lib/auth/actor";
import { authorizeInspection } from "@/lib/auth/authorize";
import { serverEnv } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { validateInput } from "@/lib/http/route";
import { sendMail } from "@/lib/mail/mailer";
import { ZCommentInput } from "@/lib/schemas/comment";
import { commentNoticeEmail } from "@/templates/email/comment-notice";
import { VESSEL_READERS } from "./vessels";

export const COMMENTERS = ["superintendent", "admin"] as const;

export async function listCommentsAs(actor: TActor, inspectionId: string) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: VESSEL_READERS });
  return { comments: await q.listComments({ orgId: auth.orgId, inspectionId }), canComment: auth.roles.some((r) => (COMMENTERS as readonly string[]).includes(r)) };
}

export async function addCommentAs(actor: TActor, inspectionId: string, body: unknown) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: COMMENTERS });
  const input = validateInput(ZCommentInput, body);
  const finding = input.findingId ? await q.findingOfInspection({ orgId: auth.orgId, inspectionId, findingId: input.findingId }) : null;
  if (input.findingId && !finding) throw new AppError("bad_request", "Check findingId: it is not a finding of this report.", [{ path: "findingId", message: "is not a finding of this report" }]);
  const row = await q.insertComment({ orgId: auth.orgId, inspectionId, authorId: actor.userId, body: input.body, findingId: finding?.id ?? null });
  const ins = (await getInspectionSummary({ orgId: auth.orgId, inspectionId }))!;
  const crew = await q.listVesselCrewEmails({ orgId: auth.orgId, vesselId: auth.vessel.id });
  let notified = 0;
  if (crew.length) {
    const mail = commentNoticeEmail({
      author: `${actor.name}${actor.rank ? `, ${actor.rank}` : ""}`, vesselName: ins.vesselName, tankCode: ins.tankCode, inspectedOn: ins.inspectedOn,
      findingNumber: finding?.number ?? null, body: input.body, url: `${serverEnv().APP_URL}/inspections/${inspectionId}?step=review`,
    });
    // The comment stands even if the notice cannot be sent.
    const sent = await sendMail({ to: crew, ...mail }).then(
      () => true,
      (error) => (console.error("[tankwright] comment notice e-mail failed", error), false),
    );
    if (sent) notified = crew.length;
  }
  // How many of the vessel's officers and master were told by e-mail (0: nobody has an address, or the mail failed).
  return { id: row.id, createdAt: row.createdAt, notified };
}
