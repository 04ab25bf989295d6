"use client";

import { Notice } from "@/components/ui/notice";
import { unusedAnodeWarning } from "@/lib/calc/anodes";
import { ZAnodesInput } from "@/lib/schemas/inspection";
import { Check, Input, PartStatus, Select } from "./inputs";
import { partUrl, type TView } from "./types";
import { usePart } from "./use-part";

type TAnodes = { anodeKind: string; installedCount: string; inspectedCount: string; meanWastagePct: string; minWastagePct: string; maxWastagePct: string; toRenewCount: string; appearUnused: boolean; note: string };
const str = (v: number | null | undefined) => (v === null || v === undefined ? "" : String(v));

export function AnodesStep({ view }: { view: TView }) {
  const a = view.anodes;
  const part = usePart<TAnodes>({
    part: "anodes",
    url: partUrl(view.inspection.id, "anodes"),
    initial: {
      anodeKind: a?.anodeKind ?? "aluminium", installedCount: str(a?.installedCount), inspectedCount: str(a?.inspectedCount), meanWastagePct: str(a?.meanWastagePct),
      minWastagePct: str(a?.minWastagePct), maxWastagePct: str(a?.maxWastagePct), toRenewCount: str(a?.toRenewCount ?? 0), appearUnused: a?.appearUnused ?? false, note: a?.note ?? "",
    },
    schema: ZAnodesInput,
    toBody: (v) => Object.fromEntries(Object.entries(v).filter(([, x]) => x !== "")),
  });
  const v = part.value;
  const set = (patch: Partial<TAnodes>) => part.update({ ...v, ...patch });
  const num = (k: keyof TAnodes, label: string, hint?: string) => (
    <Input id={`anodes-${k}`} label={label} inputMode="decimal" value={v[k] as string} onChange={(e) => set({ [k]: e.target.value })} error={part.errors[k]} hint={hint} />
  );
  const corrodes = view.findings.some((f) => ["general_corrosion", "pitting", "grooving", "thickness_diminution"].includes(f.type)) || view.coating.some((c) => c.rating.rating !== "GOOD");
  const warning = v.meanWastagePct !== "" ? unusedAnodeWarning({ meanWastagePct: Number(v.meanWastagePct), appearUnused: v.appearUnused, tankCorrodes: corrodes }) : null;
  return (
    <div className="space-y-4">
      <div className="grid gap-3 sm:grid-cols-3">
        <Select id="anodes-kind" label="Anode material" value={v.anodeKind} onChange={(x) => set({ anodeKind: x })} options={[{ value: "aluminium", label: "Aluminium" }, { value: "zinc", label: "Zinc" }, { value: "other", label: "Other" }]} />
        {num("installedCount", "Anodes installed")}
        {num("inspectedCount", "Anodes inspected")}
        {num("meanWastagePct", "Mean wastage (%)", "Estimated share of the anode mass consumed")}
        {num("minWastagePct", "Lowest wastage (%)")}
        {num("maxWastagePct", "Highest wastage (%)")}
        {num("toRenewCount", "Pieces to renew", `At or beyond the company's threshold of ${view.anodeThresholdPct} % wastage`)}
        <Input id="anodes-note" label="Note" value={v.note} onChange={(e) => set({ note: e.target.value })} error={part.errors.note} />
        <Check id="anodes-unused" label="Anodes look unused (no consumption, no deposits)" checked={v.appearUnused} onChange={(x) => set({ appearUnused: x })} />
      </div>
      {warning ? <Notice tone="caution" title="Something may be wrong">{warning}</Notice> : null}
      {view.anodeProjection ? (
        <p className="text-sm">From this tank&apos;s records the mean wastage grows by {view.anodeProjection.ratePctPerYear.toFixed(1)} % a year and reaches the {view.anodeThresholdPct} % threshold about <span className="font-semibold">{view.anodeProjection.date}</span>.</p>
      ) : (
        <p className="text-sm text-slate-600">The date the threshold is reached is projected once the tank has anode records on two dates.</p>
      )}
      <PartStatus refused={part.refused} errors={part.errors} dirty={part.dirty} />
    </div>
  );
}
