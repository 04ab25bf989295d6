import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { inspections, specialFrames, tankMembers, tanks } from "@/db/schema";
import type { TWriter } from "@/db/seed/builders";
import type { TCatalogue, TCatalogueMember } from "@/lib/structure/catalogue";
import type { TMemberInput, TTankInput } from "@/lib/schemas/tank";
import { writeAudit } from "./audit";

type TScope = { orgId: string; vesselId: string };
type TActorScope = TScope & { actorUserId: string };

export async function listTanks({ orgId, vesselId }: TScope) {
  return db()
    .select()
    .from(tanks)
    .where(and(eq(tanks.orgId, orgId), eq(tanks.vesselId, vesselId)))
    .orderBy(asc(tanks.sortOrder), asc(tanks.frameFrom), asc(tanks.code));
}

export async function getTank({ orgId, vesselId, tankId }: TScope & { tankId: string }) {
  return db().query.tanks.findFirst({
    where: and(eq(tanks.orgId, orgId), eq(tanks.vesselId, vesselId), eq(tanks.id, tankId)),
  });
}

export async function getTankCatalogue({ orgId, tankId }: { orgId: string; tankId: string }) {
  const [members, special] = await Promise.all([
    db()
      .select()
      .from(tankMembers)
      .where(and(eq(tankMembers.orgId, orgId), eq(tankMembers.tankId, tankId)))
      .orderBy(asc(tankMembers.kind), asc(tankMembers.platingRegion), asc(tankMembers.numberFrom)),
    db()
      .select()
      .from(specialFrames)
      .where(and(eq(specialFrames.orgId, orgId), eq(specialFrames.tankId, tankId)))
      .orderBy(asc(specialFrames.frame)),
  ]);
  return { members, specialFrames: special };
}

export function toCatalogue(
  tank: { code: string; frameFrom: number; frameTo: number },
  rows: Awaited<ReturnType<typeof getTankCatalogue>>,
): TCatalogue {
  return {
    tank: { code: tank.code, frameFrom: tank.frameFrom, frameTo: tank.frameTo },
    members: rows.members.map((m) => ({
      kind: m.kind, platingRegion: m.platingRegion, numberFrom: m.numberFrom, numberTo: m.numberTo,
      numbering: m.numbering, frames: m.frames, hasCentreGirder: m.hasCentreGirder,
    })),
    specialFrames: rows.specialFrames.map((s) => ({ frame: s.frame, note: s.note })),
  };
}

function tankColumns(input: TTankInput) {
  return {
    code: input.code,
    name: input.name,
    side: input.side,
    kind: input.kind,
    frameFrom: input.frameFrom,
    frameTo: input.frameTo,
    bottomAreaM2: input.bottomAreaM2 ?? null,
    coatingSystem: input.coatingSystem,
    heatedBoundary: input.heatedBoundary ?? null,
    atWaterline: input.atWaterline,
    atCollisionBulkhead: input.atCollisionBulkhead,
    note: input.note ?? null,
  };
}

async function insertTankRow(w: TWriter, { orgId, vesselId, actorUserId }: TActorScope, input: TTankInput) {
  const [row] = await w
    .insert(tanks)
    .values({ orgId, vesselId, ...tankColumns(input), sortOrder: input.frameFrom })
    .returning();
  await writeAudit(w, { orgId, actorUserId, action: "create", entity: "tank", entityId: row!.id, detail: input });
  return row!;
}

export async function createTank(scope: TActorScope & { input: TTankInput }) {
  return db().transaction((tx) => insertTankRow(tx, scope, scope.input));
}

/** All rows or none: the CSV import. */
export async function createTanks(scope: TActorScope & { inputs: TTankInput[] }) {
  return db().transaction(async (tx) => {
    const rows = [];
    for (const input of scope.inputs) rows.push(await insertTankRow(tx, scope, input));
    return rows;
  });
}

export async function updateTank({ orgId, vesselId, actorUserId, tankId, input }: TActorScope & { tankId: string; input: TTankInput }) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .update(tanks)
      .set({ ...tankColumns(input), updatedAt: sql`now()` })
      .where(and(eq(tanks.orgId, orgId), eq(tanks.vesselId, vesselId), eq(tanks.id, tankId)))
      .returning();
    if (row) await writeAudit(tx, { orgId, actorUserId, action: "update", entity: "tank", entityId: tankId, detail: input });
    return row;
  });
}

export async function countTankInspections({ orgId, tankId }: { orgId: string; tankId: string }) {
  return db().$count(inspections, and(eq(inspections.orgId, orgId), eq(inspections.tankId, tankId)));
}

export async function deleteTank({ orgId, vesselId, actorUserId, tankId }: TActorScope & { tankId: string }) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .delete(tanks)
      .where(and(eq(tanks.orgId, orgId), eq(tanks.vesselId, vesselId), eq(tanks.id, tankId)))
      .returning();
    if (row) await writeAudit(tx, { orgId, actorUserId, action: "delete", entity: "tank", entityId: tankId, detail: { code: row.code } });
    return row;
  });
}

function memberColumns(m: TMemberInput | TCatalogueMember) {
  return {
    kind: m.kind,
    platingRegion: m.platingRegion ?? null,
    numberFrom: m.numberFrom ?? null,
    numberTo: m.numberTo ?? null,
    numbering: m.numbering ?? null,
    frames: m.frames ?? null,
    hasCentreGirder: m.hasCentreGirder ?? null,
  };
}

export async function addTankMember({ orgId, actorUserId, tankId, input }: { orgId: string; actorUserId: string; tankId: string; input: TMemberInput }) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .insert(tankMembers)
      .values({ orgId, tankId, ...memberColumns(input), label: input.label ?? null, note: input.note ?? null })
      .returning();
    await writeAudit(tx, { orgId, actorUserId, action: "create", entity: "tank_member", entityId: row!.id, detail: input });
    return row!;
  });
}

export async function deleteTankMember({ orgId, actorUserId, tankId, memberId }: { orgId: string; actorUserId: string; tankId: string; memberId: string }) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .delete(tankMembers)
      .where(and(eq(tankMembers.orgId, orgId), eq(tankMembers.tankId, tankId), eq(tankMembers.id, memberId)))
      .returning();
    if (row) await writeAudit(tx, { orgId, actorUserId, action: "delete", entity: "tank_member", entityId: memberId, detail: row });
    return row;
  });
}

export async function addSpecialFrame({ orgId, actorUserId, tankId, frame, note }: { orgId: string; actorUserId: string; tankId: string; frame: number; note: string }) {
  return db().transaction(async (tx) => {
    const [row] = await tx.insert(specialFrames).values({ orgId, tankId, frame, note }).returning();
    await writeAudit(tx, { orgId, actorUserId, action: "create", entity: "special_frame", entityId: row!.id, detail: { frame, note } });
    return row!;
  });
}

export async function deleteSpecialFrame({ orgId, actorUserId, tankId, specialFrameId }: { orgId: string; actorUserId: string; tankId: string; specialFrameId: string }) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .delete(specialFrames)
      .where(and(eq(specialFrames.orgId, orgId), eq(specialFrames.tankId, tankId), eq(specialFrames.id, specialFrameId)))
      .returning();
    if (row) await writeAudit(tx, { orgId, actorUserId, action: "delete", entity: "special_frame", entityId: specialFrameId, detail: row });
    return row;
  });
}

/** Creates the mirrored tank with copies of the members and special frames, in one transaction. */
export async function createMirroredTank(
  scope: TActorScope & { input: TTankInput; sourceTankId: string; catalogue: TCatalogue; members: { label: string | null; note: string | null }[] },
) {
  return db().transaction(async (tx) => {
    const row = await insertTankRow(tx, scope, scope.input);
    if (scope.catalogue.members.length) {
      await tx.insert(tankMembers).values(
        scope.catalogue.members.map((m, i) => ({
          orgId: scope.orgId, tankId: row.id, ...memberColumns(m), label: scope.members[i]?.label ?? null, note: scope.members[i]?.note ?? null,
        })),
      );
    }
    if (scope.catalogue.specialFrames.length) {
      await tx.insert(specialFrames).values(scope.catalogue.specialFrames.map((s) => ({ orgId: scope.orgId, tankId: row.id, ...s })));
    }
    await writeAudit(tx, { orgId: scope.orgId, actorUserId: scope.actorUserId, action: "mirror", entity: "tank", entityId: row.id, detail: { from: scope.sourceTankId } });
    return row;
  });
}
