import "server-only";
// Sends one signed report to one recipient: attached when it is under the size
// limit, otherwise as a download link that expires. Every try is logged on the
// delivery row; a failure is thrown so that the queue retries with back-off.
import * as q from "@/db/queries/signing";
import { serverEnv } from "@/lib/env";
import { formatDateTime, reportFileName } from "@/lib/format";
import { sendMail } from "@/lib/mail/mailer";
import { presignDownload, readObject } from "@/lib/storage/s3";
import { signedReportEmail } from "@/templates/email/signed-report";

export type TEmailDeliveryJob = { orgId: string; deliveryId: string };

export async function runEmailDelivery({ orgId, deliveryId }: TEmailDeliveryJob) {
  const found = await q.getDeliveryWithReport({ orgId, deliveryId });
  if (!found || found.delivery.status === "sent") return { skipped: true };
  const { delivery, file, inspection, vessel, tank } = found;
  const env = serverEnv();
  const fileName = reportFileName({ vesselName: vessel.name, tankCode: tank.code, revision: inspection.revision });
  try {
    const attach = file.sizeBytes <= env.MAIL_ATTACHMENT_LIMIT_BYTES;
    const linkExpiresAt = attach ? null : new Date(Date.now() + env.REPORT_LINK_TTL_SECONDS * 1000);
    const link = attach ? null : await presignDownload({ key: file.objectKey, expiresIn: env.REPORT_LINK_TTL_SECONDS, fileName, inline: false, contentType: "application/pdf" });
    const mail = signedReportEmail({
      vesselName: vessel.name, imoNumber: vessel.imoNumber, tankCode: tank.code, tankName: tank.name, inspectedOn: inspection.inspectedOn,
      place: inspection.place, revision: inspection.revision, sha256: file.sha256, verifyUrl: `${env.APP_URL}/verify`,
      link, linkExpires: linkExpiresAt ? formatDateTime(linkExpiresAt) : null, fileName,
    });
    const { messageId } = await sendMail({
      to: delivery.recipient, subject: mail.subject, text: mail.text, html: mail.html,
      attachments: attach ? [{ filename: fileName, content: await readObject(file.objectKey, env.MAIL_ATTACHMENT_LIMIT_BYTES), contentType: "application/pdf" }] : undefined,
    });
    await q.markDeliverySent({ orgId, deliveryId, messageId, method: attach ? "attachment" : "link", linkExpiresAt });
    return { sent: true };
  } catch (error) {
    await q.markDeliveryFailed({ orgId, deliveryId, error: error instanceof Error ? error.message : String(error) });
    throw error;
  }
}
