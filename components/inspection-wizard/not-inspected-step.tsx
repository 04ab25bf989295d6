"use client";

import { useMemo } from "react";
import { Button } from "@/components/ui/button";
import { notInspectedInputSchema } from "@/lib/schemas/inspection";
import { MEMBER_KIND_LABELS, MEMBER_KINDS, NOT_INSPECTED_REASON_LABELS, NOT_INSPECTED_REASONS, PLATING_REGION_LABELS, PLATING_REGIONS } from "@/lib/vocabulary";
import { Check, Input, PartStatus, Select } from "./inputs";
import { partUrl, type TView } from "./types";
import { usePart } from "./use-part";

type TArea = { id: string; frameFrom: string; frameTo: string; platingRegion: string; memberKind: string; memberNumber: string; reason: string; suspected: string };
type TState = { allAreasInspected: boolean; areas: TArea[] };
const str = (v: number | string | null) => (v === null ? "" : String(v));

export function NotInspectedStep({ view }: { view: TView }) {
  const schema = useMemo(() => notInspectedInputSchema(view.catalogue), [view.catalogue]);
  const part = usePart<TState>({
    part: "not-inspected",
    url: partUrl(view.inspection.id, "not-inspected"),
    initial: {
      allAreasInspected: view.inspection.allAreasInspected,
      areas: view.notInspected.map((a) => ({ id: a.id, frameFrom: String(a.frameFrom), frameTo: String(a.frameTo), platingRegion: str(a.platingRegion), memberKind: str(a.memberKind), memberNumber: str(a.memberNumber), reason: a.reason, suspected: str(a.suspected) })),
    },
    schema,
    toBody: (v) => ({ allAreasInspected: v.allAreasInspected, areas: v.areas.map((a) => Object.fromEntries(Object.entries(a).filter(([, x]) => x !== ""))) }),
  });
  const v = part.value;
  const setArea = (i: number, patch: Partial<TArea>) => part.update({ ...v, areas: v.areas.map((a, j) => (j === i ? { ...a, ...patch } : a)) });
  return (
    <div className="space-y-4">
      {v.areas.map((a, i) => {
        const e = (k: string) => part.errors[`areas.${i}.${k}`];
        return (
          <fieldset key={a.id} className="grid gap-3 rounded-lg border border-slate-300 bg-white p-3 sm:grid-cols-4">
            <legend className="px-1 text-sm font-semibold">Area not inspected {i + 1}</legend>
            <Input id={`${a.id}-frameFrom`} label="From frame" inputMode="numeric" value={a.frameFrom} onChange={(ev) => setArea(i, { frameFrom: ev.target.value })} error={e("frameFrom")} />
            <Input id={`${a.id}-frameTo`} label="To frame" inputMode="numeric" value={a.frameTo} onChange={(ev) => setArea(i, { frameTo: ev.target.value })} error={e("frameTo")} />
            <Select id={`${a.id}-memberKind`} label="Member" value={a.memberKind} onChange={(x) => setArea(i, { memberKind: x })} options={[{ value: "", label: "— (the whole section)" }, ...MEMBER_KINDS.map((m) => ({ value: m, label: MEMBER_KIND_LABELS[m] }))]} error={e("memberKind")} />
            <Select id={`${a.id}-platingRegion`} label="Plating region" value={a.platingRegion} onChange={(x) => setArea(i, { platingRegion: x })} options={[{ value: "", label: "—" }, ...PLATING_REGIONS.map((r) => ({ value: r, label: PLATING_REGION_LABELS[r] }))]} error={e("platingRegion")} />
            <Input id={`${a.id}-memberNumber`} label="Member number" inputMode="numeric" value={a.memberNumber} onChange={(ev) => setArea(i, { memberNumber: ev.target.value })} error={e("memberNumber")} />
            <Select id={`${a.id}-reason`} label="Why not" value={a.reason} onChange={(x) => setArea(i, { reason: x })} options={[{ value: "", label: "— choose the reason —" }, ...NOT_INSPECTED_REASONS.map((r) => ({ value: r, label: NOT_INSPECTED_REASON_LABELS[r] }))]} error={e("reason")} />
            <Input id={`${a.id}-suspected`} label="What is suspected there" value={a.suspected} onChange={(ev) => setArea(i, { suspected: ev.target.value })} error={e("suspected")} />
            <div className="flex items-end"><Button type="button" variant="danger" onClick={() => part.update({ ...v, areas: v.areas.filter((_, j) => j !== i) })}>Remove</Button></div>
          </fieldset>
        );
      })}
      <div className="flex flex-wrap items-center gap-4">
        <Button type="button" variant="secondary" onClick={() => part.update({ allAreasInspected: false, areas: [...v.areas, { id: crypto.randomUUID(), frameFrom: "", frameTo: "", platingRegion: "", memberKind: "", memberNumber: "", reason: "", suspected: "" }] })}>Add an area not inspected</Button>
        {v.areas.length === 0 ? <Check id="allAreasInspected" label="Every area of the tank was inspected" checked={v.allAreasInspected} onChange={(x) => part.update({ ...v, allAreasInspected: x })} /> : null}
      </div>
      <PartStatus refused={part.refused} errors={part.errors} dirty={part.dirty} />
    </div>
  );
}
