"use client";

import { useCallback, useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { postJson } from "./api";

type TShare = { id: string; surveyorName: string; surveyorEmail: string; sharedAt: string; acknowledgedAt: string | null; acknowledgementComment: string | null };
type TState = { shares: TShare[]; surveyors: { id: string; name: string; email: string }[]; canShare: boolean };

const utc = (iso: string) => `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;

/** Sharing a countersigned report with class, and the surveyors' acknowledgements. */
export function SharePanel({ inspectionId }: { inspectionId: string }) {
  const [state, setState] = useState<TState | null>(null);
  const [surveyor, setSurveyor] = useState("");
  const [invite, setInvite] = useState({ name: "", email: "" });
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const load = useCallback(async () => {
    const res = await fetch(`/api/v1/inspections/${inspectionId}/shares`, { cache: "no-store" });
    if (res.ok) setState((await res.json()) as TState);
  }, [inspectionId]);
  useEffect(() => { void load(); }, [load]);

  async function share(e: React.FormEvent) {
    e.preventDefault();
    const res = await postJson<{ shared: boolean; surveyor: { name: string } }>(`/api/v1/inspections/${inspectionId}/shares`, { surveyorUserId: surveyor });
    setMessage(res.ok ? { tone: "success", text: res.body.shared ? `Shared with ${res.body.surveyor.name}; they have been told by e-mail.` : `Already shared with ${res.body.surveyor.name}.` } : { tone: "error", text: res.message });
    await load();
  }

  async function inviteByEmail(e: React.FormEvent) {
    e.preventDefault();
    const res = await postJson<{ shared: boolean; invited: boolean; surveyor: { name: string } }>(`/api/v1/inspections/${inspectionId}/shares`, invite);
    if (res.ok) setInvite({ name: "", email: "" });
    setMessage(res.ok ? { tone: "success", text: res.body.invited ? `${res.body.surveyor.name} is invited: an e-mail with a link to choose a password and read the report is on its way.` : `Shared with ${res.body.surveyor.name}.` } : { tone: "error", text: res.message });
    await load();
  }

  if (!state) return null;
  const unshared = state.surveyors.filter((u) => !state.shares.some((s) => s.surveyorEmail === u.email));
  return (
    <div className="mt-2" aria-label="Shared with class">
      <h3 className="font-semibold text-hull-900">Shared with class</h3>
      {state.shares.length ? (
        <ul className="mt-1 space-y-1">
          {state.shares.map((s) => (
            <li key={s.id} data-testid="share">
              {s.surveyorName} ({s.surveyorEmail}) · shared {utc(s.sharedAt)} ·{" "}
              {s.acknowledgedAt ? <strong>acknowledged {utc(s.acknowledgedAt)}{s.acknowledgementComment ? `: “${s.acknowledgementComment}”` : ""}</strong> : "not acknowledged yet"}
            </li>
          ))}
        </ul>
      ) : <p>Not shared with a surveyor yet.</p>}
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
      {state.canShare ? (
        state.surveyors.length ? (
          <form onSubmit={share} className="mt-2 flex flex-wrap items-end gap-2" aria-label="Share with a surveyor">
            <div>
              <label htmlFor="share-surveyor" className="block text-sm font-semibold text-slate-800">Surveyor</label>
              <select id="share-surveyor" value={surveyor} onChange={(e) => setSurveyor(e.target.value)} className="mt-1 rounded-md border border-slate-300 px-2 py-2" required>
                <option value="">— choose the surveyor —</option>
                {unshared.map((u) => <option key={u.id} value={u.id}>{u.name} ({u.email})</option>)}
              </select>
            </div>
            <Button type="submit" variant="secondary" disabled={!surveyor}>Share the signed report</Button>
          </form>
        ) : <p className="text-slate-600">The company has no surveyor account yet: invite one below.</p>
      ) : null}
      {state.canShare ? (
        <form onSubmit={inviteByEmail} className="mt-2 flex flex-wrap items-end gap-2" aria-label="Invite a surveyor by e-mail">
          <label className="block">
            <span className="block text-sm font-semibold text-slate-800">Surveyor&apos;s name</span>
            <input value={invite.name} onChange={(e) => setInvite({ ...invite, name: e.target.value })} className="mt-1 rounded-md border border-slate-300 px-2 py-2" required />
          </label>
          <label className="block">
            <span className="block text-sm font-semibold text-slate-800">Surveyor&apos;s e-mail</span>
            <input type="email" value={invite.email} onChange={(e) => setInvite({ ...invite, email: e.target.value })} className="mt-1 rounded-md border border-slate-300 px-2 py-2" required />
          </label>
          <Button type="submit" variant="secondary">Invite and share</Button>
        </form>
      ) : null}
    </div>
  );
}
