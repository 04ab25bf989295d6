"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ZRecipientInput } from "@/lib/schemas/recipient";
import { RECIPIENT_KIND_LABELS, RECIPIENT_KINDS, type TRecipientKind } from "@/lib/vocabulary";

type TRecipient = { id: string; kind: TRecipientKind; name: string | null; email: string };
type TErrorBody = { error?: { message?: string; issues?: { path: string; message: string }[] } };
type TDraft = { kind: TRecipientKind; name: string; email: string };

const EMPTY: TDraft = { kind: "office", name: "", email: "" };
const KIND_OPTIONS = RECIPIENT_KINDS.map((k) => ({ value: k, label: RECIPIENT_KIND_LABELS[k] }));
const byKindThenEmail = (a: TRecipient, b: TRecipient) => RECIPIENT_KINDS.indexOf(a.kind) - RECIPIENT_KINDS.indexOf(b.kind) || a.email.localeCompare(b.email);

async function errorOf(res: Response, fallback: string) {
  const body = (await res.json().catch(() => ({}))) as TErrorBody;
  return { message: body.error?.message ?? fallback, issues: body.error?.issues ?? [] };
}

/** Where the vessel's signed reports are sent: everyone with the vessel reads the list; the office adds and removes. */
export function RecipientList({ vesselId, recipients: initial, canEdit, max }: { vesselId: string; recipients: TRecipient[]; canEdit: boolean; max: number }) {
  const [recipients, setRecipients] = useState(initial);
  const [draft, setDraft] = useState<TDraft>(EMPTY);
  const [errors, setErrors] = useState<Partial<Record<keyof TDraft, string>>>({});
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const base = `/api/v1/vessels/${vesselId}/recipients`;

  async function add() {
    const checked = ZRecipientInput.safeParse(draft);
    if (!checked.success) {
      setErrors(Object.fromEntries(checked.error.issues.map((i) => [String(i.path[0]), i.message])));
      return setMessage({ tone: "error", text: "Check the marked fields." });
    }
    setErrors({});
    setMessage(null);
    setBusy(true);
    try {
      const res = await fetch(base, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(checked.data) });
      if (!res.ok) {
        // What was typed stays in the form, so it can be corrected and sent again.
        const e = await errorOf(res, "The recipient could not be added.");
        setErrors(Object.fromEntries(e.issues.filter((i) => i.path in EMPTY).map((i) => [i.path, i.message])));
        return setMessage({ tone: "error", text: e.message });
      }
      const { recipient } = (await res.json()) as { recipient: TRecipient };
      setRecipients((list) => [...list, recipient].sort(byKindThenEmail));
      setDraft({ ...EMPTY, kind: draft.kind });
      setMessage({ tone: "success", text: `${recipient.email} will receive the vessel's signed reports.` });
    } catch {
      setMessage({ tone: "error", text: "The server could not be reached; nothing was changed. Try again." });
    } finally {
      setBusy(false);
    }
  }

  async function remove(r: TRecipient) {
    if (!window.confirm(`Stop sending this vessel's reports to ${r.email}?`)) return;
    setMessage(null);
    try {
      const res = await fetch(`${base}/${r.id}`, { method: "DELETE" });
      if (!res.ok && res.status !== 404) return setMessage({ tone: "error", text: (await errorOf(res, "The recipient could not be removed.")).message });
      setRecipients((list) => list.filter((x) => x.id !== r.id));
      setMessage({ tone: "success", text: `${r.email} was removed.` });
    } catch {
      setMessage({ tone: "error", text: "The server could not be reached; nothing was changed. Try again." });
    }
  }

  const full = recipients.length >= max;
  return (
    <section aria-labelledby="recipients-heading" className="mt-6">
      <h2 id="recipients-heading" className="mb-2 text-lg font-semibold text-hull-900">Report recipients ({recipients.length})</h2>
      <div className="space-y-3">
        {recipients.length ? (
          <ul className="divide-y divide-slate-200 rounded-lg border border-slate-200 bg-white" data-testid="recipient-list">
            {recipients.map((r) => (
              <li key={r.id} className="flex flex-wrap items-center justify-between gap-2 p-3 text-sm">
                <span>
                  <span className="font-semibold">{r.name ?? r.email}</span>
                  <span className="block text-xs text-slate-600">{RECIPIENT_KIND_LABELS[r.kind]}{r.name ? ` · ${r.email}` : ""}</span>
                </span>
                {canEdit ? <Button type="button" variant="danger" onClick={() => remove(r)} aria-label={`Remove ${r.email}`}>Remove</Button> : null}
              </li>
            ))}
          </ul>
        ) : (
          <Notice>No report recipients yet: signed reports of this vessel go to nobody by e-mail.{canEdit ? "" : " The office adds them."}</Notice>
        )}
        {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
        {canEdit ? (
          <form className="grid gap-3 rounded-lg border border-slate-200 bg-white p-3 sm:grid-cols-3" noValidate onSubmit={(e) => { e.preventDefault(); void add(); }}>
            <SelectField label="Kind" name="recipient-kind" options={KIND_OPTIONS} value={draft.kind} error={errors.kind} onChange={(e) => setDraft({ ...draft, kind: e.target.value as TRecipientKind })} />
            <TextField label="Name" name="recipient-name" value={draft.name} error={errors.name} hint="Optional, e.g. Technical department" maxLength={120} onChange={(e) => setDraft({ ...draft, name: e.target.value })} />
            <TextField label="E-mail" name="recipient-email" type="email" autoComplete="off" value={draft.email} error={errors.email} onChange={(e) => setDraft({ ...draft, email: e.target.value })} />
            <div className="flex items-center gap-3 sm:col-span-3">
              <Button type="submit" disabled={busy || full}>Add recipient</Button>
              {full ? <p className="text-sm text-slate-700">The vessel has {max} recipients, the most it can have; remove one to add another.</p> : null}
            </div>
          </form>
        ) : null}
      </div>
    </section>
  );
}
