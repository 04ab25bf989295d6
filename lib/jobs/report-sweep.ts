import "server-only";
// A countersigned report must end with its signed PDF: when the worker starts
// and with every scheduled clean-up, revisions without one are queued again
// (the render job is idempotent, so a report queued twice is rendered once).
import { unsafeListCountersignedWithoutPdf } from "@/db/queries/signing";
import { QUEUES, sendJob } from "./queue";

export async function requeueMissingReports() {
  const missing = await unsafeListCountersignedWithoutPdf();
  for (const m of missing) await sendJob(QUEUES.reportRender, m);
  return { requeued: missing.length };
}
