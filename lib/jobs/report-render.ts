import "server-only";
// After countersigning: render the final PDF, store it, record its SHA-256
// fingerprint, then queue one e-mail per recipient of the vessel. Idempotent:
// a PDF already recorded is not rendered again, deliveries are queued once.
import { createHash } from "node:crypto";
import { listRecipientsForDelivery } from "@/db/queries/recipients";
import * as q from "@/db/queries/signing";
import { loadReportData } from "@/lib/report/load";
import { renderReportPdf } from "@/lib/report/render";
import { signedReportKey } from "@/lib/storage/keys";
import { writeObject } from "@/lib/storage/s3";
import { QUEUES, sendJob } from "./queue";

export type TReportRenderJob = { orgId: string; inspectionId: string };

export async function runReportRender({ orgId, inspectionId }: TReportRenderJob) {
  const ins = await q.getInspectionSummary({ orgId, inspectionId });
  if (!ins || (ins.status !== "countersigned" && ins.status !== "superseded")) return { skipped: true };
  let file = await q.getReportFile({ orgId, inspectionId });
  if (!file) {
    const pdf = await renderReportPdf(await loadReportData({ orgId, inspectionId }));
    const sha256 = createHash("sha256").update(pdf).digest("hex");
    // The fingerprint is part of the key: a retry that renders again never overwrites a recorded file.
    const objectKey = signedReportKey({ orgId, vesselId: ins.vesselId, inspectionId, revision: ins.revision }).replace(/\.pdf$/, `-${sha256.slice(0, 12)}.pdf`);
    await writeObject({ key: objectKey, body: pdf, contentType: "application/pdf" });
    file = await q.insertReportFile({ orgId, inspectionId, objectKey, sha256, sizeBytes: pdf.length });
  }
  if ((await q.countDeliveries({ orgId, reportFileId: file.id })) === 0) {
    const recipients = await listRecipientsForDelivery({ orgId, vesselId: ins.vesselId });
    const rows = await q.insertDeliveries({ orgId, reportFileId: file.id, recipients: recipients.map((r) => r.email), queuedBy: null, purpose: "signed-report" });
    for (const row of rows) await sendJob(QUEUES.emailDelivery, { orgId, deliveryId: row.id });
  }
  return { sha256: file.sha256, sizeBytes: file.sizeBytes };
}
