import "server-only";
import { serverEnv } from "@/lib/env";
import { createDb, type TDb } from "./client";

export type { TDb };

const globalForDb = globalThis as unknown as { tankwrightDb?: TDb };

/** The process-wide client (kept across hot reloads in development). */
export function db(): TDb {
  if (!globalForDb.tankwrightDb) {
    const env = serverEnv();
    globalForDb.tankwrightDb = createDb(env.DATABASE_URL, env.DATABASE_POOL_MAX);
  }
  return globalForDb.tankwrightDb;
}
