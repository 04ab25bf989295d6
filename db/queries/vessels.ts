import "server-only";
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db";
import { tanks, vessels } from "@/db/schema";
import type { TVesselInput } from "@/lib/schemas/vessel";
import { writeAudit } from "./audit";

/** For the authorization module only: it decides from the vessel's company whether the actor may see it. */
export async function unsafeGetVesselById({ vesselId }: { vesselId: string }) {
  return db().query.vessels.findFirst({ where: eq(vessels.id, vesselId) });
}

export async function getVessel({ orgId, vesselId }: { orgId: string; vesselId: string }) {
  return db().query.vessels.findFirst({ where: and(eq(vessels.orgId, orgId), eq(vessels.id, vesselId)) });
}

/** Vessels of a company; `vesselIds` narrows to the ones a ship's officer or master holds. */
export async function listVessels({ orgId, vesselIds }: { orgId: string; vesselIds?: readonly string[] }) {
  if (vesselIds && vesselIds.length === 0) return [];
  const tankCount = db()
    .select({ vesselId: tanks.vesselId, count: sql<number>`count(*)::int`.as("count") })
    .from(tanks)
    .where(eq(tanks.orgId, orgId))
    .groupBy(tanks.vesselId)
    .as("tank_count");
  return db()
    .select({
      id: vessels.id,
      orgId: vessels.orgId,
      name: vessels.name,
      imoNumber: vessels.imoNumber,
      vesselType: vessels.vesselType,
      flag: vessels.flag,
      classSociety: vessels.classSociety,
      tankCount: sql<number>`coalesce(${tankCount.count}, 0)`,
    })
    .from(vessels)
    .leftJoin(tankCount, eq(tankCount.vesselId, vessels.id))
    .where(and(eq(vessels.orgId, orgId), vesselIds ? inArray(vessels.id, [...vesselIds]) : undefined))
    .orderBy(asc(vessels.name));
}

function vesselColumns(input: TVesselInput) {
  return {
    name: input.name,
    imoNumber: input.imoNumber,
    vesselType: input.vesselType,
    flag: input.flag ?? null,
    classSociety: input.classSociety ?? null,
    yearBuilt: input.yearBuilt ?? null,
    frameFirst: input.frameFirst,
    frameLast: input.frameLast,
    frameSpacingMm: input.frameSpacingMm ?? null,
    midshipFromFrame: input.midshipFromFrame ?? null,
    midshipToFrame: input.midshipToFrame ?? null,
    engineRoomFwdBulkheadFrame: input.engineRoomFwdBulkheadFrame ?? null,
    collisionBulkheadFrame: input.collisionBulkheadFrame ?? null,
    utcOffsetMinutes: input.utcOffsetMinutes ?? null,
  };
}

export async function createVessel({ orgId, actorUserId, input }: { orgId: string; actorUserId: string; input: TVesselInput }) {
  return db().transaction(async (tx) => {
    const [row] = await tx.insert(vessels).values({ orgId, ...vesselColumns(input) }).returning();
    await writeAudit(tx, { orgId, actorUserId, action: "create", entity: "vessel", entityId: row!.id, detail: input });
    return row!;
  });
}

export async function updateVessel({
  orgId,
  vesselId,
  actorUserId,
  input,
}: {
  orgId: string;
  vesselId: string;
  actorUserId: string;
  input: TVesselInput;
}) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .update(vessels)
      .set({ ...vesselColumns(input), updatedAt: sql`now()` })
      .where(and(eq(vessels.orgId, orgId), eq(vessels.id, vesselId)))
      .returning();
    if (row) await writeAudit(tx, { orgId, actorUserId, action: "update", entity: "vessel", entityId: vesselId, detail: input });
    return row;
  });
}
