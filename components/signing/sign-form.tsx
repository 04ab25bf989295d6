"use client";

import { useCallback, useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { freshInspection, postJson, type TApiIssue } from "./api";
import { DrawnSignature } from "./signature-pad";

/**
 * Signing with the password again: the officer's submission or the master's
 * countersignature. Reads the inspection fresh first, so the signature covers
 * what the server holds; a refusal keeps everything typed except the password.
 */
export function SignForm({ inspectionId, action, signerName, onDone }: { inspectionId: string; action: "submit" | "countersign"; signerName: string; onDone: () => void }) {
  const [typed, setTyped] = useState(signerName);
  const [password, setPassword] = useState("");
  const [drawn, setDrawn] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [refusal, setRefusal] = useState<{ message: string; issues: TApiIssue[] } | null>(null);
  const onDrawn = useCallback((png: string | null) => setDrawn(png), []);
  const label = action === "submit" ? "Sign and submit for countersigning" : "Countersign the report";
  const fieldError = (name: string) => refusal?.issues.find((i) => i.path === name)?.message;

  async function sign(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    setRefusal(null);
    const fresh = await freshInspection(inspectionId);
    if (!fresh) {
      setBusy(false);
      setRefusal({ message: "The inspection could not be read from the server: nothing was signed. Check the connection and try again.", issues: [] });
      return;
    }
    const res = await postJson(`/api/v1/inspections/${inspectionId}/${action}`, { version: fresh.inspection.version, password, typedSignature: typed, ...(drawn ? { drawnSignature: drawn } : {}) });
    setBusy(false);
    setPassword("");
    if (res.ok) onDone();
    else setRefusal({ message: res.message, issues: res.issues });
  }

  return (
    <form onSubmit={sign} className="space-y-3 rounded-lg border border-slate-300 bg-white p-4" aria-label={label}>
      <h3 className="font-semibold text-hull-900">{label}</h3>
      <p className="text-sm text-slate-700">
        {action === "submit"
          ? "By signing you confirm that this report is a true record of the inspection. After you submit, it cannot be changed unless the master returns it to you."
          : "By countersigning you confirm that you have read the report. It is then locked, its PDF is fingerprinted and sent to the office and class; a correction becomes a new revision."}
      </p>
      {refusal ? <Notice tone="error" title="Not signed">{refusal.message}{refusal.issues.length > 1 ? <ul className="list-disc pl-5">{refusal.issues.map((i) => <li key={i.path + i.message}>{i.message}</li>)}</ul> : null}</Notice> : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField label="Signature (your name as you sign)" name={`${action}-typed`} value={typed} onChange={(e) => setTyped(e.target.value)} error={fieldError("typedSignature")} autoComplete="name" required />
        <TextField label="Your password" name={`${action}-password`} type="password" value={password} onChange={(e) => setPassword(e.target.value)} error={fieldError("password")} autoComplete="current-password" required />
      </div>
      <DrawnSignature onChange={onDrawn} />
      <Button type="submit" disabled={busy}>{busy ? "Signing…" : label}</Button>
    </form>
  );
}
