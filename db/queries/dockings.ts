import "server-only";
import { and, asc, desc, eq, inArray, ne, sql } from "drizzle-orm";
import { db } from "@/db";
import { anodeRecords, dockingItems, dockings, findings, sedimentZones, tankLatestInspections, tanks, users, vessels } from "@/db/schema";
import type { TWriter } from "@/db/seed/builders";
import { dockingIsFinal, type TWorkItem, type TWorkSource } from "@/lib/office/work-list";
import type { TDockingInput, TDockingOtherItemInput } from "@/lib/schemas/docking";
import type { TDockingStatus } from "@/lib/vocabulary";
import { writeAudit } from "./audit";

type TOrgScope = { orgId: string };
type TVesselScope = TOrgScope & { vesselId: string };
type TDockingScope = TOrgScope & { dockingId: string };

const dockingColumns = {
  id: dockings.id,
  orgId: dockings.orgId,
  vesselId: dockings.vesselId,
  yard: dockings.yard,
  place: dockings.place,
  plannedOn: dockings.plannedOn,
  currency: dockings.currency,
  steelRatePerKg: dockings.steelRatePerKg,
  coatingRatePerM2: dockings.coatingRatePerM2,
  anodeRatePerPiece: dockings.anodeRatePerPiece,
  sedimentRatePerM3: dockings.sedimentRatePerM3,
  status: dockings.status,
  createdAt: dockings.createdAt,
  updatedAt: dockings.updatedAt,
};

const itemColumns = {
  id: dockingItems.id,
  tankId: dockingItems.tankId,
  tankCode: tanks.code,
  findingId: dockingItems.findingId,
  kind: dockingItems.kind,
  description: dockingItems.description,
  quantity: dockingItems.quantity,
  unit: dockingItems.unit,
  adjustedQuantity: dockingItems.adjustedQuantity,
  included: dockingItems.included,
  adjustmentReason: dockingItems.adjustmentReason,
  doneAt: dockingItems.doneAt,
  /** Hand-added ("other") items only: their own rate, why and by whom they were added. */
  unitRate: dockingItems.unitRate,
  addedReason: dockingItems.addedReason,
  addedByName: users.name,
};
export type TDockingItemRow = Awaited<ReturnType<typeof listDockingItems>>[number];
/** The list's order: tank code (items of no tank last), then kind (steel, coating, anodes, sediment, other), then description. */
const itemOrder = [asc(tanks.code), asc(dockingItems.kind), asc(dockingItems.description), asc(dockingItems.id)];

/** The key that identifies an item across rebuilds: finding and kind, or tank and kind (the key of lib/office/work-list.ts). */
export const itemKey = (i: { findingId: string | null; tankId: string | null; kind: string }) => `${i.findingId ?? i.tankId ?? "none"}:${i.kind}`;

/** For the authorization module only: the company and vessel of a docking, unscoped. */
export async function unsafeGetDockingScope({ dockingId }: { dockingId: string }) {
  const [row] = await db().select({ orgId: dockings.orgId, vesselId: dockings.vesselId }).from(dockings).where(eq(dockings.id, dockingId));
  return row ?? null;
}

export async function listDockings(scope: TVesselScope) {
  return db()
    .select(dockingColumns)
    .from(dockings)
    .where(and(eq(dockings.orgId, scope.orgId), eq(dockings.vesselId, scope.vesselId)))
    .orderBy(desc(dockings.plannedOn), desc(dockings.createdAt));
}

export async function getDocking(scope: TDockingScope) {
  const [row] = await db().select(dockingColumns).from(dockings).where(and(eq(dockings.orgId, scope.orgId), eq(dockings.id, scope.dockingId)));
  return row ?? null;
}

export async function listDockingItems(scope: TDockingScope) {
  return db()
    .select(itemColumns)
    .from(dockingItems)
    .leftJoin(tanks, and(eq(tanks.orgId, dockingItems.orgId), eq(tanks.id, dockingItems.tankId)))
    .leftJoin(users, eq(users.id, dockingItems.addedBy))
    .where(and(eq(dockingItems.orgId, scope.orgId), eq(dockingItems.dockingId, scope.dockingId)))
    .orderBy(...itemOrder);
}

/** One page of a docking's items, optionally one tank's, in the list's order; and how many there are in all. */
export async function listDockingItemsPage(scope: TDockingScope & { tankId?: string; limit: number; offset: number }) {
  const where = and(eq(dockingItems.orgId, scope.orgId), eq(dockingItems.dockingId, scope.dockingId), scope.tankId ? eq(dockingItems.tankId, scope.tankId) : undefined);
  const [rows, matching] = await Promise.all([
    db()
      .select(itemColumns)
      .from(dockingItems)
      .leftJoin(tanks, and(eq(tanks.orgId, dockingItems.orgId), eq(tanks.id, dockingItems.tankId)))
      .leftJoin(users, eq(users.id, dockingItems.addedBy))
      .where(where)
      .orderBy(...itemOrder)
      .limit(scope.limit)
      .offset(scope.offset),
    db().$count(dockingItems, where),
  ]);
  return { rows, matching };
}

/**
 * Per docking and kind: the quantity priced (the adjusted one where there is
 * one) summed over included items, the cost of hand-added work (quantity
 * priced × its own rate), and the item counts (included, excluded, adjusted,
 * included and done). One docking, or every docking of a vessel at once.
 */
export async function sumDockingItems(scope: TOrgScope & ({ dockingId: string } | { vesselId: string })) {
  const which = "dockingId" in scope ? sql`d.id = ${scope.dockingId}::uuid` : sql`d.vessel_id = ${scope.vesselId}::uuid`;
  const res = await db().execute<{ docking_id: string; kind: string; quantity: string | null; cost: string | null; included: number; excluded: number; adjusted: number; done: number }>(sql`
    select i.docking_id,
           i.kind,
           sum(coalesce(i.adjusted_quantity, i.quantity)) filter (where i.included) as quantity,
           sum(coalesce(i.adjusted_quantity, i.quantity) * i.unit_rate) filter (where i.included) as cost,
           count(*) filter (where i.included)::int as included,
           count(*) filter (where not i.included)::int as excluded,
           count(*) filter (where i.adjusted_quantity is not null)::int as adjusted,
           count(*) filter (where i.included and i.done_at is not null)::int as done
    from docking_items i
    join dockings d on d.org_id = i.org_id and d.id = i.docking_id
    where i.org_id = ${scope.orgId}::uuid and ${which}
    group by i.docking_id, i.kind`);
  return res.rows.map((r) => ({
    dockingId: r.docking_id,
    kind: r.kind,
    quantity: r.quantity === null ? 0 : Number(r.quantity),
    cost: r.cost === null ? 0 : Number(r.cost),
    included: Number(r.included),
    excluded: Number(r.excluded),
    adjusted: Number(r.adjusted),
    done: Number(r.done),
  }));
}

/** Each tank's latest countersigned inspection of the docking's vessel (tank_latest_inspections), by tank code. */
export async function listLatestInspectionsOfDocking(scope: TDockingScope) {
  return db()
    .select({ tankId: tankLatestInspections.tankId, tankCode: tanks.code, inspectionId: tankLatestInspections.inspectionId, inspectedOn: tankLatestInspections.inspectedOn })
    .from(tankLatestInspections)
    .innerJoin(dockings, and(eq(dockings.orgId, tankLatestInspections.orgId), eq(dockings.vesselId, tankLatestInspections.vesselId)))
    .innerJoin(tanks, and(eq(tanks.orgId, tankLatestInspections.orgId), eq(tanks.id, tankLatestInspections.tankId)))
    .where(and(eq(tankLatestInspections.orgId, scope.orgId), eq(dockings.id, scope.dockingId)))
    .orderBy(asc(tanks.code));
}

/**
 * The open findings of the given inspections that carry neither a steel nor a
 * coating quantity, with what describes them: the candidates that
 * lib/office/work-list.ts gatherWorkItems reports as unpriced.
 */
export async function listOpenFindingsWithoutQuantities({ orgId, inspectionIds }: TOrgScope & { inspectionIds: readonly string[] }) {
  if (!inspectionIds.length) return [];
  return db()
    .select({
      inspectionId: findings.inspectionId,
      id: findings.id,
      number: findings.number,
      status: findings.status,
      type: findings.type,
      frameFrom: findings.frameFrom,
      frameTo: findings.frameTo,
      memberKind: findings.memberKind,
      memberNumber: findings.memberNumber,
      platingRegion: findings.platingRegion,
      repairKind: findings.repairKind,
      steelWeightKg: findings.steelWeightKg,
      coatingRepairM2: findings.coatingRepairM2,
    })
    .from(findings)
    .where(
      and(
        eq(findings.orgId, orgId),
        inArray(findings.inspectionId, [...inspectionIds]),
        eq(findings.status, "open"),
        sql`coalesce(${findings.steelWeightKg}, 0) <= 0 and coalesce(${findings.coatingRepairM2}, 0) <= 0`,
      ),
    );
}

/** Each tank's latest countersigned inspection of the vessel, with what the work list needs of it. */
export async function listWorkSources(scope: TVesselScope, w: TWriter = db()): Promise<TWorkSource[]> {
  const latest = await w
    .select({ inspectionId: tankLatestInspections.inspectionId, tankId: tankLatestInspections.tankId, tankCode: tanks.code, inspectedOn: tankLatestInspections.inspectedOn })
    .from(tankLatestInspections)
    .innerJoin(tanks, and(eq(tanks.orgId, tankLatestInspections.orgId), eq(tanks.id, tankLatestInspections.tankId)))
    .where(and(eq(tankLatestInspections.orgId, scope.orgId), eq(tankLatestInspections.vesselId, scope.vesselId)));
  if (!latest.length) return [];
  const ids = latest.map((l) => l.inspectionId);
  const [fs, anodes, zones] = await Promise.all([
    w.select().from(findings).where(and(eq(findings.orgId, scope.orgId), inArray(findings.inspectionId, ids))),
    w.select().from(anodeRecords).where(and(eq(anodeRecords.orgId, scope.orgId), inArray(anodeRecords.inspectionId, ids))),
    w.select({ inspectionId: sedimentZones.inspectionId, label: sedimentZones.label, depthMm: sedimentZones.depthMm, areaM2: sedimentZones.areaM2 }).from(sedimentZones).where(and(eq(sedimentZones.orgId, scope.orgId), inArray(sedimentZones.inspectionId, ids))),
  ]);
  return latest
    .sort((a, b) => a.tankCode.localeCompare(b.tankCode))
    .map((l) => ({
      tankId: l.tankId,
      tankCode: l.tankCode,
      inspectionId: l.inspectionId,
      inspectedOn: l.inspectedOn,
      findings: fs.filter((f) => f.inspectionId === l.inspectionId),
      anodes: anodes.find((a) => a.inspectionId === l.inspectionId) ?? null,
      sedimentZones: zones.filter((z) => z.inspectionId === l.inspectionId),
    }));
}

/**
 * Brings the docking's gathered items in line with the gathered work: new
 * items are added, gathered quantities and descriptions refreshed, items no
 * longer asked for removed. Decisions (included, adjusted quantity, reason)
 * stay with their item. Items added by hand ("other") are not gathered and are
 * left as they are. Runs inside the caller's transaction; returns what changed.
 */
async function syncItems(w: TWriter, v: TDockingScope, work: readonly TWorkItem[]) {
  const existing = await w
    .select()
    .from(dockingItems)
    .where(and(eq(dockingItems.orgId, v.orgId), eq(dockingItems.dockingId, v.dockingId), ne(dockingItems.kind, "other")));
  const byKey = new Map(existing.map((e) => [itemKey(e), e]));
  const wanted = new Set(work.map((i) => `${i.findingId ?? i.tankId}:${i.kind}`));
  let added = 0;
  let updated = 0;
  for (const item of work) {
    const found = byKey.get(`${item.findingId ?? item.tankId}:${item.kind}`);
    if (!found) {
      await w.insert(dockingItems).values({ orgId: v.orgId, dockingId: v.dockingId, tankId: item.tankId, findingId: item.findingId, kind: item.kind, description: item.description, quantity: item.quantity, unit: item.unit });
      added += 1;
    } else if (found.quantity !== item.quantity || found.description !== item.description || found.unit !== item.unit) {
      await w.update(dockingItems).set({ quantity: item.quantity, description: item.description, unit: item.unit }).where(and(eq(dockingItems.orgId, v.orgId), eq(dockingItems.id, found.id)));
      updated += 1;
    }
  }
  const gone = existing.filter((e) => !wanted.has(itemKey(e)));
  if (gone.length) await w.delete(dockingItems).where(and(eq(dockingItems.orgId, v.orgId), inArray(dockingItems.id, gone.map((g) => g.id))));
  return { added, updated, removed: gone.length };
}

/** Locks the docking row for a write and returns it (null: no such docking in this company). */
async function lockDocking(w: TWriter, v: TDockingScope) {
  const [row] = await w.select().from(dockings).where(and(eq(dockings.orgId, v.orgId), eq(dockings.id, v.dockingId))).for("update");
  return row ?? null;
}

/** Creates the docking and its items from the vessel's countersigned reports, in one transaction. */
export async function createDocking(v: TVesselScope & { actorUserId: string; input: TDockingInput; gather: (sources: TWorkSource[]) => TWorkItem[] }) {
  return db().transaction(async (tx) => {
    const [row] = await tx.insert(dockings).values({ orgId: v.orgId, vesselId: v.vesselId, createdBy: v.actorUserId, ...v.input }).returning({ id: dockings.id });
    const work = v.gather(await listWorkSources(v, tx));
    const changes = await syncItems(tx, { orgId: v.orgId, dockingId: row!.id }, work);
    await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: "docking.create", entity: "docking", entityId: row!.id, detail: { vesselId: v.vesselId, ...v.input, items: changes.added } });
    return row!;
  });
}

/** Gathers again; refuses (returns "locked") a docking that is completed or cancelled. */
export async function rebuildDocking(v: TDockingScope & { actorUserId: string; gather: (sources: TWorkSource[]) => TWorkItem[] }) {
  return db().transaction(async (tx) => {
    const docking = await lockDocking(tx, v);
    if (!docking) return null;
    if (dockingIsFinal(docking.status)) return { locked: docking.status } as const;
    const changes = await syncItems(tx, v, v.gather(await listWorkSources({ orgId: v.orgId, vesselId: docking.vesselId }, tx)));
    await tx.update(dockings).set({ updatedAt: new Date() }).where(and(eq(dockings.orgId, v.orgId), eq(dockings.id, v.dockingId)));
    await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: "docking.rebuild", entity: "docking", entityId: v.dockingId, detail: changes });
    return { changes } as const;
  });
}


/** The details a docking is planned with, as PUT /api/v1/dockings/{id} replaces them. */
const DETAIL_FIELDS = ["yard", "place", "plannedOn", "currency", "steelRatePerKg", "coatingRatePerM2", "anodeRatePerPiece", "sedimentRatePerM3"] as const satisfies readonly (keyof TDockingInput)[];

/**
 * Replaces the docking's details (yard, place, planned date, currency, unit
 * rates) while it is planned or in progress, with an audit row holding the
 * before and after of each changed field. Returns "locked" for a completed or
 * cancelled docking (nothing is written), null for no such docking; nothing
 * is written when no field changes.
 */
export async function updateDocking(v: TDockingScope & { actorUserId: string; input: TDockingInput }) {
  return db().transaction(async (tx) => {
    const docking = await lockDocking(tx, v);
    if (!docking) return null;
    if (dockingIsFinal(docking.status)) return { locked: docking.status } as const;
    const changed = DETAIL_FIELDS.filter((f) => docking[f] !== v.input[f]);
    if (!changed.length) return { changed } as const;
    const before = Object.fromEntries(changed.map((f) => [f, docking[f]]));
    const after = Object.fromEntries(changed.map((f) => [f, v.input[f]]));
    await tx.update(dockings).set({ ...after, updatedAt: new Date() }).where(and(eq(dockings.orgId, v.orgId), eq(dockings.id, v.dockingId)));
    await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: "docking.update", entity: "docking", entityId: v.dockingId, detail: { before, after } });
    return { changed } as const;
  });
}

/**
 * Adds a hand-added ("other") item to the docking, audit-logged. Returns
 * "locked" for a completed or cancelled docking, "foreignTank" when the tank
 * is not one of the docking's vessel (nothing is written then), null for no
 * such docking.
 */
export async function addOtherItem(v: TDockingScope & { actorUserId: string; input: TDockingOtherItemInput }) {
  return db().transaction(async (tx) => {
    const docking = await lockDocking(tx, v);
    if (!docking) return null;
    if (dockingIsFinal(docking.status)) return { locked: docking.status } as const;
    const { tankId, description, quantity, unit, unitRate, reason } = v.input;
    if (tankId) {
      const [tank] = await tx.select({ id: tanks.id }).from(tanks).where(and(eq(tanks.orgId, v.orgId), eq(tanks.vesselId, docking.vesselId), eq(tanks.id, tankId)));
      if (!tank) return { foreignTank: tankId } as const;
    }
    const [row] = await tx
      .insert(dockingItems)
      .values({ orgId: v.orgId, dockingId: v.dockingId, tankId: tankId ?? null, findingId: null, kind: "other", description, quantity, unit, unitRate, addedReason: reason, addedBy: v.actorUserId })
      .returning({ id: dockingItems.id });
    await tx.update(dockings).set({ updatedAt: new Date() }).where(and(eq(dockings.orgId, v.orgId), eq(dockings.id, v.dockingId)));
    await writeAudit(tx, {
      orgId: v.orgId,
      actorUserId: v.actorUserId,
      action: "docking_item.add",
      entity: "docking_item",
      entityId: row!.id,
      detail: { dockingId: v.dockingId, tankId: tankId ?? null, description, quantity, unit, unitRate, reason },
    });
    return { itemId: row!.id } as const;
  });
}

/**
 * Removes a hand-added item, audit-logged with what it was. Returns "locked"
 * for a completed or cancelled docking, "gathered" for an item gathered from a
 * report (it is excluded instead), "unknown" for an id that is not an item of
 * this docking, null for no such docking.
 */
export async function removeOtherItem(v: TDockingScope & { actorUserId: string; itemId: string }) {
  return db().transaction(async (tx) => {
    const docking = await lockDocking(tx, v);
    if (!docking) return null;
    if (dockingIsFinal(docking.status)) return { locked: docking.status } as const;
    const [item] = await tx.select().from(dockingItems).where(and(eq(dockingItems.orgId, v.orgId), eq(dockingItems.dockingId, v.dockingId), eq(dockingItems.id, v.itemId)));
    if (!item) return { unknown: v.itemId } as const;
    if (item.kind !== "other") return { gathered: item.kind } as const;
    await tx.delete(dockingItems).where(and(eq(dockingItems.orgId, v.orgId), eq(dockingItems.id, item.id)));
    await tx.update(dockings).set({ updatedAt: new Date() }).where(and(eq(dockings.orgId, v.orgId), eq(dockings.id, v.dockingId)));
    await writeAudit(tx, {
      orgId: v.orgId,
      actorUserId: v.actorUserId,
      action: "docking_item.remove",
      entity: "docking_item",
      entityId: item.id,
      detail: {
        dockingId: v.dockingId,
        tankId: item.tankId,
        description: item.description,
        quantity: item.quantity,
        unit: item.unit,
        unitRate: item.unitRate,
        reason: item.addedReason,
        included: item.included,
        adjustedQuantity: item.adjustedQuantity,
        adjustmentReason: item.adjustmentReason,
      },
    });
    return { removed: item.id } as const;
  });
}

/**
 * The company's most recent docking that was not cancelled (any vessel; latest
 * planned date, then latest created): where a new docking's currency and rates
 * start from. Null when the company has none.
 */
export async function getLatestDockingRates(scope: TOrgScope) {
  const [row] = await db()
    .select({
      dockingId: dockings.id,
      vesselName: vessels.name,
      yard: dockings.yard,
      plannedOn: dockings.plannedOn,
      currency: dockings.currency,
      steelRatePerKg: dockings.steelRatePerKg,
      coatingRatePerM2: dockings.coatingRatePerM2,
      anodeRatePerPiece: dockings.anodeRatePerPiece,
      sedimentRatePerM3: dockings.sedimentRatePerM3,
    })
    .from(dockings)
    .innerJoin(vessels, and(eq(vessels.orgId, dockings.orgId), eq(vessels.id, dockings.vesselId)))
    .where(and(eq(dockings.orgId, scope.orgId), ne(dockings.status, "cancelled")))
    .orderBy(desc(dockings.plannedOn), desc(dockings.createdAt))
    .limit(1);
  return row ?? null;
}

export type TItemDecision = { id: string; included: boolean; adjustedQuantity: number | null; adjustmentReason: string | null };

/**
 * Applies the superintendent's decisions to items of the docking, each with an
 * audit row holding the before and after. Returns "locked" for a completed or
 * cancelled docking, "unknown" with the ids that are not items of this docking
 * (nothing is changed then), null for no such docking.
 */
export async function decideItems(v: TDockingScope & { actorUserId: string; decisions: readonly TItemDecision[] }) {
  return db().transaction(async (tx) => {
    const docking = await lockDocking(tx, v);
    if (!docking) return null;
    if (dockingIsFinal(docking.status)) return { locked: docking.status } as const;
    const ids = v.decisions.map((d) => d.id);
    const rows = await tx.select().from(dockingItems).where(and(eq(dockingItems.orgId, v.orgId), eq(dockingItems.dockingId, v.dockingId), inArray(dockingItems.id, ids)));
    const byId = new Map(rows.map((r) => [r.id, r]));
    const unknown = ids.filter((id) => !byId.has(id));
    if (unknown.length) return { unknown } as const;
    let changed = 0;
    for (const d of v.decisions) {
      const before = byId.get(d.id)!;
      const same = before.included === d.included && before.adjustedQuantity === d.adjustedQuantity && (before.adjustmentReason ?? null) === d.adjustmentReason;
      if (same) continue;
      await tx.update(dockingItems).set({ included: d.included, adjustedQuantity: d.adjustedQuantity, adjustmentReason: d.adjustmentReason }).where(and(eq(dockingItems.orgId, v.orgId), eq(dockingItems.id, d.id)));
      await writeAudit(tx, {
        orgId: v.orgId,
        actorUserId: v.actorUserId,
        action: "docking_item.decide",
        entity: "docking_item",
        entityId: d.id,
        detail: {
          dockingId: v.dockingId,
          before: { included: before.included, adjustedQuantity: before.adjustedQuantity, adjustmentReason: before.adjustmentReason },
          after: { included: d.included, adjustedQuantity: d.adjustedQuantity, adjustmentReason: d.adjustmentReason },
        },
      });
      changed += 1;
    }
    if (changed) await tx.update(dockings).set({ updatedAt: new Date() }).where(and(eq(dockings.orgId, v.orgId), eq(dockings.id, v.dockingId)));
    return { changed } as const;
  });
}

/** The status changes a docking may make: planned → in progress → completed, or cancelled before completion. */
export const DOCKING_TRANSITIONS: Record<TDockingStatus, readonly TDockingStatus[]> = {
  planned: ["in_progress", "completed", "cancelled"],
  in_progress: ["completed", "cancelled"],
  completed: [],
  cancelled: [],
};

/** Moves the docking to `to` when the transition is allowed; returns the refused status otherwise, null for no such docking. */
export async function setDockingStatus(v: TDockingScope & { actorUserId: string; to: TDockingStatus }) {
  return db().transaction(async (tx) => {
    const docking = await lockDocking(tx, v);
    if (!docking) return null;
    if (!DOCKING_TRANSITIONS[docking.status].includes(v.to)) return { refused: docking.status } as const;
    await tx.update(dockings).set({ status: v.to, updatedAt: new Date() }).where(and(eq(dockings.orgId, v.orgId), eq(dockings.id, v.dockingId)));
    await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: "docking.status", entity: "docking", entityId: v.dockingId, detail: { from: docking.status, to: v.to } });
    return { from: docking.status, to: v.to } as const;
  });
}

/**
 * Marks included items done (or not done) while the docking is in progress.
 * A finding is closed when every included item gathered from it in this
 * docking is done, and opened again when one of them is marked not done.
 * Returns "refused" with the docking's status when it is not in progress,
 * "unknown" with ids that are not included items of this docking.
 */
export async function markItemsDone(v: TDockingScope & { actorUserId: string; itemIds: readonly string[]; done: boolean }) {
  return db().transaction(async (tx) => {
    const docking = await lockDocking(tx, v);
    if (!docking) return null;
    if (docking.status !== "in_progress") return { refused: docking.status } as const;
    const all = await tx.select().from(dockingItems).where(and(eq(dockingItems.orgId, v.orgId), eq(dockingItems.dockingId, v.dockingId)));
    const byId = new Map(all.filter((i) => i.included).map((i) => [i.id, i]));
    const unknown = v.itemIds.filter((id) => !byId.has(id));
    if (unknown.length) return { unknown } as const;
    const at = v.done ? new Date() : null;
    const touched = new Set<string>();
    for (const id of v.itemIds) {
      const item = byId.get(id)!;
      if ((item.doneAt !== null) === v.done) continue;
      await tx.update(dockingItems).set({ doneAt: at }).where(and(eq(dockingItems.orgId, v.orgId), eq(dockingItems.id, id)));
      item.doneAt = at;
      await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: v.done ? "docking_item.done" : "docking_item.undone", entity: "docking_item", entityId: id, detail: { dockingId: v.dockingId } });
      if (item.findingId) touched.add(item.findingId);
    }
    const closed: string[] = [];
    const reopened: string[] = [];
    for (const findingId of touched) {
      const items = all.filter((i) => i.included && i.findingId === findingId);
      const allDone = items.every((i) => i.doneAt !== null);
      const [row] = await tx
        .update(findings)
        .set(allDone ? { status: "closed", closedAt: at ?? new Date() } : { status: "open", closedAt: null })
        .where(and(eq(findings.orgId, v.orgId), eq(findings.id, findingId), eq(findings.status, allDone ? "open" : "closed")))
        .returning({ id: findings.id });
      if (!row) continue;
      (allDone ? closed : reopened).push(findingId);
      await writeAudit(tx, { orgId: v.orgId, actorUserId: v.actorUserId, action: allDone ? "finding.close" : "finding.reopen", entity: "finding", entityId: findingId, detail: { dockingId: v.dockingId } });
    }
    return { closed, reopened } as const;
  });
}
