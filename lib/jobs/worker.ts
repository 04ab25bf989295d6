import "server-only";
// Starts the workers of this app instance (JOBS_WORKER on): several instances
// share the queue; each job is taken by one of them.
import { serverEnv } from "@/lib/env";
import { runEmailDelivery, type TEmailDeliveryJob } from "./email-delivery";
import { runPhotoVariants, type TPhotoVariantsJob } from "./photo-variants";
import { jobQueue, QUEUES } from "./queue";
import { runReportRender, type TReportRenderJob } from "./report-render";
import { requeueMissingReports } from "./report-sweep";
import { runUploadsCleanup } from "./uploads-cleanup";

export async function startWorkers() {
  if (!serverEnv().JOBS_WORKER) return;
  const boss = await jobQueue();
  await boss.work<TPhotoVariantsJob>(QUEUES.photoVariants, { batchSize: 1, pollingIntervalSeconds: 1 }, async ([job]) => {
    if (job) return runPhotoVariants(job.data);
  });
  await boss.work<TReportRenderJob>(QUEUES.reportRender, { batchSize: 1, pollingIntervalSeconds: 1 }, async ([job]) => {
    if (job) return runReportRender(job.data);
  });
  await boss.work<TEmailDeliveryJob>(QUEUES.emailDelivery, { batchSize: 1, pollingIntervalSeconds: 1 }, async ([job]) => {
    if (job) return runEmailDelivery(job.data);
  });
  await boss.work(QUEUES.uploadsCleanup, { batchSize: 1, pollingIntervalSeconds: 30 }, async () => ({ ...(await runUploadsCleanup()), ...(await requeueMissingReports()) }));
  await boss.schedule(QUEUES.uploadsCleanup, "*/15 * * * *");
  const { requeued } = await requeueMissingReports();
  console.log(`[tankwright] background workers started${requeued ? `; ${requeued} signed PDF${requeued > 1 ? "s" : ""} to render` : ""}`);
}
