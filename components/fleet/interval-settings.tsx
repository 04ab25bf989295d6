"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { monthsFromBox, vesselIntervalsSource, vesselsWithOwnIntervals } from "@/lib/office/interval-wording";
import { ZIntervalsInput } from "@/lib/schemas/intervals";

type TRow = { vesselId: string | null; vesselName: string | null; defaultMonths: number; belowGoodMonths: number };

/**
 * The office sets the inspection intervals: company-wide, or for one vessel. Choosing a vessel loads its own
 * intervals, else the company's, and says which. A refusal keeps what was typed.
 */
export function IntervalSettings({ company, vessels, overrides }: { company: TRow | null; vessels: { id: string; name: string }[]; overrides: TRow[] }) {
  const router = useRouter();
  const valuesFor = (vesselId: string) => {
    const row = (vesselId ? overrides.find((o) => o.vesselId === vesselId) : null) ?? company;
    return { vesselId, defaultMonths: String(row?.defaultMonths ?? 12), belowGoodMonths: String(row?.belowGoodMonths ?? 6) };
  };
  const [form, setForm] = useState(() => valuesFor(""));
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);

  async function save(e: React.FormEvent) {
    e.preventDefault();
    const body = { vesselId: form.vesselId || null, defaultMonths: monthsFromBox(form.defaultMonths), belowGoodMonths: monthsFromBox(form.belowGoodMonths) };
    const checked = ZIntervalsInput.safeParse(body);
    if (!checked.success) return setMessage({ tone: "error", text: checked.error.issues.map((i) => `${i.path.join(".") === "belowGoodMonths" ? "Below GOOD" : "Interval"} ${i.message}`).join("; ") });
    const res = await fetch("/api/v1/settings/intervals", { method: "PUT", headers: { "content-type": "application/json" }, body: JSON.stringify(body) }).catch(() => null);
    const json = res ? await res.json().catch(() => ({})) : {};
    if (res?.ok) {
      setMessage({ tone: "success", text: "Saved: due dates follow the new intervals." });
      router.refresh();
    } else setMessage({ tone: "error", text: json?.error?.message ?? "Not saved: no connection to the server." });
  }
  async function clear(vesselId: string) {
    const res = await fetch(`/api/v1/settings/intervals?vesselId=${vesselId}`, { method: "DELETE" }).catch(() => null);
    if (res?.ok) {
      // The chosen vessel now follows the company's intervals: show those.
      if (form.vesselId === vesselId) setForm({ vesselId, defaultMonths: String(company?.defaultMonths ?? 12), belowGoodMonths: String(company?.belowGoodMonths ?? 6) });
      router.refresh();
    } else setMessage({ tone: "error", text: "Not changed: try again." });
  }

  return (
    <details className="rounded-lg border border-slate-200 bg-white p-4 text-sm">
      <summary className="cursor-pointer font-semibold text-hull-900">
        Inspection intervals: {company ? `${company.defaultMonths} months, ${company.belowGoodMonths} below GOOD` : "not set"}{overrides.length ? ` · ${vesselsWithOwnIntervals(overrides.length)}` : ""}
      </summary>
      <p className="mt-2 text-slate-600">The company&apos;s intervals between inspections of a tank; a shorter one applies while a tank&apos;s coating is below GOOD. Class rules may require more (the reasons are listed per tank); the company&apos;s own procedures decide.</p>
      {overrides.length ? (
        <ul className="mt-2 list-disc pl-5">
          {overrides.map((o) => (
            <li key={o.vesselId}>{o.vesselName}: {o.defaultMonths} months, {o.belowGoodMonths} below GOOD <button type="button" className="underline" onClick={() => clear(o.vesselId!)}>use the company&apos;s</button></li>
          ))}
        </ul>
      ) : null}
      <form onSubmit={save} className="mt-3 flex flex-wrap items-end gap-3" aria-label="Set inspection intervals">
        <label className="block">
          <span className="block font-semibold text-slate-800">For</span>
          <select value={form.vesselId} onChange={(e) => { setForm(valuesFor(e.target.value)); setMessage(null); }} className="mt-1 rounded-md border border-slate-300 px-2 py-2">
            <option value="">the whole company</option>
            {vessels.map((v) => <option key={v.id} value={v.id}>{v.name}</option>)}
          </select>
        </label>
        <label className="block">
          <span className="block font-semibold text-slate-800">Interval (months)</span>
          <input inputMode="numeric" value={form.defaultMonths} onChange={(e) => setForm({ ...form, defaultMonths: e.target.value })} className="mt-1 w-24 rounded-md border border-slate-300 px-2 py-2" />
        </label>
        <label className="block">
          <span className="block font-semibold text-slate-800">Below GOOD (months)</span>
          <input inputMode="numeric" value={form.belowGoodMonths} onChange={(e) => setForm({ ...form, belowGoodMonths: e.target.value })} className="mt-1 w-24 rounded-md border border-slate-300 px-2 py-2" />
        </label>
        <Button type="submit" variant="secondary">Save the intervals</Button>
      </form>
      {form.vesselId ? <p className="mt-2 text-slate-700" data-testid="interval-source">{vesselIntervalsSource(overrides.some((o) => o.vesselId === form.vesselId))}</p> : null}
      {message ? <div className="mt-2"><Notice tone={message.tone}>{message.text}</Notice></div> : null}
    </details>
  );
}
