import "server-only";
// Dockings and their work lists: the office plans a docking of a vessel, the
// product gathers the work from each tank's latest countersigned report, the
// superintendent includes, excludes or adjusts items (with a reason), and the
// list is priced at the docking's rates (lib/office/work-list.ts).
import { z } from "zod";
import * as q from "@/db/queries/dockings";
import type { TActor } from "@/lib/auth/actor";
import { authorizeVessel } from "@/lib/auth/authorize";
import { AppError, issuesFromZod } from "@/lib/errors";
import { describeIssues } from "@/lib/office/docking-messages";
import { workListCsv } from "@/lib/office/work-list-csv";
import { emptyKindSums, gatherWorkItems, isGatheredKind, isWorkKind, priceKindSums, priceWorkList, WORK_KIND_LABELS, type TWorkSource } from "@/lib/office/work-list";
import { workListQueryFromParams, ZDockingDecisions, ZDockingDoneInput, ZDockingInput, ZDockingOtherItemInput, ZDockingStatusInput, type TWorkListQuery } from "@/lib/schemas/docking";
import { DOCKING_STATUS_LABELS, type TRole } from "@/lib/vocabulary";

/** Who plans dockings and reads their work lists: the office. */
export const DOCKING_PLANNERS = ["superintendent", "admin"] as const;
export const canPlanDockings = (roles: readonly TRole[]) => roles.some((r) => (DOCKING_PLANNERS as readonly TRole[]).includes(r));

const ZId = z.uuid();

/** A docking through the vessel it belongs to: 404 for another company's or an unknown id, 403 for a role that may not plan. */
async function authorizeDocking(actor: TActor, dockingId: string) {
  if (!ZId.safeParse(dockingId).success) throw new AppError("not_found", "No such docking.");
  const scope = await q.unsafeGetDockingScope({ dockingId });
  if (!scope) throw new AppError("not_found", "No such docking.");
  try {
    const auth = await authorizeVessel({ actor, vesselId: scope.vesselId, allow: DOCKING_PLANNERS });
    return { ...auth, dockingId };
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") throw new AppError("not_found", "No such docking.");
    throw error;
  }
}

/** How many items a decision body names, to say which item a message is about. */
const itemCountOf = (body: unknown) => {
  const items = (body as { items?: unknown } | null)?.items;
  return Array.isArray(items) ? items.length : 1;
};

/** Validates a body against its schema; a refusal (400) names each field in words with its own message. */
function validateDockingInput<S extends z.ZodType>(schema: S, body: unknown): z.infer<S> {
  const parsed = schema.safeParse(body);
  if (!parsed.success) {
    const issues = issuesFromZod(parsed.error.issues);
    throw new AppError("bad_request", describeIssues(issues, itemCountOf(body)), issues);
  }
  return parsed.data;
}

const gather = (sources: TWorkSource[]) => gatherWorkItems(sources).items;

const lockedError = (status: string) =>
  new AppError("conflict", `This docking is ${status}: its work list can no longer be changed.`, [{ path: "status", message: `the docking is ${status}` }]);

/** Per-kind sums from the database, in the shape priceKindSums reads, with the count of adjusted items. */
function kindSumsOf(sums: Awaited<ReturnType<typeof q.sumDockingItems>>) {
  const byKind = emptyKindSums();
  let adjusted = 0;
  for (const s of sums) {
    if (isGatheredKind(s.kind)) byKind[s.kind] = { quantity: s.quantity, included: s.included, excluded: s.excluded };
    else if (s.kind === "other") byKind.other = { cost: s.cost, included: s.included, excluded: s.excluded };
    else continue;
    adjusted += s.adjusted;
  }
  return { byKind, adjusted };
}

/** The vessel's dockings, latest planned first, each with its grand total (in its currency) and item counts from the database's sums. */
export async function listDockingsAs(actor: TActor, vesselId: string) {
  const { orgId, vessel } = await authorizeVessel({ actor, vesselId, allow: DOCKING_PLANNERS });
  const [rows, sums] = await Promise.all([q.listDockings({ orgId, vesselId }), q.sumDockingItems({ orgId, vesselId })]);
  const dockings = rows.map((d) => {
    const { byKind, adjusted } = kindSumsOf(sums.filter((s) => s.dockingId === d.id));
    const { minorUnits, grandTotal, counts } = priceKindSums(byKind, d, adjusted);
    return { ...d, minorUnits, grandTotal, counts };
  });
  return { vessel: { id: vessel.id, name: vessel.name }, dockings };
}

export async function createDockingAs(actor: TActor, vesselId: string, body: unknown) {
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: DOCKING_PLANNERS });
  const input = validateDockingInput(ZDockingInput, body);
  return q.createDocking({ orgId, vesselId, actorUserId: actor.userId, input, gather });
}

/** The docking with every item of its work list, priced (for the exports). */
export async function readWorkListAs(actor: TActor, dockingId: string) {
  const { orgId, vessel } = await authorizeDocking(actor, dockingId);
  const [docking, rows] = await Promise.all([q.getDocking({ orgId, dockingId }), q.listDockingItems({ orgId, dockingId })]);
  if (!docking) throw new AppError("not_found", "No such docking.");
  const items = rows.flatMap((r) => (isWorkKind(r.kind) ? [{ ...r, key: r.id, kind: r.kind }] : []));
  return { orgId, vessel: { id: vessel.id, name: vessel.name, imoNumber: vessel.imoNumber }, docking, workList: priceWorkList(items, docking) };
}

/** The page of a work list the request asks for (?tank=&page=&pageSize=); a bad value is refused (400). */
export function workListViewFromParams(params: Parameters<typeof workListQueryFromParams>[0]): TWorkListQuery {
  const parsed = workListQueryFromParams(params);
  if (!parsed.success) throw new AppError("bad_request", "The work-list page is not valid.", issuesFromZod(parsed.error.issues));
  return parsed.data;
}

const FIRST_PAGE: TWorkListQuery = { page: 1, pageSize: 100 };
type TViewParams = TWorkListQuery | URLSearchParams;
/** The page of items an answer carries; called once the actor is known to be allowed in, and before anything is changed. */
const viewOf = (params: TViewParams) => (params instanceof URLSearchParams ? workListViewFromParams(params) : params);

/**
 * The docking with one page of its priced work list (totals and counts over
 * every item), the tanks it was gathered from, and the open findings the yard
 * cannot price (no quantities).
 */
async function loadDocking(actor: TActor, dockingId: string, params: TViewParams) {
  const { orgId, vessel } = await authorizeDocking(actor, dockingId);
  const view = viewOf(params);
  const offset = (view.page - 1) * view.pageSize;
  const [docking, sums, page, sources] = await Promise.all([
    q.getDocking({ orgId, dockingId }),
    q.sumDockingItems({ orgId, dockingId }),
    q.listDockingItemsPage({ orgId, dockingId, tankId: view.tank, limit: view.pageSize, offset }),
    q.listLatestInspectionsOfDocking({ orgId, dockingId }),
  ]);
  if (!docking) throw new AppError("not_found", "No such docking.");
  // The totals from the database's sums; only the page's items are priced one by one.
  // Gathered kinds are priced from their summed quantity; hand-added work from its summed cost (mixed units).
  const { byKind, adjusted } = kindSumsOf(sums);
  const pageItems = page.rows.flatMap((r) => (isWorkKind(r.kind) ? [{ ...r, key: r.id, kind: r.kind }] : []));
  const candidates = await q.listOpenFindingsWithoutQuantities({ orgId, inspectionIds: sources.map((s) => s.inspectionId) });
  const unpriced = gatherWorkItems(
    sources.map((s) => ({ ...s, findings: candidates.filter((f) => f.inspectionId === s.inspectionId), anodes: null, sedimentZones: [] })),
  ).unpriced;
  const answer = {
    vessel,
    docking,
    workList: { ...priceKindSums(byKind, docking, adjusted), items: priceWorkList(pageItems, docking).items },
    paging: { page: view.page, pageSize: view.pageSize, tank: view.tank ?? null, matching: page.matching, totalPages: Math.max(1, Math.ceil(page.matching / view.pageSize)) },
    unpriced,
    sources: sources.map((s) => ({ tankId: s.tankId, tankCode: s.tankCode, inspectionId: s.inspectionId, inspectedOn: s.inspectedOn })),
  };
  // How far the yard's work has got, over the whole list: included items, and how many of them are done.
  const progress = { included: sums.reduce((n, s) => n + s.included, 0), done: sums.reduce((n, s) => n + s.done, 0) };
  return { answer, progress };
}

export async function getDockingAs(actor: TActor, dockingId: string, params: TViewParams = FIRST_PAGE) {
  return (await loadDocking(actor, dockingId, params)).answer;
}

/** For the work list page: the same docking and page, with the yard's progress (not part of the API's answer). */
export async function getDockingPageAs(actor: TActor, dockingId: string, params: TViewParams = FIRST_PAGE) {
  const { answer, progress } = await loadDocking(actor, dockingId, params);
  return { ...answer, progress };
}


/** Include, exclude or adjust items; every exclusion and adjustment needs a reason, and each change is audit-logged. */
export async function decideDockingItemsAs(actor: TActor, dockingId: string, body: unknown, params: TViewParams = FIRST_PAGE) {
  const { orgId } = await authorizeDocking(actor, dockingId);
  const view = viewOf(params);
  const input = validateDockingInput(ZDockingDecisions, body);
  const issues = input.items.flatMap((d, n) =>
    !d.included && !d.adjustmentReason ? [{ path: `items.${n}.adjustmentReason`, message: "is required: say why the item is excluded" }] : [],
  );
  if (issues.length) throw new AppError("bad_request", describeIssues(issues, input.items.length), issues);
  const decisions = input.items.map((d) => ({ id: d.id, included: d.included, adjustedQuantity: d.adjustedQuantity ?? null, adjustmentReason: d.adjustmentReason ?? null }));
  const result = await q.decideItems({ orgId, dockingId, actorUserId: actor.userId, decisions });
  if (!result) throw new AppError("not_found", "No such docking.");
  if (result.locked) throw lockedError(result.locked);
  if (result.unknown) throw new AppError("not_found", "No such item in this docking; nothing was changed.", result.unknown.map((id) => ({ path: "items", message: `${id} is not an item of this docking` })));
  return { changed: result.changed ?? 0, ...(await getDockingAs(actor, dockingId, view)) };
}

/**
 * Adds work that no finding asks for (staging, gas-freeing, cleaning, a
 * surveyor's attendance, a lump sum), priced at its own rate; audit-logged.
 * The tank, when given, must be one of the docking's vessel (400 otherwise).
 */
export async function addDockingItemAs(actor: TActor, dockingId: string, body: unknown, params: TViewParams = FIRST_PAGE) {
  const { orgId } = await authorizeDocking(actor, dockingId);
  const view = viewOf(params);
  const input = validateDockingInput(ZDockingOtherItemInput, body);
  const result = await q.addOtherItem({ orgId, dockingId, actorUserId: actor.userId, input });
  if (!result) throw new AppError("not_found", "No such docking.");
  if (result.locked) throw lockedError(result.locked);
  if (result.foreignTank) {
    throw new AppError("bad_request", "That tank is not a tank of this docking's vessel; nothing was added. Choose one of the vessel's tanks, or none.", [{ path: "tankId", message: "must be a tank of the docking's vessel" }]);
  }
  return { itemId: result.itemId!, ...(await getDockingAs(actor, dockingId, view)) };
}

/** Removes an item added by hand; a gathered item cannot be removed (409: exclude it, with a reason). */
export async function removeDockingItemAs(actor: TActor, dockingId: string, itemId: string, params: TViewParams = FIRST_PAGE) {
  const { orgId } = await authorizeDocking(actor, dockingId);
  const view = viewOf(params);
  if (!ZId.safeParse(itemId).success) throw new AppError("not_found", "No such item in this docking.");
  const result = await q.removeOtherItem({ orgId, dockingId, actorUserId: actor.userId, itemId });
  if (!result) throw new AppError("not_found", "No such docking.");
  if (result.locked) throw lockedError(result.locked);
  if (result.unknown) throw new AppError("not_found", "No such item in this docking.");
  if (result.gathered) {
    const kind = isWorkKind(result.gathered) ? WORK_KIND_LABELS[result.gathered].toLowerCase() : result.gathered;
    throw new AppError("conflict", `This ${kind} item was gathered from a countersigned report and cannot be removed; exclude it instead, with a reason.`, [{ path: "itemId", message: "is a gathered item: exclude it instead" }]);
  }
  return getDockingAs(actor, dockingId, view);
}

/** Where a new docking's currency and rates start from: the company's most recent docking (any vessel), or null. */
export async function latestDockingRatesAs(actor: TActor, vesselId: string) {
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: DOCKING_PLANNERS });
  return q.getLatestDockingRates({ orgId });
}

/** Gathers the work again from the latest countersigned reports, keeping each item's decision and the work added by hand. */
export async function rebuildDockingAs(actor: TActor, dockingId: string, params: TViewParams = FIRST_PAGE) {
  const { orgId } = await authorizeDocking(actor, dockingId);
  const view = viewOf(params);
  const result = await q.rebuildDocking({ orgId, dockingId, actorUserId: actor.userId, gather });
  if (!result) throw new AppError("not_found", "No such docking.");
  if (result.locked) throw lockedError(result.locked);
  return { changes: result.changes!, ...(await getDockingAs(actor, dockingId, view)) };
}

export async function workListCsvAs(actor: TActor, dockingId: string) {
  const { vessel, docking, workList } = await readWorkListAs(actor, dockingId);
  const csv = workListCsv(workList, { vesselName: vessel.name, yard: docking.yard, place: docking.place, plannedOn: docking.plannedOn });
  const fileName = `work-list-${vessel.name}-${docking.plannedOn}.csv`.replace(/[^A-Za-z0-9._-]+/g, "-");
  return { csv, fileName };
}


/**
 * Changes the docking's details (yard, place, planned date, currency, unit
 * rates; the body of creating one) while it is planned or in progress; a
 * completed or cancelled docking is refused (409). A new currency applies to
 * every rate, hand-added items' own rates included. Audit-logged.
 */
export async function updateDockingAs(actor: TActor, dockingId: string, body: unknown, params: TViewParams = FIRST_PAGE) {
  const { orgId } = await authorizeDocking(actor, dockingId);
  const view = viewOf(params);
  const input = validateDockingInput(ZDockingInput, body);
  const result = await q.updateDocking({ orgId, dockingId, actorUserId: actor.userId, input });
  if (!result) throw new AppError("not_found", "No such docking.");
  if (result.locked) {
    const status = DOCKING_STATUS_LABELS[result.locked].toLowerCase();
    throw new AppError("conflict", `This docking is ${status}: its details can no longer be changed.`, [{ path: "status", message: `the docking is ${result.locked}` }]);
  }
  return getDockingAs(actor, dockingId, view);
}

/** Starts, completes or cancels the docking; a completed or cancelled docking is final. */
export async function setDockingStatusAs(actor: TActor, dockingId: string, body: unknown, params: TViewParams = FIRST_PAGE) {
  const { orgId } = await authorizeDocking(actor, dockingId);
  const view = viewOf(params);
  const { status } = validateDockingInput(ZDockingStatusInput, body);
  const result = await q.setDockingStatus({ orgId, dockingId, actorUserId: actor.userId, to: status });
  if (!result) throw new AppError("not_found", "No such docking.");
  if (result.refused) {
    throw new AppError("conflict", `A docking that is ${DOCKING_STATUS_LABELS[result.refused].toLowerCase()} cannot become ${DOCKING_STATUS_LABELS[status].toLowerCase()}.`, [{ path: "status", message: `cannot change from ${result.refused} to ${status}` }]);
  }
  return getDockingAs(actor, dockingId, view);
}


/** While the docking is in progress: marks included items done (closing a finding once all its items are done) or not done. */
export async function markDockingItemsDoneAs(actor: TActor, dockingId: string, body: unknown, params: TViewParams = FIRST_PAGE) {
  const { orgId } = await authorizeDocking(actor, dockingId);
  const view = viewOf(params);
  const input = validateDockingInput(ZDockingDoneInput, body);
  const result = await q.markItemsDone({ orgId, dockingId, actorUserId: actor.userId, itemIds: input.itemIds, done: input.done });
  if (!result) throw new AppError("not_found", "No such docking.");
  if (result.refused) {
    throw new AppError("conflict", `Items are marked done while the docking is in progress; this one is ${DOCKING_STATUS_LABELS[result.refused].toLowerCase()}.`, [{ path: "status", message: `the docking is ${result.refused}` }]);
  }
  if (result.unknown) throw new AppError("not_found", "No such included item in this docking; nothing was changed.", result.unknown.map((id) => ({ path: "itemIds", message: `${id} is not an included item of this docking` })));
  return { closedFindings: result.closed ?? [], reopenedFindings: result.reopened ?? [], ...(await getDockingAs(actor, dockingId, view)) };
}
