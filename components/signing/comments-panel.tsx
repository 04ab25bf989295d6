"use client";

import { useCallback, useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { postJson } from "./api";

/** What the office is told after adding a comment: who was told by e-mail, or that nobody was. */
const commentAdded = (notified: number) =>
  notified > 0
    ? `Comment added; ${notified === 1 ? "1 person" : `${notified} people`} on the vessel (officers and master) told by e-mail.`
    : "Comment added; no e-mail went to the vessel (no officer or master with an address, or the mail could not be sent): it shows on the report.";

type TComment = { id: string; kind: string; body: string; createdAt: string; findingNumber: number | null; authorName: string; authorRank: string | null };

/** The office's comments on the report and its findings, read by the ship; the office writes them. */
export function CommentsPanel({ inspectionId, findings }: { inspectionId: string; findings: { id: string; number: number; label: string }[] }) {
  const [data, setData] = useState<{ comments: TComment[]; canComment: boolean } | null>(null);
  const [body, setBody] = useState("");
  const [findingId, setFindingId] = useState("");
  // After a send: a confirmation, or the refusal (the typed text is kept).
  const [result, setResult] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const load = useCallback(async () => {
    const res = await fetch(`/api/v1/inspections/${inspectionId}/comments`, { cache: "no-store" });
    if (res.ok) setData(await res.json());
  }, [inspectionId]);
  useEffect(() => { void load(); }, [load]);

  async function send(e: React.FormEvent) {
    e.preventDefault();
    const res = await postJson<{ notified: number }>(`/api/v1/inspections/${inspectionId}/comments`, { body, findingId });
    if (res.ok) {
      setBody("");
      setFindingId("");
      setResult({ tone: "success", text: commentAdded(res.body.notified) });
      await load();
    } else setResult({ tone: "error", text: res.message });
  }

  if (!data) return null;
  const office = data.comments.filter((c) => c.kind === "comment");
  if (!office.length && !data.canComment) return null;
  return (
    <section aria-label="Comments from the office" className="rounded-lg border border-slate-200 bg-white p-4 text-sm">
      <h2 className="font-semibold text-hull-900">Comments from the office</h2>
      {office.length ? (
        <ul className="mt-2 space-y-2">
          {office.map((c) => (
            <li key={c.id} data-testid="comment" className="border-l-4 border-slate-300 pl-2">
              <p className="text-xs text-slate-600">{c.authorName}{c.authorRank ? `, ${c.authorRank}` : ""} · {c.createdAt.slice(0, 16).replace("T", " ")} UTC{c.findingNumber ? ` · on finding ${c.findingNumber}` : " · on the report"}</p>
              <p className="whitespace-pre-line">{c.body}</p>
            </li>
          ))}
        </ul>
      ) : <p className="mt-1 text-slate-600">No comments yet.</p>}
      {data.canComment ? (
        <form onSubmit={send} className="mt-3 space-y-2" aria-label="Add a comment">
          {result ? <Notice tone={result.tone}>{result.text}</Notice> : null}
          <div className="flex flex-wrap gap-2">
            <label className="block">
              <span className="block font-semibold text-slate-800">About</span>
              <select value={findingId} onChange={(e) => setFindingId(e.target.value)} className="mt-1 rounded-md border border-slate-300 px-2 py-2">
                <option value="">the whole report</option>
                {findings.map((f) => <option key={f.id} value={f.id}>finding {f.number}: {f.label}</option>)}
              </select>
            </label>
          </div>
          <label className="block">
            <span className="block font-semibold text-slate-800">Comment</span>
            <textarea value={body} onChange={(e) => setBody(e.target.value)} rows={3} className="mt-1 block w-full rounded-md border border-slate-300 p-2" required />
          </label>
          <Button type="submit" variant="secondary">Add the comment (the ship is told by e-mail)</Button>
        </form>
      ) : null}
    </section>
  );
}
