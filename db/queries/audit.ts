import "server-only";
import type { TWriter } from "@/db/seed/builders";
import { auditLog } from "@/db/schema";

/** Appends to the audit log inside the caller's transaction. */
export async function writeAudit(
  w: TWriter,
  v: { orgId: string; actorUserId: string; action: string; entity: string; entityId?: string; detail?: unknown },
) {
  await w.insert(auditLog).values({ ...v, detail: v.detail ?? null });
}
