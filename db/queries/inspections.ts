import "server-only";
import { and, asc, desc, eq, ne } from "drizzle-orm";
import { db } from "@/db";
import { findings, inspections } from "@/db/schema";

/** The open findings of a tank's latest countersigned inspection, to look at again. */
export async function listOpenFindingsOfLastCountersigned({ orgId, tankId }: { orgId: string; tankId: string }) {
  const last = await db().query.inspections.findFirst({
    where: and(eq(inspections.orgId, orgId), eq(inspections.tankId, tankId), eq(inspections.status, "countersigned")),
    orderBy: [desc(inspections.inspectedOn), desc(inspections.revision)],
  });
  if (!last) return { inspection: null, findings: [] };
  const rows = await db()
    .select()
    .from(findings)
    .where(and(eq(findings.orgId, orgId), eq(findings.inspectionId, last.id), ne(findings.status, "closed")))
    .orderBy(asc(findings.number));
  return { inspection: last, findings: rows };
}
