// The pre-entry brief of a tank: everything the officer needs before going in,
// as plain data for the page and the PDF.
import { ENTRY_CAUTION, ENTRY_PRECAUTIONS } from "@/lib/safety/entry";
import {
  FINDING_TYPE_LABELS,
  MEMBER_KIND_LABELS,
  PLATING_REGION_LABELS,
  TANK_KIND_LABELS,
  TANK_SIDE_LABELS,
  type TMemberKind,
  type TPlatingRegion,
  type TTankKind,
  type TTankSide,
  type TFindingType,
} from "@/lib/vocabulary";
import { describeMember, landmarkFrames, type TCatalogue } from "./catalogue";
import { areasOfConcern, type TChosenConcern } from "./concerns";
import { formatFrames } from "./frames";
import { deriveTankPosition, type TTankPosition, type TVesselFrames } from "./position";

export type TBriefInput = {
  company: string;
  vessel: TVesselFrames & { name: string; imoNumber: string; vesselType: string };
  tank: {
    code: string; name: string; side: TTankSide; kind: TTankKind; frameFrom: number; frameTo: number; bottomAreaM2: number | null;
    heatedBoundary: string | null; atWaterline: boolean; atCollisionBulkhead: boolean; note: string | null;
  };
  catalogue: TCatalogue;
  previous: {
    inspectedOn: string;
    revision: number;
    findings: { number: number; type: TFindingType; frameFrom: number; frameTo: number; memberKind: TMemberKind; platingRegion: TPlatingRegion | null; memberNumber: number | null; positionDetail: string | null; description: string }[];
  } | null;
  preparedAt: string;
};

export type TBrief = {
  title: string;
  particulars: [string, string][];
  position: TTankPosition;
  members: string[];
  specialFrames: string[];
  landmarks: { frame: number; label: string }[];
  concerns: TChosenConcern[];
  lookAgain: { number: number; what: string; where: string; lookAt: string }[];
  previousLabel: string;
  precautions: readonly string[];
  caution: string;
};

function memberPlace(f: NonNullable<TBriefInput["previous"]>["findings"][number]): string {
  const region = f.platingRegion ? `${PLATING_REGION_LABELS[f.platingRegion]} ` : "";
  const member = MEMBER_KIND_LABELS[f.memberKind].toLowerCase();
  const number = f.memberNumber !== null ? ` ${f.memberNumber}` : "";
  return `${region}${member}${number}${f.positionDetail ? `, ${f.positionDetail}` : ""}`;
}

export function buildBrief(input: TBriefInput): TBrief {
  const { vessel, tank } = input;
  const position = deriveTankPosition(vessel, tank);
  const flags = [tank.atWaterline ? "at the waterline" : null, tank.atCollisionBulkhead ? "at or forward of the collision bulkhead" : null, tank.heatedBoundary ? `heated boundary: ${tank.heatedBoundary}` : null].filter(Boolean);
  const lookAgain = (input.previous?.findings ?? []).map((f) => {
    // A crack tends to repeat at the same connection one frame either side.
    const from = f.type === "crack" ? Math.max(tank.frameFrom, f.frameFrom - 1) : f.frameFrom;
    const to = f.type === "crack" ? Math.min(tank.frameTo, f.frameTo + 1) : f.frameTo;
    return {
      number: f.number,
      what: `${FINDING_TYPE_LABELS[f.type]}: ${f.description}`,
      where: `${formatFrames(f.frameFrom, f.frameTo)}, ${memberPlace(f)}`,
      lookAt: f.type === "crack" ? `Look again at ${formatFrames(from, to)} (the frames either side)` : `Look again at ${formatFrames(from, to)}`,
    };
  });
  return {
    title: `${tank.code} — pre-entry brief`,
    particulars: [
      ["Company", input.company],
      ["Vessel", `${vessel.name} (IMO ${vessel.imoNumber})`],
      ["Tank", `${tank.code} — ${tank.name}`],
      ["Side", TANK_SIDE_LABELS[tank.side]],
      ["Kind", TANK_KIND_LABELS[tank.kind]],
      ["Frames", formatFrames(tank.frameFrom, tank.frameTo)],
      ["Bottom area", tank.bottomAreaM2 !== null ? `${tank.bottomAreaM2} m²` : "not recorded"],
      ["Flags", flags.length ? flags.join("; ") : "none"],
      ["Prepared", input.preparedAt],
    ],
    position,
    members: input.catalogue.members.map(describeMember),
    specialFrames: input.catalogue.specialFrames.map((s) => `Fr. ${s.frame}: ${s.note}`),
    landmarks: landmarkFrames(input.catalogue),
    concerns: areasOfConcern({ kind: tank.kind, vesselType: vessel.vesselType, atWaterline: tank.atWaterline, heatedBoundary: tank.heatedBoundary, position }),
    lookAgain,
    previousLabel: input.previous ? `Open findings of the inspection of ${input.previous.inspectedOn} (revision ${input.previous.revision})` : "No countersigned inspection of this tank yet: nothing to look at again.",
    precautions: ENTRY_PRECAUTIONS,
    caution: ENTRY_CAUTION,
  };
}
