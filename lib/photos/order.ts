// The order and completeness of an inspection's photos: pure rules shared by the
// gallery, the review step and (later) the report.
import { spanInside } from "@/lib/structure/frames";
import type { TFindingType, TPhotoStatus } from "@/lib/vocabulary";

export type TOrderedPhoto = { id: string; kind: "overview" | "close_up"; overviewPhotoId: string | null; sortOrder: number; frameFrom: number | null; frameTo: number | null };

/**
 * The report order: each overview followed by its close-ups, overviews in the
 * officer's order, close-ups in theirs under their overview. Photos without a
 * caption yet come last, so nothing silently disappears.
 */
export function reportOrder<T extends TOrderedPhoto>(photos: readonly T[]): T[] {
  const bySort = [...photos].sort((a, b) => a.sortOrder - b.sortOrder || a.id.localeCompare(b.id));
  const overviews = bySort.filter((p) => p.kind === "overview");
  const placed = new Set<string>();
  const out: T[] = [];
  for (const o of overviews) {
    out.push(o);
    placed.add(o.id);
    for (const c of bySort) if (c.kind === "close_up" && c.overviewPhotoId === o.id) {
      out.push(c);
      placed.add(c.id);
    }
  }
  for (const p of bySort) if (!placed.has(p.id)) out.push(p);
  return out;
}

/** The overviews a close-up of these frames may name: those whose frames enclose them. */
export function overviewCandidates<T extends TOrderedPhoto>(photos: readonly T[], span: { frameFrom: number; frameTo: number }, selfId?: string): T[] {
  return photos.filter(
    (p) => p.kind === "overview" && p.id !== selfId && p.frameFrom !== null && p.frameTo !== null && spanInside(span, { frameFrom: p.frameFrom, frameTo: p.frameTo }),
  );
}

/**
 * Findings of structural damage or wastage that a yard must see before it prices
 * the repair: each needs at least one close-up (common practice). A local
 * coating breakdown is shown by the coating percentages and may go without.
 */
export const FINDING_TYPES_NEEDING_CLOSE_UP: readonly TFindingType[] = [
  "crack", "dent", "buckling", "general_corrosion", "pitting", "grooving", "thickness_diminution", "erosion", "contact_damage", "loose_fitting", "other",
];

export type TPhotoBlockerInput = {
  photos: { id: string; status: TPhotoStatus; caption: string | null; kind: "overview" | "close_up"; findingId: string | null; fileLabel: string | null }[];
  findings: { id: string; number: number; type: TFindingType }[];
};

export function photoProblems(i: TPhotoBlockerInput): { field: string; message: string }[] {
  const out: { field: string; message: string }[] = [];
  const busy = i.photos.filter((p) => p.status === "awaiting_upload" || p.status === "processing").length;
  if (busy) out.push({ field: "photos", message: `Photos: ${busy} photo${busy > 1 ? "s are" : " is"} still uploading or being processed.` });
  for (const p of i.photos.filter((x) => x.status === "rejected")) out.push({ field: `photo-${p.id}`, message: `Photos: ${p.fileLabel ?? "a photo"} could not be processed; delete it and upload it again.` });
  const uncaptioned = i.photos.filter((p) => p.status === "ready" && !p.caption);
  if (uncaptioned.length) out.push({ field: `photo-${uncaptioned[0]!.id}`, message: `Photos: ${uncaptioned.length} photo${uncaptioned.length > 1 ? "s have" : " has"} no caption (frames, member and what it shows).` });
  const shown = new Set(i.photos.filter((p) => p.kind === "close_up" && p.caption && p.findingId).map((p) => p.findingId));
  for (const f of i.findings) {
    if (FINDING_TYPES_NEEDING_CLOSE_UP.includes(f.type) && !shown.has(f.id)) {
      out.push({ field: `finding-photo-${f.id}`, message: `Photos: finding ${f.number} needs at least one close-up photo that names it.` });
    }
  }
  return out;
}
