import "server-only";
import { and, asc, desc, eq, inArray, ne, sql } from "drizzle-orm";
import type { AnyPgColumn } from "drizzle-orm/pg-core";
import { db } from "@/db";
import {
  anodeRecords,
  atmosphereReadings,
  coatingAreas,
  costRates,
  entryRecords,
  findings,
  idempotencyKeys,
  inspections,
  notInspectedAreas,
  orgSettings,
  sedimentZones,
  tanks,
} from "@/db/schema";
import type { TWriter } from "@/db/seed/builders";
import { AppError } from "@/lib/errors";
import { writeAudit } from "./audit";

type TOrg = { orgId: string };
export type TTx = Parameters<Parameters<ReturnType<typeof db>["transaction"]>[0]>[0];

/** The open findings of a tank's latest countersigned inspection, to look at again. */
export async function listOpenFindingsOfLastCountersigned({ orgId, tankId }: TOrg & { tankId: string }) {
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

/** For the authorization module only: which vessel and company an inspection belongs to. */
export async function unsafeGetInspectionScope({ inspectionId }: { inspectionId: string }) {
  const [row] = await db()
    .select({ id: inspections.id, orgId: inspections.orgId, vesselId: inspections.vesselId })
    .from(inspections)
    .where(eq(inspections.id, inspectionId));
  return row;
}

export async function getInspectionTankId({ orgId, inspectionId }: TOrg & { inspectionId: string }) {
  const [row] = await db()
    .select({ tankId: inspections.tankId })
    .from(inspections)
    .where(and(eq(inspections.orgId, orgId), eq(inspections.id, inspectionId)));
  return row?.tankId;
}

export async function listVesselInspections({ orgId, vesselId }: TOrg & { vesselId: string }) {
  return db()
    .select({
      id: inspections.id, status: inspections.status, inspectedOn: inspections.inspectedOn, revision: inspections.revision,
      place: inspections.place, tankId: inspections.tankId, tankCode: tanks.code, updatedAt: inspections.updatedAt,
    })
    .from(inspections)
    .innerJoin(tanks, eq(tanks.id, inspections.tankId))
    .where(and(eq(inspections.orgId, orgId), eq(inspections.vesselId, vesselId)))
    .orderBy(desc(inspections.inspectedOn), desc(inspections.updatedAt))
    .limit(200);
}

export async function createInspection(v: {
  orgId: string; vesselId: string; tankId: string; actorUserId: string; id?: string;
  input: { inspectedOn: string; placeKind: (typeof inspections.$inferInsert)["placeKind"]; place: string; team: string[] };
  ruleSet: "msc581" | "a1050";
}) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .insert(inspections)
      .values({ ...(v.id ? { id: v.id } : {}), orgId: v.orgId, vesselId: v.vesselId, tankId: v.tankId, createdBy: v.actorUserId, ...v.input })
      .onConflictDoNothing({ target: inspections.id })
      .returning();
    if (!row) {
      // A retried start: the inspection exists already.
      const existing = await tx.query.inspections.findFirst({ where: and(eq(inspections.orgId, v.orgId), eq(inspections.id, v.id!)) });
      if (!existing || existing.tankId !== v.tankId) throw new AppError("conflict", "This inspection id is already in use.");
      return existing;
    }
    await tx.insert(entryRecords).values({ orgId: v.orgId, inspectionId: row.id, ruleSet: v.ruleSet, entryTeam: v.input.team });
    await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: "create", entity: "inspection", entityId: row.id, detail: v.input });
    return row;
  });
}

export async function getInspectionBundle({ orgId, inspectionId }: TOrg & { inspectionId: string }) {
  const inspection = await db().query.inspections.findFirst({ where: and(eq(inspections.orgId, orgId), eq(inspections.id, inspectionId)) });
  if (!inspection) return undefined;
  const scope = (t: { orgId: AnyPgColumn; inspectionId: AnyPgColumn }) => and(eq(t.orgId, orgId), eq(t.inspectionId, inspectionId));
  const [entry, findingRows, coatingRows, anodes, sediment, notInspected, settings] = await Promise.all([
    db().query.entryRecords.findFirst({ where: scope(entryRecords) }),
    db().select().from(findings).where(scope(findings)).orderBy(asc(findings.number)),
    db().select().from(coatingAreas).where(scope(coatingAreas)),
    db().query.anodeRecords.findFirst({ where: scope(anodeRecords) }),
    db().select().from(sedimentZones).where(scope(sedimentZones)).orderBy(asc(sedimentZones.createdAt)),
    db().select().from(notInspectedAreas).where(scope(notInspectedAreas)).orderBy(asc(notInspectedAreas.createdAt)),
    db().query.orgSettings.findFirst({ where: eq(orgSettings.orgId, orgId) }),
  ]);
  const readings = entry
    ? await db().select().from(atmosphereReadings).where(and(eq(atmosphereReadings.orgId, orgId), eq(atmosphereReadings.entryRecordId, entry.id))).orderBy(asc(atmosphereReadings.testedAt))
    : [];
  const [sedimentRate] = await db()
    .select()
    .from(costRates)
    .where(and(eq(costRates.orgId, orgId), eq(costRates.kind, "sediment_per_m3")))
    .orderBy(desc(costRates.validFrom))
    .limit(1);
  return { inspection, entry, readings, findings: findingRows, coating: coatingRows, anodes, sediment, notInspected, settings, sedimentRate };
}

/** Mean anode wastage of the tank's earlier inspections, oldest first, for the projection. */
export async function listAnodeHistory({ orgId, tankId, before }: TOrg & { tankId: string; before: string }) {
  return db()
    .select({ date: inspections.inspectedOn, meanWastagePct: anodeRecords.meanWastagePct })
    .from(anodeRecords)
    .innerJoin(inspections, eq(inspections.id, anodeRecords.inspectionId))
    .where(and(eq(inspections.orgId, orgId), eq(inspections.tankId, tankId), inArray(inspections.status, ["submitted", "countersigned"]), sql`${inspections.inspectedOn} < ${before}`))
    .orderBy(asc(inspections.inspectedOn));
}

/**
 * Claims the next version of an editable inspection inside a transaction:
 * 404 when it is not this company's, 409 when it is locked or someone saved it
 * since `version` was read.
 */
export async function claimVersion(tx: TTx, { orgId, inspectionId, version }: TOrg & { inspectionId: string; version: number }) {
  const [row] = await tx
    .update(inspections)
    .set({ version: sql`${inspections.version} + 1`, updatedAt: sql`now()` })
    .where(and(eq(inspections.orgId, orgId), eq(inspections.id, inspectionId), eq(inspections.version, version), inArray(inspections.status, ["draft", "returned"])))
    .returning({ version: inspections.version });
  if (row) return row.version;
  const current = await tx.query.inspections.findFirst({ where: and(eq(inspections.orgId, orgId), eq(inspections.id, inspectionId)) });
  if (!current) throw new AppError("not_found", "No such inspection.");
  if (current.status !== "draft" && current.status !== "returned") {
    throw new AppError("conflict", `The inspection is ${current.status} and can no longer be changed; a correction is a new revision.`, [{ path: "status", message: current.status }]);
  }
  throw new AppError("conflict", "Someone else saved this inspection since you opened it. Compare the two versions before saving again.", [
    { path: "version", message: String(current.version) },
  ]);
}

export async function getIdempotentResponse({ userId, key }: { userId: string; key: string }) {
  return db().query.idempotencyKeys.findFirst({ where: and(eq(idempotencyKeys.userId, userId), eq(idempotencyKeys.key, key)) });
}

export async function saveIdempotentResponse(w: TWriter, v: { userId: string; orgId: string; key: string; requestHash: string; status: number; body: unknown }) {
  await w.insert(idempotencyKeys).values({ ...v, body: v.body as object });
}

// ---------------------------------------------------------------- section writers (inside claimVersion's transaction)

type TIns = TOrg & { inspectionId: string };

export async function setHeader(tx: TTx, { orgId, inspectionId }: TIns, v: { inspectedOn: string; placeKind: (typeof inspections.$inferInsert)["placeKind"]; place: string; team: string[] }) {
  await tx.update(inspections).set(v).where(and(eq(inspections.orgId, orgId), eq(inspections.id, inspectionId)));
}

export async function setFlags(tx: TTx, { orgId, inspectionId }: TIns, v: Partial<{ noFindings: boolean; noSediment: boolean; allAreasInspected: boolean; remarks: unknown }>) {
  await tx.update(inspections).set(v).where(and(eq(inspections.orgId, orgId), eq(inspections.id, inspectionId)));
}

export async function setEntryRecord(tx: TTx, { orgId, inspectionId }: TIns, v: Omit<typeof entryRecords.$inferInsert, "orgId" | "inspectionId">) {
  await tx
    .insert(entryRecords)
    .values({ orgId, inspectionId, ...v })
    .onConflictDoUpdate({ target: entryRecords.inspectionId, set: { ...v, updatedAt: sql`now()` } });
}

export async function addReading(tx: TTx, { orgId, inspectionId }: TIns, v: Omit<typeof atmosphereReadings.$inferInsert, "orgId" | "entryRecordId">) {
  const entry = await tx.query.entryRecords.findFirst({ where: and(eq(entryRecords.orgId, orgId), eq(entryRecords.inspectionId, inspectionId)) });
  if (!entry) throw new AppError("unprocessable", "Record the entry record first.");
  await tx.insert(atmosphereReadings).values({ ...v, orgId, entryRecordId: entry.id }).onConflictDoNothing({ target: atmosphereReadings.id });
}

export async function upsertFinding(tx: TTx, { orgId, inspectionId }: TIns, v: Omit<typeof findings.$inferInsert, "orgId" | "inspectionId" | "number">) {
  const existing = await tx.query.findings.findFirst({ where: eq(findings.id, v.id) });
  if (existing && (existing.orgId !== orgId || existing.inspectionId !== inspectionId)) throw new AppError("not_found", "No such finding.");
  if (existing) {
    await tx.update(findings).set({ ...v, updatedAt: sql`now()` }).where(eq(findings.id, v.id));
    return existing.number;
  }
  const [{ next }] = (await tx
    .select({ next: sql<number>`coalesce(max(${findings.number}), 0) + 1` })
    .from(findings)
    .where(eq(findings.inspectionId, inspectionId))) as [{ next: number }];
  await tx.insert(findings).values({ ...v, orgId, inspectionId, number: next });
  return next;
}

export async function removeFinding(tx: TTx, { orgId, inspectionId }: TIns, findingId: string) {
  const [row] = await tx.delete(findings).where(and(eq(findings.orgId, orgId), eq(findings.inspectionId, inspectionId), eq(findings.id, findingId))).returning({ id: findings.id });
  if (!row) throw new AppError("not_found", "No such finding.");
}

export async function replaceCoating(tx: TTx, { orgId, inspectionId }: TIns, rows: Omit<typeof coatingAreas.$inferInsert, "orgId" | "inspectionId">[]) {
  await tx.delete(coatingAreas).where(and(eq(coatingAreas.orgId, orgId), eq(coatingAreas.inspectionId, inspectionId)));
  if (rows.length) await tx.insert(coatingAreas).values(rows.map((r) => ({ ...r, orgId, inspectionId })));
}

export async function setAnodes(tx: TTx, { orgId, inspectionId }: TIns, v: Omit<typeof anodeRecords.$inferInsert, "orgId" | "inspectionId">) {
  await tx
    .insert(anodeRecords)
    .values({ orgId, inspectionId, ...v })
    .onConflictDoUpdate({ target: anodeRecords.inspectionId, set: { ...v, updatedAt: sql`now()` } });
}

export async function replaceSediment(tx: TTx, { orgId, inspectionId }: TIns, rows: Omit<typeof sedimentZones.$inferInsert, "orgId" | "inspectionId">[]) {
  await tx.delete(sedimentZones).where(and(eq(sedimentZones.orgId, orgId), eq(sedimentZones.inspectionId, inspectionId)));
  if (rows.length) await tx.insert(sedimentZones).values(rows.map((r) => ({ ...r, orgId, inspectionId })));
}

export async function replaceNotInspected(tx: TTx, { orgId, inspectionId }: TIns, rows: Omit<typeof notInspectedAreas.$inferInsert, "orgId" | "inspectionId">[]) {
  await tx.delete(notInspectedAreas).where(and(eq(notInspectedAreas.orgId, orgId), eq(notInspectedAreas.inspectionId, inspectionId)));
  if (rows.length) await tx.insert(notInspectedAreas).values(rows.map((r) => ({ ...r, orgId, inspectionId })));
}
