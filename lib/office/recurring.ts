// Findings found again: a finding of a later inspection of the same tank, at
// overlapping frames, on the same member (kind, number and plating region) and
// of the same type as a finding of an earlier inspection, is "recurring". The
// earlier finding it repeats is the latest such match. Pure; the history page
// and API call it with the tank's countersigned and superseded inspections.
import type { TFindingType, TMemberKind, TPlatingRegion } from "@/lib/vocabulary";

export type TRecurringFinding = {
  id: string;
  tankId: string;
  inspectionId: string;
  /** YYYY-MM-DD of the inspection the finding belongs to. */
  inspectedOn: string;
  type: TFindingType;
  frameFrom: number;
  frameTo: number;
  memberKind: TMemberKind;
  memberNumber: number | null;
  platingRegion: TPlatingRegion | null;
};

/** Frame ranges [a, b] and [c, d] share at least one frame. */
export const framesOverlap = (a: { frameFrom: number; frameTo: number }, b: { frameFrom: number; frameTo: number }) =>
  a.frameFrom <= b.frameTo && b.frameFrom <= a.frameTo;

export function sameDefectPlace(a: TRecurringFinding, b: TRecurringFinding): boolean {
  return (
    a.tankId === b.tankId &&
    a.type === b.type &&
    a.memberKind === b.memberKind &&
    (a.memberNumber ?? null) === (b.memberNumber ?? null) &&
    (a.platingRegion ?? null) === (b.platingRegion ?? null) &&
    framesOverlap(a, b)
  );
}

/**
 * For each finding that repeats one of an earlier inspection, the id of the
 * earlier finding (the most recent one before it). Findings of the same
 * inspection never mark each other.
 */
export function markRecurring(findings: readonly TRecurringFinding[]): Map<string, string> {
  // Only findings of the same tank, type and member can repeat each other: compare within those groups.
  const groups = new Map<string, TRecurringFinding[]>();
  for (const f of findings) {
    const key = [f.tankId, f.type, f.memberKind, f.memberNumber ?? "", f.platingRegion ?? ""].join("|");
    groups.set(key, [...(groups.get(key) ?? []), f]);
  }
  const marks = new Map<string, string>();
  for (const group of groups.values()) {
    for (const f of group) {
      let earlier: TRecurringFinding | null = null;
      for (const e of group) {
        if (e.inspectedOn >= f.inspectedOn || e.inspectionId === f.inspectionId) continue;
        if (sameDefectPlace(e, f) && (!earlier || e.inspectedOn >= earlier.inspectedOn)) earlier = e;
      }
      if (earlier) marks.set(f.id, earlier.id);
    }
  }
  return marks;
}
