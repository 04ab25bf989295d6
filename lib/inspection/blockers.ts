// What still stands between an inspection and "ready to submit", each with the
// step and field to go to.
import { photoProblems, type TPhotoBlockerInput } from "@/lib/photos/order";
import { judgeReading, ruleSet, type TRuleSetId } from "@/lib/safety/atmosphere";
import { COATING_AREAS, COATING_AREA_LABELS } from "@/lib/vocabulary";

export type TStep = "entry" | "findings" | "coating" | "anodes" | "sediment" | "not-inspected" | "photos" | "remarks" | "review";
export const STEPS: { id: TStep; label: string }[] = [
  { id: "entry", label: "Entry record" },
  { id: "findings", label: "Findings" },
  { id: "coating", label: "Coating" },
  { id: "anodes", label: "Anodes" },
  { id: "sediment", label: "Sediment" },
  { id: "not-inspected", label: "Not inspected" },
  { id: "photos", label: "Photos" },
  { id: "remarks", label: "Remarks" },
  { id: "review", label: "Review" },
];

export type TBlocker = { step: TStep; field: string; message: string };

export type TBlockerInput = {
  entry: { permitRef: string | null; standbyPerson: string | null; rescueEquipmentReady: boolean | null; ruleSet: TRuleSetId } | null;
  readings: { oxygenPct: number; flammableLflPct: number; h2sPpm: number; coPpm: number; co2Pct: number | null; testedAt: string | Date }[];
  findingsCount: number;
  noFindings: boolean;
  coatingAreas: string[];
  anodes: boolean;
  sedimentZones: number;
  noSediment: boolean;
  notInspected: number;
  allAreasInspected: boolean;
  /** The photos and the findings they must show; none when left out. */
  photos?: TPhotoBlockerInput;
};

export function inspectionBlockers(i: TBlockerInput): TBlocker[] {
  const out: TBlocker[] = [];
  if (!i.entry?.permitRef) out.push({ step: "entry", field: "permitRef", message: "Entry record: the permit reference is missing." });
  if (!i.entry?.standbyPerson) out.push({ step: "entry", field: "standbyPerson", message: "Entry record: name the standby person at the entrance." });
  if (!i.entry?.rescueEquipmentReady) out.push({ step: "entry", field: "rescueEquipmentReady", message: "Entry record: confirm that rescue equipment was ready." });
  const last = [...i.readings].sort((a, b) => +new Date(a.testedAt) - +new Date(b.testedAt)).at(-1);
  if (!last) out.push({ step: "entry", field: "oxygenPct", message: "Entry record: no atmosphere test is recorded." });
  else if (!judgeReading(last, ruleSet(i.entry?.ruleSet ?? "msc581")).enter) {
    out.push({ step: "entry", field: "oxygenPct", message: "Entry record: the last atmosphere test is outside the limits; record a new test before the step is complete." });
  }
  if (i.findingsCount === 0 && !i.noFindings) out.push({ step: "findings", field: "noFindings", message: "Findings: record the findings, or confirm that there are none." });
  const missing = COATING_AREAS.filter((a) => !i.coatingAreas.includes(a));
  if (missing.length) {
    out.push({ step: "coating", field: missing[0]!, message: `Coating: ${missing.length} area${missing.length > 1 ? "s have" : " has"} no percentage (${missing.map((a) => COATING_AREA_LABELS[a]).join(", ")}).` });
  }
  if (!i.anodes) out.push({ step: "anodes", field: "meanWastagePct", message: "Anodes: record the anodes and their wastage." });
  if (i.sedimentZones === 0 && !i.noSediment) out.push({ step: "sediment", field: "noSediment", message: "Sediment: record the sediment zones, or confirm that there is none." });
  if (i.notInspected === 0 && !i.allAreasInspected) out.push({ step: "not-inspected", field: "allAreasInspected", message: "Not inspected: list the areas that could not be seen, or confirm that every area was inspected." });
  for (const p of i.photos ? photoProblems(i.photos) : []) out.push({ step: "photos", ...p });
  return out;
}
