import "server-only";
import { createHash } from "node:crypto";
import { db } from "@/db";
import * as q from "@/db/queries/inspections";
import * as photoQ from "@/db/queries/photos";
import { listCoatingForInspections } from "@/db/queries/fleet";
import { getOrgSettings } from "@/db/queries/organisations";
import { getTank, getTankCatalogue, toCatalogue } from "@/db/queries/tanks";
import { projectThresholdDate, unusedAnodeWarning } from "@/lib/calc/anodes";
import { rateCoatingArea, rateTank } from "@/lib/calc/coating";
import { astmD610Grade } from "@/lib/calc/rust-grade";
import { removalCost, sedimentVolumeM3, totalVolumeM3 } from "@/lib/calc/sediment";
import type { TActor } from "@/lib/auth/actor";
import { authorizeInspection, authorizeVessel } from "@/lib/auth/authorize";
import { AppError, databaseErrorCode } from "@/lib/errors";
import { validateInput } from "@/lib/http/route";
import { inspectionBlockers } from "@/lib/inspection/blockers";
import { repairQuantities } from "@/lib/inspection/quantities";
import { reportOrder } from "@/lib/photos/order";
import { publicPhoto } from "@/lib/photos/public";
import { judgeReading, ruleSet } from "@/lib/safety/atmosphere";
import { photoCaptionSchema, ZPhotoOrderInput } from "@/lib/schemas/photo";
import type { TInspectionList, TServed } from "@/lib/schemas/responses";
import { deleteObjects } from "@/lib/storage/s3";
import {
  findingInputSchema,
  notInspectedInputSchema,
  sedimentInputSchema,
  ZAnodesInput,
  ZCoatingInput,
  ZEntryRecordInput,
  ZFindingsFlagInput,
  ZHeaderInput,
  ZInspectionStart,
  ZReadingInput,
  ZRemarksInput,
  type TRepair,
} from "@/lib/schemas/inspection";
import { z } from "zod";
import { VESSEL_READERS } from "./vessels";

/** Who carries out and edits an inspection: the vessel's officers and master. */
export const INSPECTORS = ["officer", "master"] as const;
export const canInspect = (roles: readonly string[]) => roles.some((r) => (INSPECTORS as readonly string[]).includes(r));

export async function startInspectionAs(actor: TActor, vesselId: string, body: unknown) {
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: INSPECTORS });
  const input = validateInput(ZInspectionStart, body);
  const tank = await getTank({ orgId, vesselId, tankId: input.tankId });
  if (!tank) throw new AppError("bad_request", "Check tankId: no such tank on this vessel.", [{ path: "tankId", message: "is not a tank of this vessel" }]);
  const settings = await getOrgSettings({ orgId });
  return q.createInspection({
    orgId, vesselId, tankId: tank.id, actorUserId: actor.userId, id: input.id,
    input: { inspectedOn: input.inspectedOn, placeKind: input.placeKind, place: input.place, team: input.team },
    ruleSet: settings?.atmosphereRuleSet ?? "msc581",
  });
}

/** The vessel's inspections, each with its tank's coating rating (worst area; null without a coating record). */
export async function listInspectionsAs(actor: TActor, vesselId: string) {
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: VESSEL_READERS });
  const [rows, settings] = await Promise.all([q.listVesselInspections({ orgId, vesselId }), getOrgSettings({ orgId })]);
  const rule = settings?.twentyPercentRule ?? "table";
  const coating = await listCoatingForInspections({ orgId, inspectionIds: rows.map((r) => r.id) });
  const inspections = rows.map((row) => {
    const areas = coating.filter((c) => c.inspectionId === row.id).map((c) => ({ ...c, rating: rateCoatingArea(c, rule) }));
    return { ...row, rating: rateTank(areas)?.rating ?? null };
  });
  return inspections satisfies TServed<TInspectionList["inspections"]>;
}

/** The whole inspection with everything the product computes from it. */
export async function readInspectionView(actor: TActor, inspectionId: string) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: VESSEL_READERS });
  return buildView(auth.orgId, inspectionId, auth.vessel, canInspect(auth.roles));
}

export async function buildView(orgId: string, inspectionId: string, vessel: { id: string; name: string; imoNumber: string; utcOffsetMinutes: number | null }, isInspector: boolean) {
  const b = await q.getInspectionBundle({ orgId, inspectionId });
  if (!b) throw new AppError("not_found", "No such inspection.");
  const tank = await getTank({ orgId, vesselId: vessel.id, tankId: b.inspection.tankId });
  if (!tank) throw new AppError("not_found", "No such tank.");
  const catalogue = toCatalogue(tank, await getTankCatalogue({ orgId, tankId: tank.id }));
  const rule = b.settings?.twentyPercentRule ?? "table";
  const set = ruleSet(b.entry?.ruleSet ?? b.settings?.atmosphereRuleSet ?? "msc581");
  const coating = b.coating.map((c) => ({ ...c, rating: rateCoatingArea(c, rule), rustGrade: astmD610Grade(c.rustedPct) }));
  const tankRating = rateTank(coating);
  const history = await q.listAnodeHistory({ orgId, tankId: tank.id, before: b.inspection.inspectedOn });
  const threshold = b.settings?.anodeRenewThresholdPct ?? 50;
  const corrosionTypes = new Set(["general_corrosion", "pitting", "grooving", "thickness_diminution"]);
  const tankCorrodes = b.findings.some((f) => corrosionTypes.has(f.type)) || coating.some((c) => c.rating.rating !== "GOOD");
  const volume = totalVolumeM3(b.sediment);
  const photos = reportOrder(await photoQ.listPhotos({ orgId, inspectionId }));
  const editable = isInspector && (b.inspection.status === "draft" || b.inspection.status === "returned");
  return {
    inspection: b.inspection,
    vessel: { id: vessel.id, name: vessel.name, imoNumber: vessel.imoNumber, utcOffsetMinutes: vessel.utcOffsetMinutes },
    tank: { id: tank.id, code: tank.code, name: tank.name, kind: tank.kind, side: tank.side, frameFrom: tank.frameFrom, frameTo: tank.frameTo, bottomAreaM2: tank.bottomAreaM2 },
    catalogue,
    entry: b.entry ?? null,
    ruleSet: { id: set.id, name: set.name, source: set.source, limits: set.limits.map((l) => ({ key: l.key, label: l.label, limitText: l.limitText })) },
    readings: b.readings.map((r) => ({ ...r, verdict: judgeReading(r, set) })),
    findings: b.findings,
    coating,
    tankRating: tankRating ? { rating: tankRating.rating, worstArea: tankRating.worst.area, decidedBy: tankRating.worst.rating.decidedBy } : null,
    twentyPercentRule: rule,
    anodes: b.anodes ?? null,
    anodeProjection: b.anodes ? projectThresholdDate([...history, { date: b.inspection.inspectedOn, meanWastagePct: b.anodes.meanWastagePct }], threshold) : null,
    anodeThresholdPct: threshold,
    anodeWarning: b.anodes ? unusedAnodeWarning({ meanWastagePct: b.anodes.meanWastagePct, appearUnused: b.anodes.appearUnused, tankCorrodes }) : null,
    sediment: { zones: b.sediment, totalM3: volume, cost: b.sedimentRate ? { ...removalCost(volume, b.sedimentRate), place: b.sedimentRate.place, ratePerM3: b.sedimentRate.amount } : null },
    notInspected: b.notInspected,
    photos: photos.map(publicPhoto),
    blockers: inspectionBlockers({
      entry: b.entry ? { permitRef: b.entry.permitRef, standbyPerson: b.entry.standbyPerson, rescueEquipmentReady: b.entry.rescueEquipmentReady, ruleSet: b.entry.ruleSet } : null,
      readings: b.readings,
      findingsCount: b.findings.length,
      noFindings: b.inspection.noFindings,
      coatingAreas: b.coating.map((c) => c.area),
      anodes: Boolean(b.anodes),
      sedimentZones: b.sediment.length,
      noSediment: b.inspection.noSediment,
      notInspected: b.notInspected.length,
      allAreasInspected: b.inspection.allAreasInspected,
      photos: { photos, findings: b.findings },
    }),
    editable,
  };
}
export type TInspectionView = Awaited<ReturnType<typeof buildView>>;

export const SECTIONS = ["header", "entry", "coating", "anodes", "sediment", "not-inspected", "remarks", "findings-flag", "photo-order"] as const;
export type TSection = (typeof SECTIONS)[number];

const ZVersion = z.object({ version: z.number({ error: "is required: the version you read" }).int().positive() });

type TWriteCtx = { tx: q.TTx; orgId: string; inspectionId: string; catalogue: ReturnType<typeof toCatalogue>; tank: { code: string; frameFrom: number; frameTo: number } };

/** Each write validates with its schema, then changes its part inside the version-claiming transaction. */
const WRITERS: Record<TSection, (c: TWriteCtx, body: unknown) => Promise<void>> = {
  header: async (c, body) => q.setHeader(c.tx, c, validateInput(ZHeaderInput, body)),
  entry: async (c, body) => {
    const v = validateInput(ZEntryRecordInput, body);
    await q.setEntryRecord(c.tx, c, { permitRef: v.permitRef ?? null, ruleSet: v.ruleSet, standbyPerson: v.standbyPerson ?? null, ventilation: v.ventilation ?? null, rescueEquipmentReady: v.rescueEquipmentReady ?? null, communicationsTested: v.communicationsTested ?? null });
  },
  coating: async (c, body) => {
    const v = validateInput(ZCoatingInput, body);
    await q.replaceCoating(c.tx, c, v.areas.map((a) => ({ ...a, edgesRustedPct: a.edgesRustedPct ?? null, location: a.location ?? null })));
  },
  anodes: async (c, body) => {
    const v = validateInput(ZAnodesInput, body);
    await q.setAnodes(c.tx, c, { ...v, anodeKind: v.anodeKind ?? null, minWastagePct: v.minWastagePct ?? null, maxWastagePct: v.maxWastagePct ?? null, note: v.note ?? null });
  },
  sediment: async (c, body) => {
    const v = validateInput(sedimentInputSchema(c.tank), body);
    await q.setFlags(c.tx, c, { noSediment: v.noSediment });
    await q.replaceSediment(c.tx, c, v.zones.map((zn) => {
      const areaM2 = zn.areaM2 ?? zn.lengthM! * zn.breadthM!;
      return { id: zn.id, label: zn.label, frameFrom: zn.frameFrom ?? null, frameTo: zn.frameTo ?? null, depthMm: zn.depthMm, areaM2, lengthM: zn.lengthM ?? null, breadthM: zn.breadthM ?? null, volumeM3: sedimentVolumeM3({ depthMm: zn.depthMm, areaM2 }) };
    }));
  },
  "not-inspected": async (c, body) => {
    const v = validateInput(notInspectedInputSchema(c.catalogue), body);
    await q.setFlags(c.tx, c, { allAreasInspected: v.allAreasInspected });
    await q.replaceNotInspected(c.tx, c, v.areas.map((a) => ({ ...a, platingRegion: a.platingRegion ?? null, memberKind: a.memberKind ?? null, memberNumber: a.memberNumber ?? null, suspected: a.suspected ?? null })));
  },
  remarks: async (c, body) => q.setFlags(c.tx, c, { remarks: validateInput(ZRemarksInput, body).doc }),
  "findings-flag": async (c, body) => q.setFlags(c.tx, c, { noFindings: validateInput(ZFindingsFlagInput, body).noFindings }),
  "photo-order": async (c, body) => photoQ.setPhotoOrder(c.tx, c, validateInput(ZPhotoOrderInput, body).order),
};

/** A caption that places the photo; the close-ups that name an overview must still fit inside it. */
async function writePhotoCaption(c: TWriteCtx, photoId: string, body: unknown) {
  const peers = await photoQ.listPhotoPeers(c.tx, c);
  const self = peers.find((p) => p.id === photoId);
  if (!self) throw new AppError("not_found", "No such photo.");
  if (self.status === "awaiting_upload" || self.status === "rejected") throw new AppError("unprocessable", "This photo has not been accepted yet: wait for its upload to finish.");
  const v = validateInput(photoCaptionSchema({ catalogue: c.catalogue, photoId, peers, findingIds: await photoQ.listFindingIds(c.tx, c) }), body);
  const closeUps = peers.filter((p) => p.overviewPhotoId === photoId);
  const misfits = closeUps.filter((p) => v.kind !== "overview" || p.frameFrom === null || p.frameTo === null || p.frameFrom < v.frameFrom || p.frameTo > v.frameTo);
  if (misfits.length) {
    throw new AppError("unprocessable", `${misfits.length} close-up${misfits.length > 1 ? "s name" : " names"} this overview and would no longer fit inside it: change ${misfits.length > 1 ? "them" : "it"} first.`, [
      { path: v.kind !== "overview" ? "kind" : "frameFrom", message: "close-ups of this overview lie outside these frames" },
    ]);
  }
  await photoQ.setPhotoCaption(c.tx, c, photoId, {
    kind: v.kind, frameFrom: v.frameFrom, frameTo: v.frameTo, memberKind: v.memberKind, platingRegion: v.platingRegion ?? null, memberNumber: v.memberNumber ?? null,
    findingId: v.findingId ?? null, overviewPhotoId: v.kind === "close_up" ? v.overviewPhotoId ?? null : null, caption: v.caption,
  });
}

type TMutation =
  | { kind: "section"; section: TSection }
  | { kind: "finding"; findingId: string }
  | { kind: "delete-finding"; findingId: string }
  | { kind: "reading" }
  | { kind: "photo"; photoId: string }
  | { kind: "delete-photo"; photoId: string };

/**
 * One write to an inspection: authorize (officer or master of the vessel),
 * replay a retried request by its Idempotency-Key, claim the next version
 * (409 if stale or locked), validate and write, all in one transaction.
 */
export async function writeInspectionAs(actor: TActor, inspectionId: string, mutation: TMutation, body: unknown, idempotencyKey: string | null) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: INSPECTORS });
  const { orgId } = auth;
  const requestHash = createHash("sha256").update(JSON.stringify({ inspectionId, mutation, body })).digest("hex");
  if (idempotencyKey) {
    const seen = await q.getIdempotentResponse({ userId: actor.userId, key: idempotencyKey });
    if (seen) {
      if (seen.requestHash !== requestHash) throw new AppError("unprocessable", "This Idempotency-Key was already used for a different request.");
      return { status: seen.status, body: seen.body };
    }
  }
  const { version } = validateInput(ZVersion, body);
  // Every autosave passes here: read only what the write needs (the tank and its catalogue).
  const tankId = await q.getInspectionTankId({ orgId, inspectionId });
  if (!tankId) throw new AppError("not_found", "No such inspection.");
  const tank = await getTank({ orgId, vesselId: auth.vessel.id, tankId });
  const catalogue = toCatalogue(tank!, await getTankCatalogue({ orgId, tankId: tank!.id }));
  /** Files to remove from storage once the transaction has committed. */
  let removedKeys: (string | null)[] = [];
  try {
    const result = await db().transaction(async (tx) => {
      const next = await q.claimVersion(tx, { orgId, inspectionId, version });
      const c: TWriteCtx = { tx, orgId, inspectionId, catalogue, tank: tank! };
      let extra: Record<string, unknown> = {};
      if (mutation.kind === "section") await WRITERS[mutation.section](c, body);
      if (mutation.kind === "reading") {
        const r = validateInput(ZReadingInput, body);
        await q.addReading(tx, c, { ...r, testedAt: new Date(r.testedAt), co2Pct: r.co2Pct ?? null, instrument: r.instrument ?? null });
      }
      if (mutation.kind === "delete-finding") await q.removeFinding(tx, c, mutation.findingId);
      if (mutation.kind === "photo") await writePhotoCaption(c, mutation.photoId, body);
      if (mutation.kind === "delete-photo") {
        const row = await photoQ.removePhoto(tx, c, mutation.photoId);
        removedKeys = row.unsharedKeys;
      }
      if (mutation.kind === "finding") {
        const f = validateInput(findingInputSchema(catalogue), body);
        const quantities = repairQuantities(f.repair as TRepair);
        const { repair, ...fields } = f;
        const number = await q.upsertFinding(tx, c, {
          id: mutation.findingId, ...nullify(fields), type: f.type, frameFrom: f.frameFrom, frameTo: f.frameTo, memberKind: f.memberKind, description: f.description,
          repairKind: repair.kind, repair, steelWeightKg: quantities.steelWeightKg, coatingRepairM2: quantities.coatingRepairM2,
        });
        if (number) await q.setFlags(tx, c, { noFindings: false });
        extra = { findingNumber: number, ...quantities };
      }
      const response = { version: next, ...extra };
      if (idempotencyKey) await q.saveIdempotentResponse(tx, { userId: actor.userId, orgId, key: idempotencyKey, requestHash, status: 200, body: response });
      return response;
    });
    if (removedKeys.length) await deleteObjects(removedKeys).catch((error) => console.error("[tankwright] removing a deleted photo's files failed", error));
    return { status: 200, body: result };
  } catch (error) {
    if (idempotencyKey && databaseErrorCode(error) === "23505") {
      const seen = await q.getIdempotentResponse({ userId: actor.userId, key: idempotencyKey });
      if (seen) return { status: seen.status, body: seen.body };
    }
    throw error;
  }
}

/** Optional fields to null, so an update clears what the officer removed. */
function nullify<T extends Record<string, unknown>>(v: T): { [K in keyof T]: Exclude<T[K], undefined> | null } {
  return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, x === undefined ? null : x])) as never;
}
