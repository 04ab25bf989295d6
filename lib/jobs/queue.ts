import "server-only";
// The job queue on PostgreSQL (pg-boss): work that takes time runs outside the
// request. Every app instance can send; instances with JOBS_WORKER on also work.
import PgBoss from "pg-boss";
import { serverEnv } from "@/lib/env";

export const QUEUES = {
  photoVariants: "photo-variants",
  uploadsCleanup: "uploads-cleanup",
  reportRender: "report-render",
  emailDelivery: "email-delivery",
} as const;
export type TQueue = (typeof QUEUES)[keyof typeof QUEUES];

const globalForBoss = globalThis as unknown as { tankwrightBoss?: Promise<PgBoss> };

async function startBoss(): Promise<PgBoss> {
  const env = serverEnv();
  const boss = new PgBoss({
    connectionString: env.DATABASE_URL,
    schema: "pgboss",
    max: 4,
    // Maintenance and cron run where jobs are worked; a send-only instance stays light.
    supervise: env.JOBS_WORKER,
    schedule: env.JOBS_WORKER,
  });
  boss.on("error", (error) => console.error("[tankwright] job queue error", error));
  await boss.start();
  for (const name of Object.values(QUEUES)) {
    // Retried with back-off after a crash or a passing storage fault; a job that runs too long is retried too.
    await boss.createQueue(name, { name, retryLimit: 5, retryDelay: 5, retryBackoff: true, expireInSeconds: 300 });
  }
  return boss;
}

export function jobQueue(): Promise<PgBoss> {
  globalForBoss.tankwrightBoss ??= startBoss().catch((error) => {
    globalForBoss.tankwrightBoss = undefined;
    throw error;
  });
  return globalForBoss.tankwrightBoss;
}

export async function sendJob(name: TQueue, data: object) {
  const boss = await jobQueue();
  return boss.send(name, data);
}
