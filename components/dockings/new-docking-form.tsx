"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ZDockingInput } from "@/lib/schemas/docking";

type TDraft = Record<(typeof FIELDS)[number]["name"], string>;
type TErrorBody = { error?: { message?: string; issues?: { path: string; message: string }[] } };

const FIELDS = [
  { name: "yard", label: "Yard", hint: "The repair yard's name" },
  { name: "place", label: "Place", hint: "Port or berth" },
  // Written as the product writes dates everywhere (2027-04-12), not in the browser's locale.
  { name: "plannedOn", label: "Planned date", hint: "YYYY-MM-DD, e.g. 2027-04-12", placeholder: "YYYY-MM-DD" },
  { name: "currency", label: "Currency", hint: "ISO 4217 code: USD, EUR, SGD …" },
  { name: "steelRatePerKg", label: "Steel renewal, per kg", inputMode: "decimal" },
  { name: "coatingRatePerM2", label: "Coating repair, per m²", inputMode: "decimal" },
  { name: "anodeRatePerPiece", label: "Anode renewal, per piece", inputMode: "decimal" },
  { name: "sedimentRatePerM3", label: "Sediment removal, per m³", inputMode: "decimal" },
] as const;

const EMPTY = Object.fromEntries(FIELDS.map((f) => [f.name, ""])) as TDraft;
const RATE_FIELDS = ["steelRatePerKg", "coatingRatePerM2", "anodeRatePerPiece", "sedimentRatePerM3"] as const;

/** The company's most recent docking, whose currency and rates a new docking starts from. */
export type TRatesSource = { vesselName: string; yard: string; plannedOn: string; currency: string } & Record<(typeof RATE_FIELDS)[number], number>;

function startingDraft(from: TRatesSource | null): TDraft {
  if (!from) return EMPTY;
  return { ...EMPTY, currency: from.currency, ...(Object.fromEntries(RATE_FIELDS.map((k) => [k, String(from[k])])) as Record<(typeof RATE_FIELDS)[number], string>) };
}

/**
 * Plans a docking: checked in the browser with the server's schema, then
 * created and gathered by the API. The currency and rates start from the
 * company's most recent docking, and say so; the rates are empty without one.
 */
export function NewDockingForm({ vesselId, ratesFrom }: { vesselId: string; ratesFrom: TRatesSource | null }) {
  const router = useRouter();
  const [draft, setDraft] = useState<TDraft>(() => startingDraft(ratesFrom));
  const [errors, setErrors] = useState<Partial<Record<keyof TDraft, string>>>({});
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const checked = ZDockingInput.safeParse(draft);
    if (!checked.success) {
      setErrors(Object.fromEntries(checked.error.issues.map((i) => [String(i.path[0]), i.message])));
      return setMessage("Check the marked fields.");
    }
    setErrors({});
    setMessage(null);
    setBusy(true);
    try {
      const res = await fetch(`/api/v1/vessels/${vesselId}/dockings`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(checked.data) });
      const body = (await res.json().catch(() => ({}))) as TErrorBody & { docking?: { id: string } };
      if (!res.ok || !body.docking) {
        setErrors(Object.fromEntries((body.error?.issues ?? []).map((i) => [i.path, i.message])));
        return setMessage(body.error?.message ?? "The docking could not be created.");
      }
      router.push(`/dockings/${body.docking.id}`);
    } catch {
      setMessage("The server could not be reached; nothing was saved. Try again.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} noValidate className="space-y-4 rounded-lg border border-slate-200 bg-white p-4">
      {message ? <Notice tone="error">{message}</Notice> : null}
      {ratesFrom ? (
        <p className="text-sm text-slate-700" data-testid="rates-from">
          Currency and rates from the docking at {ratesFrom.yard}, {ratesFrom.plannedOn} ({ratesFrom.vesselName}). Change them to this yard&apos;s quotation.
        </p>
      ) : (
        <p className="text-sm text-slate-700" data-testid="rates-from">No earlier docking in the company: enter this yard&apos;s rates.</p>
      )}
      <div className="grid gap-4 sm:grid-cols-2">
        {FIELDS.map((f) => (
          <TextField
            key={f.name}
            label={f.label}
            name={f.name}
            hint={"hint" in f ? f.hint : undefined}
            type="text"
            placeholder={"placeholder" in f ? f.placeholder : undefined}
            inputMode={"inputMode" in f ? f.inputMode : undefined}
            value={draft[f.name]}
            error={errors[f.name]}
            onChange={(e) => setDraft((d) => ({ ...d, [f.name]: e.target.value }))}
          />
        ))}
      </div>
      <Button type="submit" disabled={busy}>{busy ? "Creating…" : "Create docking and gather the work list"}</Button>
    </form>
  );
}
