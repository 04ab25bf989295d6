"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ZDockingOtherItemInput } from "@/lib/schemas/docking";

type TField = "description" | "tankId" | "quantity" | "unit" | "unitRate" | "reason";
type TDraft = Record<TField, string>;
type TErrorBody = { error?: { message?: string; issues?: { path: string; message: string }[] } };

const EMPTY: TDraft = { description: "", tankId: "", quantity: "", unit: "", unitRate: "", reason: "" };
const UNITS = ["lump sum", "days", "hours", "m²", "m³", "pcs", "tanks"];

/**
 * Adds work that no finding asks for (staging, gas-freeing, cleaning, a
 * surveyor's attendance, a lump sum) at its own rate. Checked in the browser
 * with the server's schema; the server decides (tank of the vessel, locked
 * docking), and its refusal puts each field's message beside the field. What
 * was typed stays in the boxes until the item is added.
 */
export function AddWorkItemForm<T>({
  dockingId,
  viewQuery,
  currency,
  tanks,
  onAdded,
}: {
  dockingId: string;
  viewQuery: string;
  currency: string;
  tanks: readonly { id: string; code: string }[];
  /** The server's answer (the docking with the page of items shown) once the item is added. */
  onAdded: (body: T) => void;
}) {
  const [draft, setDraft] = useState<TDraft>(EMPTY);
  const [errors, setErrors] = useState<Partial<Record<TField, string>>>({});
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const set = (name: TField) => (e: { target: { value: string } }) => setDraft((d) => ({ ...d, [name]: e.target.value }));

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const checked = ZDockingOtherItemInput.safeParse(draft);
    if (!checked.success) {
      const found: Partial<Record<TField, string>> = {};
      for (const i of checked.error.issues) found[String(i.path[0]) as TField] ??= i.message;
      setErrors(found);
      return setMessage("Check the marked fields; nothing was added.");
    }
    setErrors({});
    setMessage(null);
    setBusy(true);
    try {
      const url = `/api/v1/dockings/${dockingId}/items`;
      const res = await fetch(viewQuery ? `${url}?${viewQuery}` : url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(checked.data) });
      const body = (await res.json().catch(() => ({}))) as TErrorBody & { workList?: unknown };
      if (!res.ok || !body.workList) {
        const found: Partial<Record<TField, string>> = {};
        for (const i of body.error?.issues ?? []) if (i.path in EMPTY) found[i.path as TField] ??= i.message;
        setErrors(found);
        // Each field's own message is beside it; the notice says only what to do.
        if (Object.keys(found).length) return setMessage("Check the marked fields; nothing was added.");
        return setMessage(body.error?.message ?? "The item could not be added; nothing was changed.");
      }
      setDraft(EMPTY);
      onAdded(body as T);
    } catch {
      setMessage("The server could not be reached; nothing was added. Try again.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} noValidate aria-labelledby="add-item-heading" className="space-y-3 rounded-lg border border-slate-200 bg-white p-4">
      <h2 id="add-item-heading" className="text-lg font-semibold text-hull-900">Add an item</h2>
      <p className="text-sm text-slate-700">
        Work no finding asks for: staging, gas-freeing and ventilation, tank cleaning before blasting, a surveyor&apos;s attendance, a lump sum. It is priced at its own rate in {currency} and kept when the list is gathered again.
      </p>
      {message ? <Notice tone="error">{message}</Notice> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <div className="sm:col-span-2">
          <TextField label="Description" name="new-item-description" hint="What the yard is to do, and where: “Staging in 3P for bracket renewal, Fr. 60–64”" value={draft.description} error={errors.description} onChange={set("description")} />
        </div>
        <SelectField
          label="Tank"
          name="new-item-tank"
          hint="Optional: none for work on the whole ship"
          value={draft.tankId}
          error={errors.tankId}
          onChange={set("tankId")}
          options={[{ value: "", label: "No tank (whole ship)" }, ...tanks.map((t) => ({ value: t.id, label: t.code }))]}
        />
        <TextField label="Quantity" name="new-item-quantity" inputMode="decimal" value={draft.quantity} error={errors.quantity} onChange={set("quantity")} />
        <TextField label="Unit" name="new-item-unit" hint="lump sum, days, m², pcs …" list="new-item-units" value={draft.unit} error={errors.unit} onChange={set("unit")} />
        <TextField label={`Unit rate (${currency} per unit)`} name="new-item-unit-rate" inputMode="decimal" value={draft.unitRate} error={errors.unitRate} onChange={set("unitRate")} />
        <div className="sm:col-span-2">
          <TextField label="Reason" name="new-item-reason" hint="Why it is added: “Class requires staging to gauge the brackets”" value={draft.reason} error={errors.reason} onChange={set("reason")} />
        </div>
      </div>
      <datalist id="new-item-units">
        {UNITS.map((u) => (
          <option key={u} value={u} />
        ))}
      </datalist>
      <Button type="submit" disabled={busy}>{busy ? "Adding…" : "Add the item"}</Button>
    </form>
  );
}
