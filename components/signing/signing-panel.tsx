"use client";

import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { postJson } from "./api";
import { DeliveryLog } from "./delivery-log";
import { SharePanel } from "./share-panel";
import { SignForm } from "./sign-form";

type TSignature = { kind: "officer" | "master"; signerName: string; signerRank: string | null; typedSignature: string | null; signedAt: string; userId: string };
export type TPanelState = {
  signatures: TSignature[];
  returnComments: { id: string; body: string; createdAt: string; authorName: string; authorRank: string | null }[];
  report: { sha256: string; sizeBytes: number; createdAt: string } | null;
  revisions: { id: string; revision: number; status: string; countersignedAt: string | null; sha256: string | null }[];
  may: { countersign: boolean; returnIt: boolean; revise: boolean; resend: boolean };
};

const utc = (iso: string) => `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;
const who = (s: TSignature) => `${s.signerName}${s.signerRank ? `, ${s.signerRank}` : ""}`;

/** Where the report stands on its way to class, and the one next step this user may take. */
export function SigningPanel({ inspectionId, status, revision, state, actor }: { inspectionId: string; status: string; revision: number; state: TPanelState; actor: { name: string } }) {
  const router = useRouter();
  const refresh = () => router.refresh();
  const officer = state.signatures.find((s) => s.kind === "officer");
  const master = state.signatures.find((s) => s.kind === "master");
  const signed = status === "countersigned" || status === "superseded";

  // While the signed PDF is being made, look again every few seconds.
  useEffect(() => {
    if (!signed || state.report) return;
    const t = window.setInterval(() => router.refresh(), 4000);
    return () => window.clearInterval(t);
  }, [signed, state.report, router]);

  return (
    <section aria-label="Signatures" className="space-y-3">
      {status === "returned" && state.returnComments[0] ? (
        <Notice tone="caution" title={`Returned by ${state.returnComments[0].authorName}${state.returnComments[0].authorRank ? `, ${state.returnComments[0].authorRank}` : ""} on ${utc(state.returnComments[0].createdAt)}`}>
          <p className="whitespace-pre-line">{state.returnComments[0].body}</p>
          <p className="mt-1">Make the changes, then sign and submit again from the review step.</p>
        </Notice>
      ) : null}

      {status === "submitted" && officer ? (
        <Notice tone="info" title="Submitted: awaiting the master's countersignature">
          Signed by {who(officer)} on {utc(officer.signedAt)}. Read the report as class will receive it:{" "}
          <a className="underline" href={`/api/v1/inspections/${inspectionId}/report`} target="_blank" rel="noreferrer">the PDF</a> or{" "}
          <a className="underline" href={`/inspections/${inspectionId}/report`}>the page to read on screen</a>.
        </Notice>
      ) : null}
      {state.may.countersign || state.may.returnIt ? (
        <div className="grid gap-3 lg:grid-cols-2">
          {state.may.returnIt ? <ReturnForm inspectionId={inspectionId} onDone={refresh} /> : null}
          {state.may.countersign ? <SignForm inspectionId={inspectionId} action="countersign" signerName={actor.name} onDone={refresh} /> : null}
        </div>
      ) : null}

      {signed ? (
        <div className="space-y-2 rounded-lg border border-green-700 bg-white p-4 text-sm">
          <p className="font-semibold text-green-900">
            {status === "superseded" ? `Revision ${revision}: countersigned, since corrected by a later revision.` : `Revision ${revision}: signed and countersigned.`}
          </p>
          {officer ? <p>Officer: {who(officer)}, {utc(officer.signedAt)}</p> : null}
          {master ? <p>Master: {who(master)}, {utc(master.signedAt)}</p> : null}
          {state.report ? (
            <>
              <p>Fingerprint (SHA-256): <code data-testid="fingerprint" className="break-all">{state.report.sha256}</code></p>
              <p><a className="font-semibold underline" href={`/api/v1/inspections/${inspectionId}/signed-report`}>Download the signed PDF</a> ({(state.report.sizeBytes / 1024 / 1024).toFixed(2)} MB) · <a className="underline" href="/verify">check a copy</a></p>
            </>
          ) : (
            <p role="status">The signed PDF is being prepared; this page updates by itself.</p>
          )}
          {state.report ? <DeliveryLog inspectionId={inspectionId} canResend={state.may.resend} /> : null}
          {state.report ? <SharePanel inspectionId={inspectionId} /> : null}
          {state.may.revise ? <ReviseButton inspectionId={inspectionId} next={revision + 1} /> : null}
        </div>
      ) : null}

      {state.revisions.length > 1 ? (
        <nav aria-label="Revisions" className="text-sm">
          Revisions:{" "}
          {state.revisions.map((r, i) => (
            <span key={r.id}>
              {i ? " · " : ""}
              {r.id === inspectionId ? <strong>{r.revision} ({r.status})</strong> : <a className="underline" href={`/inspections/${r.id}?step=review`}>{r.revision} ({r.status})</a>}
            </span>
          ))}
        </nav>
      ) : null}
    </section>
  );
}

function ReturnForm({ inspectionId, onDone }: { inspectionId: string; onDone: () => void }) {
  const [comments, setComments] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function send(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    const fresh = await fetch(`/api/v1/inspections/${inspectionId}`, { cache: "no-store" }).then((r) => (r.ok ? r.json() : null)).catch(() => null);
    const res = fresh ? await postJson(`/api/v1/inspections/${inspectionId}/return`, { version: fresh.inspection.version, comments }) : null;
    setBusy(false);
    if (res?.ok) onDone();
    else setError(res ? res.message : "No connection to the server: the report was not returned. Your comments are kept here.");
  }
  return (
    <form onSubmit={send} className="space-y-3 rounded-lg border border-slate-300 bg-white p-4" aria-label="Return to the officer">
      <h3 className="font-semibold text-hull-900">Return to the officer with comments</h3>
      {error ? <Notice tone="error" title="Not returned">{error}</Notice> : null}
      <label htmlFor="return-comments" className="block text-sm font-semibold text-slate-800">What must change</label>
      <textarea id="return-comments" value={comments} onChange={(e) => setComments(e.target.value)} rows={5} className="block w-full rounded-md border border-slate-300 p-2" required />
      <Button type="submit" variant="secondary" disabled={busy}>{busy ? "Returning…" : "Return with comments"}</Button>
    </form>
  );
}

function ReviseButton({ inspectionId, next }: { inspectionId: string; next: number }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  async function revise() {
    if (!window.confirm(`Start revision ${next}? It copies this report into a new draft; this revision and its PDF stay as they are.`)) return;
    const res = await postJson<{ id: string }>(`/api/v1/inspections/${inspectionId}/revisions`);
    if (res.ok) router.push(`/inspections/${res.body.id}?step=review`);
    else setError(res.message);
  }
  return (
    <div>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <Button type="button" variant="secondary" onClick={revise}>Correct it: start revision {next}</Button>
    </div>
  );
}
