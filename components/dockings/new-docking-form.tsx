"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { DOCKING_RATE_FIELDS, DockingDetailsFields, EMPTY_DOCKING_DRAFT, type TDockingDraft, type TDockingDraftErrors } from "@/components/dockings/docking-details-fields";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { ZDockingInput } from "@/lib/schemas/docking";

type TErrorBody = { error?: { message?: string; issues?: { path: string; message: string }[] } };

/** The company's most recent docking, whose currency and rates a new docking starts from. */
export type TRatesSource = { vesselName: string; yard: string; plannedOn: string; currency: string } & Record<(typeof DOCKING_RATE_FIELDS)[number], number>;

function startingDraft(from: TRatesSource | null): TDockingDraft {
  if (!from) return EMPTY_DOCKING_DRAFT;
  return { ...EMPTY_DOCKING_DRAFT, currency: from.currency, ...(Object.fromEntries(DOCKING_RATE_FIELDS.map((k) => [k, String(from[k])])) as Record<(typeof DOCKING_RATE_FIELDS)[number], string>) };
}

/**
 * Plans a docking: checked in the browser with the server's schema, then
 * created and gathered by the API. The currency and rates start from the
 * company's most recent docking, and say so; the rates are empty without one.
 */
export function NewDockingForm({ vesselId, ratesFrom }: { vesselId: string; ratesFrom: TRatesSource | null }) {
  const router = useRouter();
  const [draft, setDraft] = useState<TDockingDraft>(() => startingDraft(ratesFrom));
  const [errors, setErrors] = useState<TDockingDraftErrors>({});
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
      <DockingDetailsFields draft={draft} errors={errors} onChange={(name, value) => setDraft((d) => ({ ...d, [name]: value }))} />
      <Button type="submit" disabled={busy}>{busy ? "Creating…" : "Create docking and gather the work list"}</Button>
    </form>
  );
}
