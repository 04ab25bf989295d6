"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { DOCKING_FIELDS, DockingDetailsFields, type TDockingDraft, type TDockingDraftErrors } from "@/components/dockings/docking-details-fields";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { ZDockingInput, type TDockingInput } from "@/lib/schemas/docking";

type TErrorBody = { error?: { message?: string; issues?: { path: string; message: string }[] } };

const draftOf = (docking: TDockingInput) => Object.fromEntries(DOCKING_FIELDS.map((f) => [f.name, String(docking[f.name])])) as TDockingDraft;

/**
 * Changes a planned or in-progress docking's details: checked in the browser
 * with the server's schema, then saved by the API; the page is read again so
 * that the work list is priced at the new rates. A refusal keeps what was
 * typed and puts each message beside its field.
 */
export function EditDockingForm({ dockingId, viewQuery, docking }: { dockingId: string; viewQuery: string; docking: TDockingInput }) {
  const router = useRouter();
  const [draft, setDraft] = useState<TDockingDraft>(() => draftOf(docking));
  const [errors, setErrors] = useState<TDockingDraftErrors>({});
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const checked = ZDockingInput.safeParse(draft);
    if (!checked.success) {
      setErrors(Object.fromEntries(checked.error.issues.map((i) => [String(i.path[0]), i.message])));
      return setMessage({ tone: "error", text: "Check the marked fields; nothing was changed." });
    }
    setErrors({});
    setMessage(null);
    setBusy(true);
    try {
      const url = `/api/v1/dockings/${dockingId}${viewQuery ? `?${viewQuery}` : ""}`;
      const res = await fetch(url, { method: "PUT", headers: { "content-type": "application/json" }, body: JSON.stringify(checked.data) });
      const body = (await res.json().catch(() => ({}))) as TErrorBody & { docking?: TDockingInput };
      if (!res.ok || !body.docking) {
        setErrors(Object.fromEntries((body.error?.issues ?? []).map((i) => [i.path, i.message])));
        return setMessage({ tone: "error", text: body.error?.message ?? "The docking's details could not be saved; nothing was changed." });
      }
      setDraft(draftOf(body.docking));
      setMessage({ tone: "success", text: "Saved; the work list is priced at these rates." });
      router.refresh();
    } catch {
      setMessage({ tone: "error", text: "The server could not be reached; nothing was changed. Try again." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} noValidate aria-label="The docking's details" className="mt-3 space-y-4">
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
      <p className="text-sm text-slate-700">
        Every rate is in the currency given here: changing the currency does not convert any amount. Enter the rates as the yard quotes them in that currency; work added by hand keeps its own rate, read in the new currency (remove it and add it again to change that rate).
      </p>
      <DockingDetailsFields draft={draft} errors={errors} onChange={(name, value) => setDraft((d) => ({ ...d, [name]: value }))} />
      <Button type="submit" disabled={busy}>{busy ? "Saving…" : "Save the docking's details"}</Button>
    </form>
  );
}
