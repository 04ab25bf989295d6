"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { formatDateTime } from "@/lib/format";
import { ENTRY_CAUTION, ENTRY_PRECAUTIONS } from "@/lib/safety/entry";
import { judgeReading, ruleSet, STOP_MESSAGE } from "@/lib/safety/atmosphere";
import { ZEntryRecordInput, ZReadingInput } from "@/lib/schemas/inspection";
import { Check, Input, PartStatus, Select } from "./inputs";
import { useSync } from "./sync";
import { partUrl, type TView } from "./types";
import { usePart } from "./use-part";

type TEntry = { permitRef: string; ruleSet: "msc581" | "a1050"; standbyPerson: string; ventilation: string; rescueEquipmentReady: boolean; communicationsTested: boolean };
const EMPTY_READING = { oxygenPct: "", flammableLflPct: "", h2sPpm: "", coPpm: "", co2Pct: "", measuredBy: "", instrument: "", testedAt: "" };

export function EntryStep({ view }: { view: TView }) {
  const id = view.inspection.id;
  const e = view.entry;
  const part = usePart<TEntry>({
    part: "entry",
    url: partUrl(id, "entry"),
    initial: {
      permitRef: e?.permitRef ?? "", ruleSet: e?.ruleSet ?? "msc581", standbyPerson: e?.standbyPerson ?? "", ventilation: e?.ventilation ?? "",
      rescueEquipmentReady: e?.rescueEquipmentReady ?? false, communicationsTested: e?.communicationsTested ?? false,
    },
    schema: ZEntryRecordInput,
    toBody: (v) => ({ ...v }),
  });
  const v = part.value;
  const set = (patch: Partial<TEntry>) => part.update({ ...v, ...patch });
  const sync = useSync();
  const [reading, setReading] = useState(EMPTY_READING);
  const [readingErrors, setReadingErrors] = useState<Record<string, string>>({});
  const rules = ruleSet(v.ruleSet);
  const pendingReadings = view.readings;
  const last = pendingReadings.at(-1);
  const lastVerdict = last ? judgeReading(last, rules) : null;

  function recordReading() {
    const body = { ...reading, id: crypto.randomUUID(), testedAt: reading.testedAt ? new Date(reading.testedAt).toISOString() : "" };
    const r = ZReadingInput.safeParse(body);
    if (!r.success) {
      const errs: Record<string, string> = {};
      for (const i of r.error.issues) errs[i.path.join(".")] ??= i.message;
      setReadingErrors(errs);
      return;
    }
    setReadingErrors({});
    sync.enqueue({ part: `reading:${body.id}`, url: `/api/v1/inspections/${id}/readings`, method: "POST", body });
    setReading({ ...EMPTY_READING, measuredBy: reading.measuredBy, instrument: reading.instrument });
  }
  const rv = (k: keyof typeof EMPTY_READING) => ({ id: `reading-${k}`, value: reading[k], onChange: (ev: React.ChangeEvent<HTMLInputElement>) => setReading({ ...reading, [k]: ev.target.value }), error: readingErrors[k] });

  return (
    <div className="space-y-5">
      <Notice tone="caution" title="Enclosed space">{ENTRY_CAUTION}</Notice>
      {lastVerdict && !lastVerdict.enter ? (
        <div role="alert" className="rounded-lg border-4 border-red-700 bg-red-50 p-4 text-red-900">
          <p className="text-xl font-bold">STOP — do not enter</p>
          <p className="mt-1">{STOP_MESSAGE}</p>
          <ul className="mt-2 list-disc pl-5 text-sm">
            {lastVerdict.failures.map((f) => <li key={f.label}>{f.label} {f.value}: must be {f.limitText}.</li>)}
          </ul>
          <p className="mt-2 text-sm">This step cannot be completed until a new test inside the limits is recorded.</p>
        </div>
      ) : null}
      <section className="grid gap-3 sm:grid-cols-2">
        <Input id="permitRef" label="Entry permit reference" value={v.permitRef} onChange={(ev) => set({ permitRef: ev.target.value })} error={part.errors.permitRef} />
        <Select id="ruleSet" label="Atmosphere limits" value={v.ruleSet} onChange={(x) => set({ ruleSet: x as TEntry["ruleSet"] })} options={[{ value: "msc581", label: ruleSet("msc581").name }, { value: "a1050", label: ruleSet("a1050").name }]} />
        <Input id="standbyPerson" label="Standby person at the entrance" value={v.standbyPerson} onChange={(ev) => set({ standbyPerson: ev.target.value })} error={part.errors.standbyPerson} />
        <Input id="ventilation" label="Ventilation" value={v.ventilation} onChange={(ev) => set({ ventilation: ev.target.value })} hint="e.g. two manholes open, portable fan on the forward manhole since 06:30" error={part.errors.ventilation} />
        <Check id="rescueEquipmentReady" label="Rescue and resuscitation equipment ready at the entrance" checked={v.rescueEquipmentReady} onChange={(x) => set({ rescueEquipmentReady: x })} />
        <Check id="communicationsTested" label="Communications agreed and tested" checked={v.communicationsTested} onChange={(x) => set({ communicationsTested: x })} />
      </section>
      <PartStatus refused={part.refused} errors={part.errors} dirty={part.dirty} />

      <section aria-labelledby="readings" className="rounded-lg border border-slate-200 bg-white p-4">
        <h3 id="readings" className="mb-1 font-semibold text-hull-900">Atmosphere tests</h3>
        <p className="mb-3 text-xs text-slate-600">Limits ({rules.source}): {rules.limits.map((l) => `${l.label} ${l.limitText}`).join("; ")}.</p>
        {pendingReadings.length ? (
          <ul className="mb-3 space-y-1 text-sm">
            {pendingReadings.map((r) => {
              const verdict = judgeReading(r, rules);
              return (
                <li key={r.id} className={verdict.enter ? "" : "font-semibold text-red-800"}>
                  {formatDateTime(new Date(r.testedAt), view.vessel.utcOffsetMinutes)} · O₂ {r.oxygenPct} % · {r.flammableLflPct} % LFL · H₂S {r.h2sPpm} ppm · CO {r.coPpm} ppm{r.co2Pct !== null ? ` · CO₂ ${r.co2Pct} %` : ""} · {r.measuredBy} — {verdict.enter ? "inside the limits" : "STOP"}
                </li>
              );
            })}
          </ul>
        ) : <p className="mb-3 text-sm text-slate-600">No test recorded yet.</p>}
        <div className="grid gap-3 sm:grid-cols-4">
          <Input label="Time of test" type="datetime-local" {...rv("testedAt")} />
          <Input label="Oxygen (% vol)" inputMode="decimal" {...rv("oxygenPct")} />
          <Input label="Flammable (% LFL)" inputMode="decimal" {...rv("flammableLflPct")} />
          <Input label="H₂S (ppm)" inputMode="decimal" {...rv("h2sPpm")} />
          <Input label="CO (ppm)" inputMode="decimal" {...rv("coPpm")} />
          <Input label="CO₂ (% vol, optional)" inputMode="decimal" {...rv("co2Pct")} />
          <Input label="Measured by" {...rv("measuredBy")} />
          <Input label="Instrument (optional)" {...rv("instrument")} />
        </div>
        <Button type="button" variant="secondary" className="mt-3" onClick={recordReading}>Record this test</Button>
      </section>

      <details className="rounded-lg border border-slate-200 bg-white p-4 text-sm">
        <summary className="cursor-pointer font-semibold">Precautions before entry</summary>
        <ul className="mt-2 list-disc pl-5">{ENTRY_PRECAUTIONS.map((p) => <li key={p}>{p}</li>)}</ul>
      </details>
    </div>
  );
}
