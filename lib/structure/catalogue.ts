// A tank's member catalogue: the one module that answers "is this member,
// number or frame inside this tank?" for every form and route.
import { regionsOfKind } from "@/lib/diagram/tank-diagram";
import { PLATING_REGION_LABELS, TANK_KIND_LABELS, type TMemberKind, type TPlatingRegion, type TTankKind } from "@/lib/vocabulary";
import { formatFrames, frameRangeProblem } from "./frames";

export type TCatalogueMember = {
  kind: TMemberKind;
  platingRegion: TPlatingRegion | null;
  numberFrom: number | null;
  numberTo: number | null;
  numbering: "from_top" | "from_bottom" | null;
  frames: number[] | null;
  hasCentreGirder: boolean | null;
};
export type TCatalogue = {
  tank: { code: string; frameFrom: number; frameTo: number };
  members: TCatalogueMember[];
  specialFrames: { frame: number; note: string }[];
};

const rangesOverlap = (a: TCatalogueMember, b: TCatalogueMember) =>
  a.numberFrom !== null && a.numberTo !== null && b.numberFrom !== null && b.numberTo !== null && a.numberFrom <= b.numberTo && b.numberFrom <= a.numberTo;

export function describeMember(m: TCatalogueMember): string {
  const range = m.numberFrom === m.numberTo ? `${m.numberFrom}` : `${m.numberFrom}–${m.numberTo}`;
  switch (m.kind) {
    case "longitudinal":
      return `${m.platingRegion ? PLATING_REGION_LABELS[m.platingRegion] : "Unassigned"} longitudinals ${range}`;
    case "stringer_deck":
      return `Stringer decks ${range}, numbered ${m.numbering === "from_bottom" ? "from the bottom" : "from the top"}`;
    case "bottom_girder":
      return `Bottom girders ${range}${m.hasCentreGirder ? " and the centre girder" : ""}`;
    case "web_frame":
      return `Web frames at Fr. ${(m.frames ?? []).join(", ")}`;
    default:
      return m.kind;
  }
}

/** Why a new catalogue entry clashes with the existing ones, or null. */
export function memberConflict(existing: readonly TCatalogueMember[], candidate: TCatalogueMember): string | null {
  for (const m of existing) {
    if (m.kind !== candidate.kind) continue;
    if (m.kind === "web_frame") {
      const shared = (candidate.frames ?? []).filter((f) => (m.frames ?? []).includes(f));
      if (shared.length) return `Web frames at Fr. ${shared.join(", ")} are already in the catalogue.`;
      continue;
    }
    if (m.kind === "longitudinal" && m.platingRegion !== candidate.platingRegion) continue;
    if (rangesOverlap(m, candidate)) return `${describeMember(candidate)} overlaps the existing ${describeMember(m).toLowerCase()}.`;
  }
  return null;
}

export type TMemberReference = {
  frameFrom: number;
  frameTo: number;
  memberKind: TMemberKind;
  platingRegion?: TPlatingRegion | null;
  memberNumber?: number | null;
};
export type TReferenceProblem = { path: "frameFrom" | "memberKind" | "platingRegion" | "memberNumber"; message: string };

/** Checks a place named in a finding, photo caption or not-inspected area against the tank's catalogue. */
export function checkMemberReference(cat: TCatalogue, ref: TMemberReference): TReferenceProblem | null {
  const frames = frameRangeProblem({ from: ref.frameFrom, to: ref.frameTo }, cat.tank);
  if (frames) return { path: "frameFrom", message: frames };
  const n = ref.memberNumber ?? null;
  const sets = cat.members.filter((m) => m.kind === ref.memberKind);
  switch (ref.memberKind) {
    case "longitudinal": {
      if (!ref.platingRegion) return { path: "platingRegion", message: "say which plating the longitudinal stiffens" };
      const regionSets = sets.filter((m) => m.platingRegion === ref.platingRegion);
      const region = PLATING_REGION_LABELS[ref.platingRegion].toLowerCase();
      if (!regionSets.length) return { path: "platingRegion", message: `${cat.tank.code} has no ${region} longitudinals in its catalogue` };
      if (n === null) return { path: "memberNumber", message: "give the longitudinal's number" };
      if (!regionSets.some((m) => m.numberFrom !== null && m.numberTo !== null && n >= m.numberFrom && n <= m.numberTo)) {
        const ranges = regionSets.map((m) => `${m.numberFrom}–${m.numberTo}`).join(", ");
        return { path: "memberNumber", message: `${cat.tank.code} has ${region} longitudinals ${ranges}, not ${n}` };
      }
      return null;
    }
    case "stringer_deck":
    case "bottom_girder": {
      const what = ref.memberKind === "stringer_deck" ? "stringer decks" : "bottom girders";
      if (!sets.length) return { path: "memberKind", message: `${cat.tank.code} has no ${what} in its catalogue` };
      if (n === null) return { path: "memberNumber", message: `give the number of the ${what.slice(0, -1)}` };
      const centre = ref.memberKind === "bottom_girder" && n === 0 && sets.some((m) => m.hasCentreGirder);
      const inside = sets.some((m) => m.numberFrom !== null && m.numberTo !== null && n >= m.numberFrom && n <= m.numberTo);
      if (!centre && !inside) {
        const ranges = sets.map((m) => `${m.numberFrom}–${m.numberTo}`).join(", ");
        return { path: "memberNumber", message: `${cat.tank.code} has ${what} ${ranges}${ref.memberKind === "bottom_girder" && sets.some((m) => m.hasCentreGirder) ? " (0 = centre girder)" : ""}, not ${n}` };
      }
      return null;
    }
    case "web_frame": {
      const webs = sets.flatMap((m) => m.frames ?? []);
      if (!webs.length) return { path: "memberKind", message: `${cat.tank.code} has no web frames in its catalogue` };
      const at = n ?? (ref.frameFrom === ref.frameTo ? ref.frameFrom : null);
      if (at === null) return { path: "memberNumber", message: "give the frame of the web frame" };
      if (!webs.includes(at)) return { path: "memberNumber", message: `${cat.tank.code} has web frames at Fr. ${webs.join(", ")}, not at Fr. ${at}` };
      return null;
    }
    default:
      return null;
  }
}

/** The landmark frames of a tank for its diagram and brief: web frames and special frames. */
export function landmarkFrames(cat: TCatalogue): { frame: number; label: string }[] {
  const marks = new Map<number, string>();
  for (const m of cat.members) if (m.kind === "web_frame") for (const f of m.frames ?? []) marks.set(f, "web");
  for (const s of cat.specialFrames) marks.set(s.frame, "special");
  return [...marks].sort((a, b) => a[0] - b[0]).map(([frame, label]) => ({ frame, label: `${formatFrames(frame, frame)}${label === "special" ? " *" : ""}` }));
}

const PEAKS: readonly TTankKind[] = ["fore_peak", "aft_peak"];
const WITH_SIDE: readonly TTankKind[] = ["side", "double_bottom_side", "hopper_side", "double_bottom_hopper_side", ...PEAKS];
const WITH_DOUBLE_BOTTOM: readonly TTankKind[] = ["double_bottom", "double_bottom_hopper", "double_bottom_side", "double_bottom_hopper_side", ...PEAKS];

/**
 * Whether a member can belong to a tank of this kind (common practice): stringer
 * decks stand in side tanks and peaks, bottom girders in double bottoms and
 * peaks, longitudinals stiffen the plating regions the kind has.
 */
export function memberMisfit(kind: TTankKind, m: { kind: TMemberKind; platingRegion?: TPlatingRegion | null }): { path: string; message: string } | null {
  const tankKind = TANK_KIND_LABELS[kind].toLowerCase();
  if (m.kind === "stringer_deck" && !WITH_SIDE.includes(kind)) return { path: "kind", message: `A ${tankKind} tank has no stringer decks.` };
  if (m.kind === "bottom_girder" && !WITH_DOUBLE_BOTTOM.includes(kind)) return { path: "kind", message: `A ${tankKind} tank has no bottom girders.` };
  if (m.kind === "longitudinal" && m.platingRegion && !PEAKS.includes(kind) && m.platingRegion !== "transverse_bulkhead" && !regionsOfKind(kind).includes(m.platingRegion)) {
    return { path: "platingRegion", message: `A ${tankKind} tank has no ${PLATING_REGION_LABELS[m.platingRegion].toLowerCase()} plating; its regions are ${regionsOfKind(kind).map((r) => PLATING_REGION_LABELS[r].toLowerCase()).join(", ")}.` };
  }
  return null;
}
