// The signed report as data. `TReportSource` is what the inspection holds and
// what lib/ computed from it (ratings, weights, verdicts); `TReportData` is the
// same laid out for reading, with every text the PDF and the HTML preview show,
// so both say the same thing and neither template computes anything.
import type { TCoatingRating, TRating, TTwentyPercentRule } from "@/lib/calc/coating";
import type { TDiagram } from "@/lib/diagram/tank-diagram";
import type { TAtmosphereVerdict } from "@/lib/safety/atmosphere";
import type {
  TCoatingArea,
  TFindingType,
  TInspectionStatus,
  TMemberKind,
  TNotInspectedReason,
  TPhotoKind,
  TPlaceKind,
  TPlatingRegion,
  TRepairKind,
  TTankKind,
  TTankSide,
} from "@/lib/vocabulary";
import type { TReportSummary } from "./summary";

/** Remarks as the editor stores them (Tiptap JSON). */
export type TRichNode = { type: string; text?: string; content?: TRichNode[]; marks?: { type: string }[]; attrs?: Record<string, unknown> };
export type TRichDoc = { type: "doc"; content?: TRichNode[] };

type TMember = { platingRegion: TPlatingRegion | null; memberKind: TMemberKind | null; memberNumber: number | null };

export type TReportSourceFinding = TMember & {
  id: string;
  number: number;
  type: TFindingType;
  frameFrom: number;
  frameTo: number;
  memberKind: TMemberKind;
  positionDetail: string | null;
  lengthMm: number | null;
  widthMm: number | null;
  depthMm: number | null;
  pitDepthMm: number | null;
  affectedLengthMm: number | null;
  asBuiltThicknessMm: number | null;
  measuredThicknessMm: number | null;
  description: string;
  repairKind: TRepairKind;
  /** The repair's dimensions, shaped by its kind (lib/schemas/inspection.ts ZRepair). */
  repair: unknown;
  steelWeightKg: number | null;
  coatingRepairM2: number | null;
};

export type TReportSourcePhoto = TMember & {
  id: string;
  kind: TPhotoKind;
  frameFrom: number | null;
  frameTo: number | null;
  findingId: string | null;
  overviewPhotoId: string | null;
  caption: string | null;
  width: number | null;
  height: number | null;
  /** Where the HTML preview loads the report variant from. */
  src: string;
  /** The report variant's JPEG bytes, for the PDF; null when only the preview is wanted. */
  jpeg: Uint8Array | null;
};

export type TReportSourceSignature = {
  kind: "officer" | "master";
  signerName: string;
  signerRank: string | null;
  typedSignature: string | null;
  signedAt: Date | string;
  /** The drawn signature (PNG bytes), if one was drawn. */
  drawnPng: Uint8Array | null;
};

export type TReportSource = {
  company: string;
  generatedAt: Date;
  inspection: {
    id: string;
    status: TInspectionStatus;
    revision: number;
    inspectedOn: string;
    placeKind: TPlaceKind;
    place: string;
    team: string[];
    remarks: unknown;
    noFindings: boolean;
    noSediment: boolean;
    allAreasInspected: boolean;
  };
  vessel: {
    name: string;
    imoNumber: string;
    utcOffsetMinutes: number | null;
    frameFirst: number;
    frameLast: number;
    midshipFromFrame: number | null;
    midshipToFrame: number | null;
    engineRoomFwdBulkheadFrame: number | null;
    collisionBulkheadFrame: number | null;
  };
  tank: { code: string; name: string; kind: TTankKind; side: TTankSide; frameFrom: number; frameTo: number; bottomAreaM2: number | null };
  /** Web frames and special frames of the tank, ticked on the side profile. */
  landmarks: { frame: number; label: string }[];
  entry: { permitRef: string | null; standbyPerson: string | null; ventilation: string | null; rescueEquipmentReady: boolean | null; communicationsTested: boolean | null } | null;
  ruleSet: { name: string; source: string; limits: { label: string; limitText: string }[] };
  readings: {
    testedAt: Date | string;
    oxygenPct: number;
    flammableLflPct: number;
    h2sPpm: number;
    coPpm: number;
    co2Pct: number | null;
    measuredBy: string;
    instrument: string | null;
    verdict: TAtmosphereVerdict;
  }[];
  findings: TReportSourceFinding[];
  coating: { area: TCoatingArea; breakdownPct: number; rustedPct: number; hardScalePct: number; edgesRustedPct: number | null; location: string | null; rating: TCoatingRating; rustGrade: number }[];
  tankRating: { rating: TRating; worstArea: string; decidedBy: string } | null;
  twentyPercentRule: TTwentyPercentRule;
  anodes: {
    anodeKind: string | null;
    installedCount: number;
    inspectedCount: number;
    meanWastagePct: number;
    minWastagePct: number | null;
    maxWastagePct: number | null;
    toRenewCount: number;
    appearUnused: boolean;
    note: string | null;
  } | null;
  anodeProjection: { date: string; ratePctPerYear: number } | null;
  anodeThresholdPct: number;
  anodeWarning: string | null;
  sediment: {
    zones: { label: string; frameFrom: number | null; frameTo: number | null; depthMm: number; areaM2: number; volumeM3: number }[];
    /** The company's removal rate, if one is set. */
    rate: { amount: number; currency: string; place: string | null } | null;
  };
  notInspected: (TMember & { frameFrom: number; frameTo: number; reason: TNotInspectedReason; suspected: string | null })[];
  /** In report order: each overview followed by its close-ups. */
  photos: TReportSourcePhoto[];
  signatures: TReportSourceSignature[];
  /** What still stands between the inspection and signing (shown on a draft only). */
  blockers: { message: string }[];
};

export type TKeyValue = [label: string, value: string];

export type TReportFinding = {
  id: string;
  number: number;
  type: string;
  frames: string;
  member: string;
  description: string;
  dimensions: string;
  repair: string;
  weight: string;
};

export type TReportPhoto = {
  id: string;
  /** 1-based position in the report. */
  number: number;
  kind: TPhotoKind;
  /** "Photo 3 · Close-up · Fr. 112–114 · Longitudinal 7, inner bottom · Finding 4" */
  heading: string;
  caption: string;
  src: string;
  jpeg: Uint8Array | null;
  width: number | null;
  height: number | null;
};

export type TReportSignature = {
  role: string;
  signed: boolean;
  name: string;
  rank: string;
  signedAt: string;
  typedSignature: string | null;
  drawnPng: Uint8Array | null;
};

export type TReportData = {
  inspectionId: string;
  title: string;
  company: string;
  status: TInspectionStatus;
  statusLabel: string;
  revision: number;
  /** "DRAFT — not countersigned" until the master countersigns; null after. */
  draftMark: string | null;
  generatedAt: string;
  fileName: string;
  vessel: { name: string; imoNumber: string };
  tank: { code: string; name: string; label: string };
  /** "MV Example · 3P WBT Port · Rev. 2": the running header. */
  running: string;
  cover: TKeyValue[];
  summary: TReportSummary;
  summaryRows: TKeyValue[];
  diagrams: { profile: TDiagram; section: TDiagram };
  entry: { rows: TKeyValue[]; limits: TKeyValue[] } | null;
  readings: { testedAt: string; oxygen: string; flammable: string; h2s: string; co: string; co2: string; measuredBy: string; verdict: string; enter: boolean }[];
  findings: TReportFinding[];
  findingsNote: string | null;
  findingsTotal: string;
  coating: { area: string; breakdown: string; rusted: string; hardScale: string; edges: string; rustGrade: string; rating: TRating; decidedBy: string }[];
  coatingNote: string;
  anodes: { rows: TKeyValue[]; warning: string | null } | null;
  sediment: { zones: { label: string; frames: string; depth: string; area: string; volume: string }[]; total: string; cost: string | null; note: string | null };
  notInspected: { frames: string; member: string; reason: string; suspected: string }[];
  notInspectedNote: string | null;
  remarks: TRichDoc | null;
  photos: TReportPhoto[];
  /** Photos per page (indexes into `photos`), two to four a page, overviews with their close-ups. */
  photoPages: number[][];
  signatures: TReportSignature[];
  blockers: string[];
};
