import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import * as schema from "./schema";

/** A Drizzle client on its own pool; scripts and tests use this directly. */
export function createDb(url: string, max = 10) {
  const pool = new Pool({ connectionString: url, max });
  return Object.assign(drizzle(pool, { schema }), { pool });
}
export type TDb = ReturnType<typeof createDb>;
