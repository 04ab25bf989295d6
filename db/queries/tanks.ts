import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { tanks } from "@/db/schema";

export async function listTanks({ orgId, vesselId }: { orgId: string; vesselId: string }) {
  return db()
    .select()
    .from(tanks)
    .where(and(eq(tanks.orgId, orgId), eq(tanks.vesselId, vesselId)))
    .orderBy(asc(tanks.sortOrder), asc(tanks.frameFrom), asc(tanks.code));
}
