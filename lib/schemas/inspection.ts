import { z } from "zod";
import { isTriangle } from "@/lib/calc/steel";
import { checkFreeText } from "@/lib/rules/vagueness";
import { checkMemberReference, type TCatalogue } from "@/lib/structure/catalogue";
import {
  ANODE_KINDS,
  ATMOSPHERE_RULE_SETS,
  COATING_AREAS,
  FINDING_TYPES,
  MEMBER_KINDS,
  NOT_INSPECTED_REASONS,
  PLACE_KINDS,
  PLATING_REGIONS,
  type TFindingType,
} from "@/lib/vocabulary";
import { numberFromForm, optionalText, wholeNumber } from "./common";

const blankToUndefined = (v: unknown) => (v === "" || v === null ? undefined : v);
const positive = (what: string, max: number) =>
  z.preprocess(numberFromForm, z.number({ error: (i) => (i.input === undefined ? "is required" : `must be a number of ${what}`) }).positive("must be more than 0").max(max, `must be at most ${max} ${what}`));
const optionalPositive = (what: string, max: number) =>
  z.preprocess(numberFromForm, z.number({ error: `must be a number of ${what}` }).positive("must be more than 0").max(max, `must be at most ${max} ${what}`).optional());
/** A percentage: a number 0–100, never a word. */
export const percentage = z.preprocess(
  numberFromForm,
  z
    .number({ error: (i) => (i.input === undefined ? "is required: estimate it as a percentage" : "must be a percentage (0–100), not a word: estimate the share of the area") })
    .min(0, "must be 0–100 %")
    .max(100, "must be 0–100 %"),
);
const frame = z.preprocess(numberFromForm, wholeNumber("a frame number").min(-50).max(1000));
const isoDate = z.string({ error: "is required" }).regex(/^\d{4}-\d{2}-\d{2}$/, "must be a date like 2026-03-14").refine((d) => !Number.isNaN(Date.parse(d)), "is not a calendar date");
const name = z.string().trim().min(2, "needs a name").max(80);

export const ZInspectionStart = z.object({
  id: z.uuid().optional(),
  tankId: z.uuid({ error: "choose the tank" }),
  inspectedOn: isoDate,
  placeKind: z.enum(PLACE_KINDS, { error: "say where the ship was" }),
  place: z.string({ error: "is required" }).trim().min(2, "name the port or position").max(120),
  team: z.preprocess((v) => (typeof v === "string" ? v.split(/[,;\n]/) : v), z.array(z.string().trim()).transform((a) => a.filter(Boolean)).pipe(z.array(name).min(1, "name at least one member of the team").max(12))),
});
export type TInspectionStart = z.infer<typeof ZInspectionStart>;

export const ZHeaderInput = ZInspectionStart.omit({ id: true, tankId: true });

export const ZEntryRecordInput = z.object({
  permitRef: optionalText(60),
  ruleSet: z.enum(ATMOSPHERE_RULE_SETS, { error: "choose the rule set" }),
  standbyPerson: optionalText(80),
  ventilation: optionalText(200),
  rescueEquipmentReady: z.boolean().optional(),
  communicationsTested: z.boolean().optional(),
});
export type TEntryRecordInput = z.infer<typeof ZEntryRecordInput>;

export const ZReadingInput = z.object({
  id: z.uuid(),
  testedAt: z.iso.datetime({ offset: true, error: "must be a date and time" }),
  oxygenPct: z.preprocess(numberFromForm, z.number({ error: "is required: % by volume" }).min(0).max(100, "must be 0–100 %")),
  flammableLflPct: z.preprocess(numberFromForm, z.number({ error: "is required: % of the lower flammable limit" }).min(0).max(100, "must be 0–100 % LFL")),
  h2sPpm: z.preprocess(numberFromForm, z.number({ error: "is required: ppm" }).min(0).max(1000, "must be at most 1000 ppm")),
  coPpm: z.preprocess(numberFromForm, z.number({ error: "is required: ppm" }).min(0).max(2000, "must be at most 2000 ppm")),
  co2Pct: z.preprocess(numberFromForm, z.number({ error: "must be % by volume" }).min(0).max(100).optional()),
  measuredBy: name,
  instrument: optionalText(80),
});
export type TReadingInput = z.infer<typeof ZReadingInput>;

// ---------------------------------------------------------------- findings

const mm = (max = 100_000) => optionalPositive("mm", max);

export const ZRepair = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("insert_plate"), lengthMm: positive("mm", 20_000), widthMm: positive("mm", 10_000), thicknessMm: positive("mm", 100), pieces: z.preprocess(numberFromForm, wholeNumber("a count").min(1, "must be at least 1").max(500)) }),
  z.object({
    kind: z.literal("bracket_renewal"),
    shape: z.enum(["triangular", "rectangular"], { error: "say whether the bracket is triangular or rectangular" }),
    sideAMm: mm(5000), sideBMm: mm(5000), sideCMm: mm(7000), lengthMm: mm(5000), widthMm: mm(5000),
    thicknessMm: positive("mm", 100),
    pieces: z.preprocess(numberFromForm, wholeNumber("a count").min(1, "must be at least 1").max(500)),
  }),
  z.object({
    kind: z.literal("profile_renewal"),
    lengthMm: positive("mm", 30_000),
    kgPerM: optionalPositive("kg/m", 1000),
    webHeightMm: mm(2000), webThicknessMm: mm(100), flangeWidthMm: mm(1000), flangeThicknessMm: mm(100),
    pieces: z.preprocess(numberFromForm, wholeNumber("a count").min(1, "must be at least 1").max(500)),
  }),
  z.object({ kind: z.literal("fairing"), lengthMm: positive("mm", 20_000), widthMm: positive("mm", 10_000) }),
  z.object({ kind: z.literal("coating_touch_up"), areaM2: positive("m²", 10_000) }),
  z.object({ kind: z.literal("monitor_only") }),
], { error: "choose the proposed repair" });
export type TRepair = z.infer<typeof ZRepair>;

/** The dimensions a defect of each type needs before a yard can find and price it (common practice). */
export const REQUIRED_DIMENSIONS: Record<TFindingType, { keys: ("lengthMm" | "widthMm" | "depthMm" | "pitDepthMm" | "affectedLengthMm" | "asBuiltThicknessMm" | "measuredThicknessMm")[]; text: string }> = {
  crack: { keys: ["lengthMm"], text: "the crack's length" },
  dent: { keys: ["lengthMm", "widthMm", "depthMm"], text: "the dent's length, width and depth" },
  buckling: { keys: ["lengthMm", "widthMm"], text: "the length and width of the buckled area" },
  general_corrosion: { keys: ["lengthMm", "widthMm"], text: "the length and width of the corroded area" },
  pitting: { keys: ["lengthMm", "widthMm", "pitDepthMm"], text: "the extent (length and width) and the pit depth" },
  grooving: { keys: ["lengthMm", "depthMm"], text: "the groove's length and depth" },
  thickness_diminution: { keys: ["asBuiltThicknessMm", "measuredThicknessMm"], text: "the as-built and the measured thickness" },
  coating_breakdown: { keys: ["lengthMm", "widthMm"], text: "the length and width of the breakdown" },
  erosion: { keys: ["lengthMm", "widthMm"], text: "the length and width of the eroded area" },
  contact_damage: { keys: ["lengthMm", "widthMm"], text: "the length and width of the damaged area" },
  loose_fitting: { keys: [], text: "" },
  other: { keys: [], text: "" },
};

const findingFields = {
  type: z.enum(FINDING_TYPES, { error: "choose the type of defect" }),
  frameFrom: frame,
  frameTo: frame,
  platingRegion: z.preprocess(blankToUndefined, z.enum(PLATING_REGIONS, { error: "is not a known plating region" }).optional()),
  memberKind: z.enum(MEMBER_KINDS, { error: "choose the structural member" }),
  memberNumber: z.preprocess(numberFromForm, wholeNumber("a member number").min(0).max(9999).optional()),
  positionDetail: optionalText(120),
  lengthMm: mm(),
  widthMm: mm(),
  depthMm: mm(1000),
  pitDepthMm: mm(100),
  affectedLengthMm: mm(),
  asBuiltThicknessMm: mm(100),
  measuredThicknessMm: z.preprocess(numberFromForm, z.number({ error: "must be a number of mm" }).min(0).max(100).optional()),
  description: z.string({ error: "is required" }).trim().max(2000, "must be at most 2000 characters"),
  repair: ZRepair,
};

/** A finding, checked against its tank's catalogue and the vagueness rules. */
export function findingInputSchema(catalogue: TCatalogue) {
  return z.object(findingFields).superRefine((f, ctx) => {
    const place = checkMemberReference(catalogue, f);
    if (place) ctx.addIssue({ code: "custom", path: [place.path], message: place.message });
    const need = REQUIRED_DIMENSIONS[f.type];
    const missing = need.keys.filter((k) => f[k] === undefined);
    if (missing.length) {
      for (const k of missing) ctx.addIssue({ code: "custom", path: [k], message: `is required: give ${need.text}` });
    }
    const anyDimension = ["lengthMm", "widthMm", "depthMm", "pitDepthMm", "affectedLengthMm"].some((k) => f[k as keyof typeof f] !== undefined);
    if (!need.keys.length && !anyDimension && !/\d/.test(f.description)) {
      ctx.addIssue({ code: "custom", path: ["lengthMm"], message: "give at least one dimension, or the count in the description" });
    }
    if (f.asBuiltThicknessMm !== undefined && f.measuredThicknessMm !== undefined && f.measuredThicknessMm > f.asBuiltThicknessMm) {
      ctx.addIssue({ code: "custom", path: ["measuredThicknessMm"], message: "is more than the as-built thickness: check both" });
    }
    const text = checkFreeText(f.description, { location: !place, extent: missing.length === 0 && (anyDimension || need.keys.length > 0) });
    if (!text.ok) ctx.addIssue({ code: "custom", path: ["description"], message: text.message });
    const r = f.repair;
    if (r.kind === "bracket_renewal") {
      if (r.shape === "triangular") {
        for (const k of ["sideAMm", "sideBMm", "sideCMm"] as const) if (r[k] === undefined) ctx.addIssue({ code: "custom", path: ["repair", k], message: "is required: a triangular bracket is given by its three sides" });
        if (r.sideAMm && r.sideBMm && r.sideCMm && !isTriangle(r.sideAMm, r.sideBMm, r.sideCMm)) {
          ctx.addIssue({ code: "custom", path: ["repair", "sideCMm"], message: "these three sides cannot form a triangle" });
        }
      } else {
        for (const k of ["lengthMm", "widthMm"] as const) if (r[k] === undefined) ctx.addIssue({ code: "custom", path: ["repair", k], message: "is required for a rectangular bracket" });
      }
    }
    if (r.kind === "profile_renewal" && r.kgPerM === undefined && (r.webHeightMm === undefined || r.webThicknessMm === undefined)) {
      ctx.addIssue({ code: "custom", path: ["repair", "kgPerM"], message: "give the mass per metre, or the web height and thickness (and flange) of the profile" });
    }
  }, { when: (p) => typeof (p.value as { type?: unknown })?.type === "string" && typeof (p.value as { frameFrom?: unknown }).frameFrom !== "undefined" });
}
export type TFindingInput = z.infer<ReturnType<typeof findingInputSchema>>;

// ---------------------------------------------------------------- coating, anodes, sediment, not inspected, remarks

export const ZCoatingAreaInput = z.object({
  area: z.enum(COATING_AREAS, { error: "is not a known coating area" }),
  breakdownPct: percentage,
  rustedPct: percentage,
  hardScalePct: percentage,
  edgesRustedPct: z.preprocess(numberFromForm, z.number({ error: "must be a percentage (0–100)" }).min(0).max(100, "must be 0–100 %").optional()),
  location: optionalText(300),
}).superRefine((a, ctx) => {
  if (a.location) {
    const t = checkFreeText(a.location, { location: false, extent: true }, "Where");
    if (!t.ok) ctx.addIssue({ code: "custom", path: ["location"], message: t.message });
  }
});
export const ZCoatingInput = z.object({
  areas: z.array(ZCoatingAreaInput).max(COATING_AREAS.length).refine((a) => new Set(a.map((x) => x.area)).size === a.length, "each area once"),
});

export const ZAnodesInput = z
  .object({
    anodeKind: z.preprocess(blankToUndefined, z.enum(ANODE_KINDS).optional()),
    installedCount: z.preprocess(numberFromForm, wholeNumber("a count").min(0).max(2000)),
    inspectedCount: z.preprocess(numberFromForm, wholeNumber("a count").min(0).max(2000)),
    meanWastagePct: percentage,
    minWastagePct: z.preprocess(numberFromForm, z.number({ error: "must be a percentage" }).min(0).max(100).optional()),
    maxWastagePct: z.preprocess(numberFromForm, z.number({ error: "must be a percentage" }).min(0).max(100).optional()),
    toRenewCount: z.preprocess(numberFromForm, wholeNumber("a count").min(0).max(2000)),
    appearUnused: z.boolean().default(false),
    note: optionalText(500),
  })
  .superRefine((a, ctx) => {
    if (a.inspectedCount > a.installedCount) ctx.addIssue({ code: "custom", path: ["inspectedCount"], message: "cannot be more than the anodes installed" });
    if (a.toRenewCount > a.inspectedCount) ctx.addIssue({ code: "custom", path: ["toRenewCount"], message: "cannot be more than the anodes inspected" });
    if (a.minWastagePct !== undefined && a.minWastagePct > a.meanWastagePct) ctx.addIssue({ code: "custom", path: ["minWastagePct"], message: "cannot be more than the mean" });
    if (a.maxWastagePct !== undefined && a.maxWastagePct < a.meanWastagePct) ctx.addIssue({ code: "custom", path: ["maxWastagePct"], message: "cannot be less than the mean" });
  }, { when: (p) => typeof (p.value as { meanWastagePct?: unknown })?.meanWastagePct === "number" });

export function sedimentInputSchema(tank: { code: string; frameFrom: number; frameTo: number }) {
  const zone = z
    .object({
      id: z.uuid(),
      label: z.string({ error: "is required" }).trim().min(2, "name the zone, e.g. aft end near the bell mouth").max(120),
      frameFrom: z.preprocess(numberFromForm, wholeNumber("a frame number").optional()),
      frameTo: z.preprocess(numberFromForm, wholeNumber("a frame number").optional()),
      depthMm: positive("mm", 5000),
      areaM2: optionalPositive("m²", 20_000),
      lengthM: optionalPositive("m", 500),
      breadthM: optionalPositive("m", 100),
    })
    .superRefine((zn, ctx) => {
      if (zn.areaM2 === undefined && (zn.lengthM === undefined || zn.breadthM === undefined)) {
        ctx.addIssue({ code: "custom", path: ["areaM2"], message: "give the area in m², or its length and breadth in m" });
      }
      if ((zn.frameFrom === undefined) !== (zn.frameTo === undefined)) ctx.addIssue({ code: "custom", path: ["frameTo"], message: "give both frames, or neither" });
      if (zn.frameFrom !== undefined && zn.frameTo !== undefined && (zn.frameFrom > zn.frameTo || zn.frameFrom < tank.frameFrom || zn.frameTo > tank.frameTo)) {
        ctx.addIssue({ code: "custom", path: ["frameFrom"], message: `must lie inside ${tank.code} (Fr. ${tank.frameFrom}–${tank.frameTo}), aft frame first` });
      }
    });
  return z.object({ noSediment: z.boolean().default(false), zones: z.array(zone).max(50) }).refine((s) => !(s.noSediment && s.zones.length), { path: ["noSediment"], message: "cannot say 'no sediment' and list zones" });
}

export function notInspectedInputSchema(catalogue: TCatalogue) {
  const area = z
    .object({
      id: z.uuid(),
      frameFrom: frame,
      frameTo: frame,
      platingRegion: z.preprocess(blankToUndefined, z.enum(PLATING_REGIONS).optional()),
      memberKind: z.preprocess(blankToUndefined, z.enum(MEMBER_KINDS).optional()),
      memberNumber: z.preprocess(numberFromForm, wholeNumber("a member number").min(0).optional()),
      reason: z.enum(NOT_INSPECTED_REASONS, { error: "is required: say why the area could not be seen" }),
      suspected: optionalText(500),
    })
    .superRefine((a, ctx) => {
      const problem = checkMemberReference(catalogue, { frameFrom: a.frameFrom, frameTo: a.frameTo, memberKind: a.memberKind ?? "plating", platingRegion: a.platingRegion, memberNumber: a.memberNumber });
      if (problem && (a.memberKind || problem.path === "frameFrom")) ctx.addIssue({ code: "custom", path: [problem.path], message: problem.message });
    });
  return z.object({ allAreasInspected: z.boolean().default(false), areas: z.array(area).max(50) }).refine((s) => !(s.allAreasInspected && s.areas.length), { path: ["allAreasInspected"], message: "cannot say 'all inspected' and list areas not inspected" });
}

type TTiptapNode = { type: string; text?: string; content?: TTiptapNode[]; marks?: { type: string }[]; attrs?: Record<string, unknown> };
const ZTiptapNode: z.ZodType<TTiptapNode> = z.lazy(() =>
  z.object({
    type: z.string().max(40),
    text: z.string().max(20_000).optional(),
    attrs: z.record(z.string(), z.unknown()).optional(),
    marks: z.array(z.object({ type: z.string().max(40) })).max(10).optional(),
    content: z.array(ZTiptapNode).max(2000).optional(),
  }),
);
export const ZRemarksInput = z.object({
  doc: z.object({ type: z.literal("doc"), content: z.array(ZTiptapNode).max(2000).optional() }).refine((d) => JSON.stringify(d).length <= 200_000, "the remarks are too long (200 000 characters at most)"),
});

export const ZFindingsFlagInput = z.object({ noFindings: z.boolean() });
