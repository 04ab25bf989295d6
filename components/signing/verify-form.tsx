"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ZFingerprint } from "@/lib/schemas/signing";
import { postJson } from "./api";

type TAnswer = { known: boolean; message: string; fingerprint: string; report?: { vesselName: string; imoNumber: string; tankCode: string; tankName: string; inspectedOn: string; revision: number; current: boolean } };

const MAX_BYTES = 25 * 1024 * 1024;

async function sha256Hex(file: File): Promise<string> {
  const digest = await crypto.subtle.digest("SHA-256", await file.arrayBuffer());
  return Array.from(new Uint8Array(digest), (b) => b.toString(16).padStart(2, "0")).join("");
}

export function VerifyForm() {
  const [fingerprint, setFingerprint] = useState("");
  const [answer, setAnswer] = useState<TAnswer | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function check(value: string) {
    setAnswer(null);
    setError(null);
    const parsed = ZFingerprint.safeParse(value);
    if (!parsed.success) return setError(`The fingerprint ${parsed.error.issues[0]!.message}.`);
    setBusy(true);
    const res = await postJson<TAnswer>("/api/v1/verify", { fingerprint: parsed.data });
    setBusy(false);
    if (res.ok) setAnswer(res.body);
    else setError(res.message);
  }

  async function onFile(file: File | undefined) {
    if (!file) return;
    setAnswer(null);
    setError(null);
    if (file.size > MAX_BYTES) return setError(`The file is larger than 25 MB: a signed report is much smaller. Check that you chose the right file.`);
    const head = new TextDecoder().decode(await file.slice(0, 5).arrayBuffer());
    if (head !== "%PDF-") return setError("This file is not a PDF: only the PDF of a signed report can be checked.");
    const hex = await sha256Hex(file);
    setFingerprint(hex);
    await check(hex);
  }

  return (
    <div className="space-y-4">
      <div>
        <label htmlFor="verify-file" className="block text-sm font-semibold text-slate-800">The report's PDF</label>
        <input id="verify-file" type="file" accept="application/pdf,.pdf" onChange={(e) => onFile(e.target.files?.[0])} className="mt-1 block w-full text-sm" />
      </div>
      <form onSubmit={(e) => { e.preventDefault(); void check(fingerprint); }} className="space-y-2">
        <TextField label="or its fingerprint (SHA-256)" name="fingerprint" value={fingerprint} onChange={(e) => setFingerprint(e.target.value)} spellCheck={false} autoComplete="off" />
        <Button type="submit" disabled={busy}>{busy ? "Checking…" : "Check"}</Button>
      </form>
      {error ? <Notice tone="error" title="Cannot check">{error}</Notice> : null}
      {answer ? (
        <Notice tone={answer.known ? "success" : "error"} title={answer.known ? "Signed Tankwright report" : "Not a signed Tankwright report"}>
          <p data-testid="verify-answer">{answer.message}</p>
          {answer.report ? <p className="mt-1">IMO {answer.report.imoNumber} · tank {answer.report.tankCode} ({answer.report.tankName}) · inspected {answer.report.inspectedOn} · revision {answer.report.revision}{answer.report.current ? " (current)" : " (corrected by a later revision)"}</p> : null}
          <p className="mt-1 break-all text-xs">Fingerprint {answer.fingerprint}</p>
        </Notice>
      ) : null}
    </div>
  );
}
