import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { organisations, orgSettings } from "@/db/schema";

export async function getOrganisation({ orgId }: { orgId: string }) {
  return db().query.organisations.findFirst({ where: eq(organisations.id, orgId) });
}

export async function getOrgSettings({ orgId }: { orgId: string }) {
  return db().query.orgSettings.findFirst({ where: eq(orgSettings.orgId, orgId) });
}
