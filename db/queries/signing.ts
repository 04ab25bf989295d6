import "server-only";
// Signing, returning, countersigning and revising an inspection; the signed PDF
// it produces; the e-mails that carry it. Every function is scoped by company.
import { randomUUID } from "node:crypto";
import { and, asc, desc, eq, inArray, sql } from "drizzle-orm";
import type { AnyPgColumn } from "drizzle-orm/pg-core";
import { db } from "@/db";
import {
  anodeRecords,
  atmosphereReadings,
  coatingAreas,
  comments,
  emailDeliveries,
  entryRecords,
  findings,
  inspections,
  notInspectedAreas,
  photos,
  reportFiles,
  sedimentZones,
  signatures,
  tanks,
  users,
  vessels,
} from "@/db/schema";
import { AppError } from "@/lib/errors";
import type { TInspectionStatus } from "@/lib/vocabulary";
import { writeAudit } from "./audit";
import type { TTx } from "./inspections";

type TOrg = { orgId: string };
type TIns = TOrg & { inspectionId: string };

/** The password hash of the signed-in user, to confirm a signature. */
export async function getOwnPasswordHash({ userId }: { userId: string }) {
  const [row] = await db().select({ passwordHash: users.passwordHash }).from(users).where(eq(users.id, userId));
  return row?.passwordHash ?? null;
}

/**
 * Moves an inspection from one of `from` to `to` if nobody saved it since
 * `version` was read; 409 with the reason otherwise. Returns the new version.
 */
export async function transition(
  tx: TTx,
  { orgId, inspectionId, version, from, to, set = {} }: TIns & { version: number; from: readonly TInspectionStatus[]; to: TInspectionStatus; set?: Partial<typeof inspections.$inferInsert> },
) {
  const [row] = await tx
    .update(inspections)
    .set({ ...set, status: to, version: sql`${inspections.version} + 1`, updatedAt: sql`now()` })
    .where(and(eq(inspections.orgId, orgId), eq(inspections.id, inspectionId), eq(inspections.version, version), inArray(inspections.status, [...from])))
    .returning({ version: inspections.version });
  if (row) return row.version;
  const current = await tx.query.inspections.findFirst({ where: and(eq(inspections.orgId, orgId), eq(inspections.id, inspectionId)) });
  if (!current) throw new AppError("not_found", "No such inspection.");
  if (!from.includes(current.status)) {
    throw new AppError("conflict", `The inspection is ${current.status}: this step needs it to be ${from.join(" or ")}.`, [{ path: "status", message: current.status }]);
  }
  throw new AppError("conflict", "Someone else saved this inspection since you opened it. Reload it and read it again before signing.", [
    { path: "version", message: String(current.version) },
  ]);
}

export async function insertSignature(tx: TTx, v: Omit<typeof signatures.$inferInsert, "signedAt">) {
  const [row] = await tx.insert(signatures).values(v).returning();
  return row!;
}

export async function removeSignature(tx: TTx, { orgId, inspectionId, kind }: TIns & { kind: "officer" | "master" }) {
  await tx.delete(signatures).where(and(eq(signatures.orgId, orgId), eq(signatures.inspectionId, inspectionId), eq(signatures.kind, kind)));
}

export async function listSignatures({ orgId, inspectionId }: TIns) {
  return db().select().from(signatures).where(and(eq(signatures.orgId, orgId), eq(signatures.inspectionId, inspectionId))).orderBy(asc(signatures.signedAt));
}

export async function insertComment(tx: TTx, v: TIns & { authorId: string; kind: string; body: string }) {
  await tx.insert(comments).values(v);
}

/** The master's return comments on this inspection, newest first, with their author. */
export async function listReturnComments({ orgId, inspectionId }: TIns) {
  return db()
    .select({ id: comments.id, body: comments.body, createdAt: comments.createdAt, authorName: users.name, authorRank: users.rank })
    .from(comments)
    .innerJoin(users, eq(users.id, comments.authorId))
    .where(and(eq(comments.orgId, orgId), eq(comments.inspectionId, inspectionId), eq(comments.kind, "return")))
    .orderBy(desc(comments.createdAt));
}

/** Every revision of the report this inspection belongs to, oldest first. */
export async function listRevisions({ orgId, seriesId }: TOrg & { seriesId: string }) {
  return db()
    .select({ id: inspections.id, revision: inspections.revision, status: inspections.status, countersignedAt: inspections.countersignedAt, sha256: reportFiles.sha256 })
    .from(inspections)
    .leftJoin(reportFiles, eq(reportFiles.inspectionId, inspections.id))
    .where(and(eq(inspections.orgId, orgId), eq(inspections.seriesId, seriesId)))
    .orderBy(asc(inspections.revision));
}

/**
 * A correction: copies a countersigned inspection with everything recorded in
 * it into a new draft revision (new ids, the same photo files). Refused while a
 * newer revision exists.
 */
export async function copyAsRevision(tx: TTx, { orgId, inspectionId, actorUserId }: TIns & { actorUserId: string }) {
  const [source] = await tx.select().from(inspections).where(and(eq(inspections.orgId, orgId), eq(inspections.id, inspectionId))).for("update");
  if (!source) throw new AppError("not_found", "No such inspection.");
  if (source.status !== "countersigned") throw new AppError("conflict", `Only a countersigned report can be corrected by a new revision; this one is ${source.status}.`, [{ path: "status", message: source.status }]);
  const [newer] = await tx.select({ id: inspections.id, revision: inspections.revision }).from(inspections)
    .where(and(eq(inspections.orgId, orgId), eq(inspections.seriesId, source.seriesId), sql`${inspections.revision} > ${source.revision}`)).limit(1);
  if (newer) throw new AppError("conflict", `Revision ${newer.revision} of this report already exists: correct that one.`, [{ path: "revision", message: newer.id }]);

  const id = randomUUID();
  const { id: _id, createdAt: _c, updatedAt: _u, submittedAt: _s, countersignedAt: _cs, lockedAt: _l, ...fields } = source;
  await tx.insert(inspections).values({ ...fields, id, revision: source.revision + 1, previousRevisionId: source.id, status: "draft", version: 1, createdBy: actorUserId });
  const scope = (t: { orgId: AnyPgColumn; inspectionId: AnyPgColumn }) => and(eq(t.orgId, orgId), eq(t.inspectionId, inspectionId));
  const strip = <T extends { id: string; createdAt?: Date; updatedAt?: Date }>(r: T) => {
    const { id: _i, createdAt: _ca, updatedAt: _ua, ...rest } = r;
    return rest;
  };

  const entry = await tx.query.entryRecords.findFirst({ where: scope(entryRecords) });
  if (entry) {
    const entryId = randomUUID();
    await tx.insert(entryRecords).values({ ...strip(entry), id: entryId, inspectionId: id });
    const readings = await tx.select().from(atmosphereReadings).where(and(eq(atmosphereReadings.orgId, orgId), eq(atmosphereReadings.entryRecordId, entry.id)));
    if (readings.length) await tx.insert(atmosphereReadings).values(readings.map((r) => ({ ...strip(r), id: randomUUID(), entryRecordId: entryId })));
  }
  const findingIds = new Map<string, string>();
  const findingRows = await tx.select().from(findings).where(scope(findings));
  for (const f of findingRows) findingIds.set(f.id, randomUUID());
  if (findingRows.length) await tx.insert(findings).values(findingRows.map((f) => ({ ...strip(f), id: findingIds.get(f.id)!, inspectionId: id })));
  const coating = await tx.select().from(coatingAreas).where(scope(coatingAreas));
  if (coating.length) await tx.insert(coatingAreas).values(coating.map((c) => ({ ...strip(c), inspectionId: id })));
  const anodes = await tx.query.anodeRecords.findFirst({ where: scope(anodeRecords) });
  if (anodes) await tx.insert(anodeRecords).values({ ...strip(anodes), inspectionId: id });
  const zones = await tx.select().from(sedimentZones).where(scope(sedimentZones));
  if (zones.length) await tx.insert(sedimentZones).values(zones.map((z) => ({ ...strip(z), id: randomUUID(), inspectionId: id })));
  const hidden = await tx.select().from(notInspectedAreas).where(scope(notInspectedAreas));
  if (hidden.length) await tx.insert(notInspectedAreas).values(hidden.map((a) => ({ ...strip(a), id: randomUUID(), inspectionId: id })));
  // Photos keep their files (a file is removed only when no row names it any more); only accepted ones are carried over.
  const photoRows = (await tx.select().from(photos).where(scope(photos))).filter((p) => p.status === "ready");
  const photoIds = new Map(photoRows.map((p) => [p.id, randomUUID()]));
  if (photoRows.length) {
    await tx.insert(photos).values(photoRows.map((p) => ({
      ...strip(p), id: photoIds.get(p.id)!, inspectionId: id,
      findingId: p.findingId ? findingIds.get(p.findingId) ?? null : null,
      overviewPhotoId: p.overviewPhotoId ? photoIds.get(p.overviewPhotoId) ?? null : null,
    })));
  }
  await writeAudit(tx, { orgId, actorUserId, action: "inspection.revise", entity: "inspection", entityId: id, detail: { from: source.id, revision: source.revision + 1 } });
  return { id, revision: source.revision + 1 };
}

// ---------------------------------------------------------------- the signed PDF

export async function getReportFile({ orgId, inspectionId }: TIns) {
  const [row] = await db().select().from(reportFiles).where(and(eq(reportFiles.orgId, orgId), eq(reportFiles.inspectionId, inspectionId)));
  return row ?? null;
}

/** Records the stored PDF once; a retried job finds the row already there. */
export async function insertReportFile(v: TIns & { objectKey: string; sha256: string; sizeBytes: number }) {
  return db().transaction(async (tx) => {
    const [row] = await tx.insert(reportFiles).values(v).onConflictDoNothing({ target: reportFiles.inspectionId }).returning();
    const file = row ?? (await tx.select().from(reportFiles).where(eq(reportFiles.inspectionId, v.inspectionId)))[0]!;
    // The revision it corrects is now superseded (still readable, with its own PDF).
    const [self] = await tx.select({ previous: inspections.previousRevisionId }).from(inspections).where(and(eq(inspections.orgId, v.orgId), eq(inspections.id, v.inspectionId)));
    if (self?.previous) {
      await tx.update(inspections).set({ status: "superseded", updatedAt: sql`now()` })
        .where(and(eq(inspections.orgId, v.orgId), eq(inspections.id, self.previous), eq(inspections.status, "countersigned")));
    }
    return file;
  });
}

/** What a fingerprint identifies, across companies: only the facts /verify may show. */
export async function unsafeFindSignedReportBySha({ sha256 }: { sha256: string }) {
  const [row] = await db()
    .select({
      vesselName: vessels.name, imoNumber: vessels.imoNumber, tankCode: tanks.code, tankName: tanks.name,
      inspectedOn: inspections.inspectedOn, revision: inspections.revision, status: inspections.status,
      countersignedAt: inspections.countersignedAt, signedAt: reportFiles.createdAt,
      newerRevision: sql<number | null>`(select max(i2.revision) from ${inspections} i2 where i2.series_id = ${inspections.seriesId} and i2.revision > ${inspections.revision})`,
    })
    .from(reportFiles)
    .innerJoin(inspections, eq(inspections.id, reportFiles.inspectionId))
    .innerJoin(vessels, eq(vessels.id, inspections.vesselId))
    .innerJoin(tanks, eq(tanks.id, inspections.tankId))
    .where(eq(reportFiles.sha256, sha256));
  return row ?? null;
}

// ---------------------------------------------------------------- deliveries

export async function insertDeliveries(v: TOrg & { reportFileId: string; recipients: string[]; queuedBy: string | null; purpose: string }) {
  if (!v.recipients.length) return [];
  return db().insert(emailDeliveries).values(v.recipients.map((recipient) => ({ orgId: v.orgId, reportFileId: v.reportFileId, recipient, purpose: v.purpose, queuedBy: v.queuedBy }))).returning();
}

export async function countDeliveries({ orgId, reportFileId }: TOrg & { reportFileId: string }) {
  const [row] = await db().select({ n: sql<number>`count(*)::int` }).from(emailDeliveries).where(and(eq(emailDeliveries.orgId, orgId), eq(emailDeliveries.reportFileId, reportFileId)));
  return row?.n ?? 0;
}

export async function listDeliveries({ orgId, reportFileId }: TOrg & { reportFileId: string }) {
  return db().select().from(emailDeliveries).where(and(eq(emailDeliveries.orgId, orgId), eq(emailDeliveries.reportFileId, reportFileId))).orderBy(asc(emailDeliveries.createdAt), asc(emailDeliveries.recipient));
}

/** A delivery with the report it carries, for the sending job and for a re-send. */
export async function getDeliveryWithReport({ orgId, deliveryId }: TOrg & { deliveryId: string }) {
  const [row] = await db()
    .select({
      delivery: emailDeliveries, file: reportFiles,
      inspection: { id: inspections.id, vesselId: inspections.vesselId, revision: inspections.revision, inspectedOn: inspections.inspectedOn, place: inspections.place },
      vessel: { name: vessels.name, imoNumber: vessels.imoNumber }, tank: { code: tanks.code, name: tanks.name },
    })
    .from(emailDeliveries)
    .innerJoin(reportFiles, eq(reportFiles.id, emailDeliveries.reportFileId))
    .innerJoin(inspections, eq(inspections.id, reportFiles.inspectionId))
    .innerJoin(vessels, eq(vessels.id, inspections.vesselId))
    .innerJoin(tanks, eq(tanks.id, inspections.tankId))
    .where(and(eq(emailDeliveries.orgId, orgId), eq(emailDeliveries.id, deliveryId)));
  return row ?? null;
}

export async function unsafeGetDeliveryScope({ deliveryId }: { deliveryId: string }) {
  const [row] = await db()
    .select({ orgId: emailDeliveries.orgId, vesselId: inspections.vesselId, inspectionId: inspections.id })
    .from(emailDeliveries)
    .innerJoin(reportFiles, eq(reportFiles.id, emailDeliveries.reportFileId))
    .innerJoin(inspections, eq(inspections.id, reportFiles.inspectionId))
    .where(eq(emailDeliveries.id, deliveryId));
  return row ?? null;
}

export async function markDeliverySent({ orgId, deliveryId, messageId, method, linkExpiresAt }: TOrg & { deliveryId: string; messageId: string; method: "attachment" | "link"; linkExpiresAt: Date | null }) {
  await db().update(emailDeliveries)
    .set({ status: "sent", messageId, method, linkExpiresAt, lastError: null, sentAt: sql`now()`, attempts: sql`${emailDeliveries.attempts} + 1`, updatedAt: sql`now()` })
    .where(and(eq(emailDeliveries.orgId, orgId), eq(emailDeliveries.id, deliveryId)));
}

export async function markDeliveryFailed({ orgId, deliveryId, error }: TOrg & { deliveryId: string; error: string }) {
  await db().update(emailDeliveries)
    .set({ status: "failed", lastError: error.slice(0, 500), attempts: sql`${emailDeliveries.attempts} + 1`, updatedAt: sql`now()` })
    .where(and(eq(emailDeliveries.orgId, orgId), eq(emailDeliveries.id, deliveryId)));
}

/** The few facts of an inspection that jobs, file names and notices need (not the whole view). */
export async function getInspectionSummary({ orgId, inspectionId }: TIns) {
  const [row] = await db()
    .select({
      id: inspections.id, vesselId: inspections.vesselId, seriesId: inspections.seriesId, revision: inspections.revision, status: inspections.status,
      inspectedOn: inspections.inspectedOn, vesselName: vessels.name, tankCode: tanks.code,
    })
    .from(inspections)
    .innerJoin(vessels, eq(vessels.id, inspections.vesselId))
    .innerJoin(tanks, eq(tanks.id, inspections.tankId))
    .where(and(eq(inspections.orgId, orgId), eq(inspections.id, inspectionId)));
  return row ?? null;
}

/**
 * Countersigned revisions whose signed PDF is missing (a lost render job, or a
 * report countersigned before the workers ran), across companies, for the sweep.
 */
export async function unsafeListCountersignedWithoutPdf(limit = 100) {
  return db()
    .select({ orgId: inspections.orgId, inspectionId: inspections.id })
    .from(inspections)
    .leftJoin(reportFiles, eq(reportFiles.inspectionId, inspections.id))
    .where(and(inArray(inspections.status, ["countersigned", "superseded"]), sql`${reportFiles.id} is null`))
    .limit(limit);
}
