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
  { name: "plannedOn", label: "Planned date", hint: "2027-04-12", type: "date" },
  { name: "currency", label: "Currency", hint: "ISO 4217 code: USD, EUR, SGD …" },
  { name: "steelRatePerKg", label: "Steel renewal, per kg", inputMode: "decimal" },
  { name: "coatingRatePerM2", label: "Coating repair, per m²", inputMode: "decimal" },
  { name: "anodeRatePerPiece", label: "Anode renewal, per piece", inputMode: "decimal" },
  { name: "sedimentRatePerM3", label: "Sediment removal, per m³", inputMode: "decimal" },
] as const;

const EMPTY = Object.fromEntries(FIELDS.map((f) => [f.name, ""])) as TDraft;

/** Plans a docking: checked in the browser with the server's schema, then created and gathered by the API. */
export function NewDockingForm({ vesselId }: { vesselId: string }) {
  const router = useRouter();
  const [draft, setDraft] = useState<TDraft>({ ...EMPTY, currency: "USD" });
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
      <div className="grid gap-4 sm:grid-cols-2">
        {FIELDS.map((f) => (
          <TextField
            key={f.name}
            label={f.label}
            name={f.name}
            hint={"hint" in f ? f.hint : undefined}
            type={"type" in f ? f.type : "text"}
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
