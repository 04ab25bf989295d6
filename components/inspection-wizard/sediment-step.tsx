"use client";

import { useMemo } from "react";
import { Button } from "@/components/ui/button";
import { sedimentVolumeM3, removalCost } from "@/lib/calc/sediment";
import { sedimentInputSchema } from "@/lib/schemas/inspection";
import { Check, Input, PartStatus } from "./inputs";
import { partUrl, type TView } from "./types";
import { usePart } from "./use-part";

type TZone = { id: string; label: string; frameFrom: string; frameTo: string; depthMm: string; areaM2: string; lengthM: string; breadthM: string };
type TSediment = { noSediment: boolean; zones: TZone[] };
const str = (v: number | null) => (v === null ? "" : String(v));
const area = (z: TZone) => (z.areaM2 ? Number(z.areaM2) : Number(z.lengthM) * Number(z.breadthM));

export function SedimentStep({ view }: { view: TView }) {
  const schema = useMemo(() => sedimentInputSchema(view.tank), [view.tank]);
  const part = usePart<TSediment>({
    part: "sediment",
    url: partUrl(view.inspection.id, "sediment"),
    initial: {
      noSediment: view.inspection.noSediment,
      zones: view.sediment.zones.map((z) => ({ id: z.id, label: z.label, frameFrom: str(z.frameFrom), frameTo: str(z.frameTo), depthMm: String(z.depthMm), areaM2: z.lengthM && z.breadthM ? "" : String(z.areaM2), lengthM: str(z.lengthM), breadthM: str(z.breadthM) })),
    },
    schema,
    toBody: (v) => ({ noSediment: v.noSediment, zones: v.zones.map((z) => Object.fromEntries(Object.entries(z).filter(([, x]) => x !== ""))) }),
  });
  const v = part.value;
  const setZone = (i: number, patch: Partial<TZone>) => part.update({ ...v, zones: v.zones.map((z, j) => (j === i ? { ...z, ...patch } : z)) });
  const total = v.zones.reduce((s, z) => s + (Number(z.depthMm) > 0 && area(z) > 0 ? sedimentVolumeM3({ depthMm: Number(z.depthMm), areaM2: area(z) }) : 0), 0);
  const rate = view.sediment.cost;
  return (
    <div className="space-y-4">
      {v.zones.map((z, i) => {
        const e = (k: string) => part.errors[`zones.${i}.${k}`];
        const volume = Number(z.depthMm) > 0 && area(z) > 0 ? sedimentVolumeM3({ depthMm: Number(z.depthMm), areaM2: area(z) }) : null;
        return (
          <fieldset key={z.id} className="grid gap-3 rounded-lg border border-slate-300 bg-white p-3 sm:grid-cols-4">
            <legend className="px-1 text-sm font-semibold">Zone {i + 1}</legend>
            <Input id={`${z.id}-label`} label="Where" value={z.label} onChange={(ev) => setZone(i, { label: ev.target.value })} error={e("label")} hint="e.g. aft end around the bell mouth" />
            <Input id={`${z.id}-frameFrom`} label="From frame" inputMode="numeric" value={z.frameFrom} onChange={(ev) => setZone(i, { frameFrom: ev.target.value })} error={e("frameFrom")} />
            <Input id={`${z.id}-frameTo`} label="To frame" inputMode="numeric" value={z.frameTo} onChange={(ev) => setZone(i, { frameTo: ev.target.value })} error={e("frameTo")} />
            <Input id={`${z.id}-depthMm`} label="Depth (mm)" inputMode="decimal" value={z.depthMm} onChange={(ev) => setZone(i, { depthMm: ev.target.value })} error={e("depthMm")} />
            <Input id={`${z.id}-areaM2`} label="Area (m²)" inputMode="decimal" value={z.areaM2} onChange={(ev) => setZone(i, { areaM2: ev.target.value })} error={e("areaM2")} hint="or length × breadth" />
            <Input id={`${z.id}-lengthM`} label="Length (m)" inputMode="decimal" value={z.lengthM} onChange={(ev) => setZone(i, { lengthM: ev.target.value })} error={e("lengthM")} />
            <Input id={`${z.id}-breadthM`} label="Breadth (m)" inputMode="decimal" value={z.breadthM} onChange={(ev) => setZone(i, { breadthM: ev.target.value })} error={e("breadthM")} />
            <div className="flex items-end justify-between gap-2">
              <p className="text-sm">{volume !== null ? `${volume.toFixed(2)} m³` : "—"}</p>
              <Button type="button" variant="danger" onClick={() => part.update({ ...v, zones: v.zones.filter((_, j) => j !== i) })}>Remove</Button>
            </div>
          </fieldset>
        );
      })}
      <div className="flex flex-wrap items-center gap-4">
        <Button type="button" variant="secondary" onClick={() => part.update({ noSediment: false, zones: [...v.zones, { id: crypto.randomUUID(), label: "", frameFrom: "", frameTo: "", depthMm: "", areaM2: "", lengthM: "", breadthM: "" }] })}>Add a sediment zone</Button>
        {v.zones.length === 0 ? <Check id="noSediment" label="No sediment in this tank" checked={v.noSediment} onChange={(x) => part.update({ ...v, noSediment: x })} /> : null}
      </div>
      <p className="text-base">
        Total <span className="font-semibold">{total.toFixed(2)} m³</span>
        {rate ? <> · removal about {removalCost(total, { amount: rate.ratePerM3, currency: rate.currency }).amount.toLocaleString("en")} {rate.currency} at {rate.ratePerM3} {rate.currency}/m³{rate.place ? ` (${rate.place})` : ""}</> : " · no removal rate set by the office"}
      </p>
      <PartStatus refused={part.refused} errors={part.errors} dirty={part.dirty} />
    </div>
  );
}
