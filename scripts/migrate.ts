// Applies the committed migrations in drizzle/ to DATABASE_URL.
import path from "node:path";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { createDb } from "@/db/client";

const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set");
const db = createDb(url, 1);
await migrate(db, { migrationsFolder: path.join(import.meta.dirname, "..", "drizzle") });
await db.pool.end();
