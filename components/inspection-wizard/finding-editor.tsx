"use client";

import { useMemo } from "react";
import { Button } from "@/components/ui/button";
import { roundKg } from "@/lib/calc/steel";
import { diminutionPct } from "@/lib/calc/thickness";
import { repairQuantities } from "@/lib/inspection/quantities";
import { findingInputSchema, REQUIRED_DIMENSIONS, ZRepair } from "@/lib/schemas/inspection";
import type { TCatalogue } from "@/lib/structure/catalogue";
import {
  FINDING_TYPE_LABELS,
  FINDING_TYPES,
  MEMBER_KIND_LABELS,
  MEMBER_KINDS,
  PLATING_REGION_LABELS,
  PLATING_REGIONS,
  REPAIR_KIND_LABELS,
  REPAIR_KINDS,
  type TFindingType,
} from "@/lib/vocabulary";
import { Input, PartStatus, Select } from "./inputs";
import { usePart } from "./use-part";

export type TFindingDraft = Record<string, string> & { id: string; type: string; memberKind: string; repairKind: string };

const DIMENSIONS = [
  ["lengthMm", "Length (mm)"],
  ["widthMm", "Width (mm)"],
  ["depthMm", "Depth of dent / groove (mm)"],
  ["pitDepthMm", "Pit depth (mm)"],
  ["affectedLengthMm", "Affected length of stiffener (mm)"],
  ["asBuiltThicknessMm", "As-built thickness (mm)"],
  ["measuredThicknessMm", "Measured thickness (mm)"],
] as const;

const REPAIR_FIELDS: Record<string, [string, string][]> = {
  insert_plate: [["r_lengthMm", "Insert length (mm)"], ["r_widthMm", "Insert width (mm)"], ["r_thicknessMm", "Plate thickness (mm)"], ["r_pieces", "Pieces"]],
  bracket_renewal: [["r_sideAMm", "Side a (mm)"], ["r_sideBMm", "Side b (mm)"], ["r_sideCMm", "Side c (mm)"], ["r_lengthMm", "Length (mm, rectangular)"], ["r_widthMm", "Width (mm, rectangular)"], ["r_thicknessMm", "Thickness (mm)"], ["r_pieces", "Pieces"]],
  profile_renewal: [["r_lengthMm", "Length (mm)"], ["r_kgPerM", "Mass per metre (kg/m)"], ["r_webHeightMm", "or web height (mm)"], ["r_webThicknessMm", "web thickness (mm)"], ["r_flangeWidthMm", "flange width (mm)"], ["r_flangeThicknessMm", "flange thickness (mm)"], ["r_pieces", "Pieces"]],
  fairing: [["r_lengthMm", "Length (mm)"], ["r_widthMm", "Width (mm)"]],
  coating_touch_up: [["r_areaM2", "Area (m²)"]],
  monitor_only: [],
};

/** The request body of a finding from its text fields. */
export function findingBody(d: TFindingDraft): Record<string, unknown> {
  const repair: Record<string, unknown> = { kind: d.repairKind };
  for (const [key] of REPAIR_FIELDS[d.repairKind] ?? []) if (d[key]) repair[key.slice(2)] = d[key];
  if (d.repairKind === "bracket_renewal") repair.shape = d.r_shape || "triangular";
  const body: Record<string, unknown> = { type: d.type, frameFrom: d.frameFrom, frameTo: d.frameTo || d.frameFrom, memberKind: d.memberKind, description: d.description ?? "", repair };
  for (const k of ["platingRegion", "memberNumber", "positionDetail", ...DIMENSIONS.map(([k]) => k)]) if (d[k]) body[k] = d[k];
  return body;
}

export function newFindingDraft(): TFindingDraft {
  return { id: crypto.randomUUID(), type: "crack", memberKind: "longitudinal", repairKind: "monitor_only", frameFrom: "", frameTo: "", description: "" } as TFindingDraft;
}

export function FindingEditor({ inspectionId, catalogue, initial, number, onRemove }: { inspectionId: string; catalogue: TCatalogue; initial: TFindingDraft; number: number | null; onRemove: () => void }) {
  const schema = useMemo(() => findingInputSchema(catalogue), [catalogue]);
  const part = usePart<TFindingDraft>({ part: `finding:${initial.id}`, url: `/api/v1/inspections/${inspectionId}/findings/${initial.id}`, initial, schema, toBody: findingBody });
  const d = part.value;
  const set = (k: string, v: string) => part.update({ ...d, [k]: v } as TFindingDraft);
  const field = (k: string, label: string, extra: Record<string, unknown> = {}) => (
    <Input key={k} id={`${d.id}-${k}`} label={label} value={d[k] ?? ""} onChange={(e) => set(k, e.target.value)} error={part.errors[k] ?? part.errors[k.startsWith("r_") ? `repair.${k.slice(2)}` : k]} {...extra} />
  );
  const repair = ZRepair.safeParse(findingBody(d).repair);
  const quantities = repair.success ? repairQuantities(repair.data) : null;
  const needed = REQUIRED_DIMENSIONS[d.type as TFindingType]?.keys ?? [];
  const asBuilt = Number(d.asBuiltThicknessMm);
  const measured = Number(d.measuredThicknessMm);

  return (
    <article aria-label={`Finding ${number ?? "(new)"}`} className="space-y-3 rounded-lg border border-slate-300 bg-white p-4">
      <header className="flex items-center justify-between">
        <h3 className="font-semibold text-hull-900">Finding {number ? `#${number}` : "(not saved yet)"}</h3>
        <Button type="button" variant="danger" onClick={onRemove}>Remove</Button>
      </header>
      <div className="grid gap-3 sm:grid-cols-3">
        <Select id={`${d.id}-type`} label="Type" value={d.type} onChange={(v) => set("type", v)} options={FINDING_TYPES.map((t) => ({ value: t, label: FINDING_TYPE_LABELS[t] }))} error={part.errors.type} />
        {field("frameFrom", "From frame", { inputMode: "numeric", hint: `${catalogue.tank.code}: Fr. ${catalogue.tank.frameFrom}–${catalogue.tank.frameTo}` })}
        {field("frameTo", "To frame", { inputMode: "numeric", hint: "Same as from, for one frame" })}
        <Select id={`${d.id}-memberKind`} label="Member" value={d.memberKind} onChange={(v) => set("memberKind", v)} options={MEMBER_KINDS.map((m) => ({ value: m, label: MEMBER_KIND_LABELS[m] }))} error={part.errors.memberKind} />
        <Select id={`${d.id}-platingRegion`} label="Plating region" value={d.platingRegion ?? ""} onChange={(v) => set("platingRegion", v)} options={[{ value: "", label: "—" }, ...PLATING_REGIONS.map((r) => ({ value: r, label: PLATING_REGION_LABELS[r] }))]} error={part.errors.platingRegion} />
        {field("memberNumber", "Member number", { inputMode: "numeric", hint: "Longitudinal, stringer or girder number; the frame of a web frame" })}
        {field("positionDetail", "Position detail", { hint: 'e.g. "upper bracket toe", "in way of manhole"' })}
      </div>
      <fieldset className="grid gap-3 sm:grid-cols-4">
        <legend className="mb-1 text-sm font-semibold">Dimensions {needed.length ? `(needed: ${REQUIRED_DIMENSIONS[d.type as TFindingType].text})` : ""}</legend>
        {DIMENSIONS.map(([k, label]) => field(k, label, { inputMode: "decimal" }))}
      </fieldset>
      {asBuilt > 0 && measured > 0 ? <p className="text-sm">Diminution {diminutionPct(asBuilt, measured).toFixed(1)} % of the as-built thickness.</p> : null}
      <div>
        <label htmlFor={`${d.id}-description`} className="block text-sm font-semibold">Description</label>
        <textarea id={`${d.id}-description`} value={d.description ?? ""} onChange={(e) => set("description", e.target.value)} rows={2} aria-invalid={part.errors.description ? true : undefined} className="mt-1 block w-full rounded-md border border-slate-300 px-2 py-1.5 aria-[invalid=true]:border-red-600" />
        {part.errors.description ? <p role="alert" className="mt-1 text-sm text-red-700">{part.errors.description}</p> : null}
      </div>
      <fieldset className="grid gap-3 sm:grid-cols-4">
        <legend className="mb-1 text-sm font-semibold">Proposed repair</legend>
        <Select id={`${d.id}-repairKind`} label="Repair" value={d.repairKind} onChange={(v) => set("repairKind", v)} options={REPAIR_KINDS.map((r) => ({ value: r, label: REPAIR_KIND_LABELS[r] }))} />
        {d.repairKind === "bracket_renewal" ? (
          <Select id={`${d.id}-r_shape`} label="Bracket shape" value={d.r_shape || "triangular"} onChange={(v) => set("r_shape", v)} options={[{ value: "triangular", label: "Triangular (three sides)" }, { value: "rectangular", label: "Rectangular" }]} />
        ) : null}
        {(REPAIR_FIELDS[d.repairKind] ?? []).map(([k, label]) => field(k, label, { inputMode: "decimal" }))}
      </fieldset>
      <p className="text-sm" aria-live="polite">
        {quantities?.steelWeightKg ? <><span className="font-semibold">Steel weight: {roundKg(quantities.steelWeightKg)} kg</span> (7 850 kg/m³). </> : null}
        {quantities?.coatingRepairM2 ? <>Coating repair: {quantities.coatingRepairM2.toFixed(2)} m².</> : null}
      </p>
      <PartStatus refused={part.refused} errors={part.errors} dirty={part.dirty} />
    </article>
  );
}
