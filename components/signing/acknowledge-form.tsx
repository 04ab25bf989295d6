"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { postJson } from "./api";

/** The surveyor acknowledges a shared report once, with an optional comment; a refusal keeps the comment. */
export function AcknowledgeForm({ shareId }: { shareId: string }) {
  const router = useRouter();
  const [comment, setComment] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function send(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    const res = await postJson(`/api/v1/shares/${shareId}/acknowledge`, { comment });
    setBusy(false);
    if (res.ok) router.refresh();
    else setError(res.message);
  }
  return (
    <form onSubmit={send} className="flex flex-wrap items-end gap-2" aria-label="Acknowledge the report">
      <label className="min-w-0 flex-1 basis-56 text-sm">
        <span className="sr-only">Comment (optional)</span>
        <input value={comment} onChange={(e) => setComment(e.target.value)} placeholder="Comment (optional)" className="w-full rounded-md border border-slate-300 px-2 py-1" maxLength={2000} />
      </label>
      <Button type="submit" variant="secondary" className="min-h-8 px-2 py-1" disabled={busy}>Acknowledge</Button>
      {error ? <span role="alert" className="text-sm text-red-800">{error}</span> : null}
    </form>
  );
}
