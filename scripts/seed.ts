// Seeds the demo scenario into DATABASE_URL once; running it again changes nothing.
import { createDb } from "@/db/client";
import { seedDemo } from "@/db/seed/demo";

const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set");
const db = createDb(url, 1);
const created = await seedDemo(db);
console.log(created ? "demo scenario seeded" : "demo scenario already present; nothing changed");
await db.pool.end();
