"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { uploadDirect, UploadError } from "@/components/uploads/direct-upload";
import { DRAWING_MAX_BYTES, DRAWING_TYPES, formatBytes } from "@/lib/uploads/limits";
import { DRAWING_KIND_LABELS, DRAWING_KINDS, type TDrawingKind } from "@/lib/vocabulary";

type TDrawing = { id: string; kind: TDrawingKind; title: string; sizeBytes: number; contentType: string; createdAt: string; uploadedByName: string | null; url: string };
const box = "mt-1 block w-full rounded-md border border-slate-300 bg-white px-2 py-1.5 text-base";

/** The vessel's drawings: open in the browser; editors upload (straight to storage, with progress) and delete. */
export function DrawingList({ vesselId, drawings, canEdit }: { vesselId: string; drawings: TDrawing[]; canEdit: boolean }) {
  const router = useRouter();
  const [kind, setKind] = useState<TDrawingKind>("general_arrangement");
  const [title, setTitle] = useState("");
  const [file, setFile] = useState<File | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [message, setMessage] = useState<{ tone: "error" | "ok"; text: string } | null>(null);

  async function upload() {
    if (!file) return setMessage({ tone: "error", text: "Choose the drawing's file (PDF, PNG or JPEG)." });
    if (title.trim().length < 3) return setMessage({ tone: "error", text: "Give the drawing's title, e.g. its number and name." });
    if (file.size > DRAWING_MAX_BYTES) return setMessage({ tone: "error", text: `This file is ${formatBytes(file.size)}; drawings of up to ${formatBytes(DRAWING_MAX_BYTES)} are accepted.` });
    const id = crypto.randomUUID();
    setMessage(null);
    setProgress(0);
    try {
      await uploadDirect({
        announceUrl: `/api/v1/vessels/${vesselId}/drawings`, announceBody: { id, kind, title: title.trim() },
        completeUrl: `/api/v1/vessels/${vesselId}/drawings/${id}/complete`, file, onProgress: setProgress,
      });
      setMessage({ tone: "ok", text: `${title.trim()} is uploaded.` });
      setTitle("");
      setFile(null);
      router.refresh();
    } catch (error) {
      // The title and kind stay as typed; the file can be sent again.
      setMessage({ tone: "error", text: error instanceof UploadError ? error.message : "The upload failed." });
    } finally {
      setProgress(null);
    }
  }

  async function remove(d: TDrawing) {
    if (!window.confirm(`Delete the drawing "${d.title}"? Its file is removed from storage.`)) return;
    const res = await fetch(`/api/v1/vessels/${vesselId}/drawings/${d.id}`, { method: "DELETE" });
    if (!res.ok) setMessage({ tone: "error", text: ((await res.json().catch(() => ({}))) as { error?: { message?: string } }).error?.message ?? "The drawing could not be deleted." });
    router.refresh();
  }

  return (
    <div className="space-y-3">
      {drawings.length ? (
        <ul className="divide-y divide-slate-200 rounded-lg border border-slate-200 bg-white">
          {drawings.map((d) => (
            <li key={d.id} className="flex flex-wrap items-center justify-between gap-2 p-3 text-sm">
              <span>
                <a href={d.url} target="_blank" rel="noreferrer" className="font-semibold text-hull-800 underline">{d.title}</a>
                <span className="block text-xs text-slate-600">{DRAWING_KIND_LABELS[d.kind]} · {d.contentType === "application/pdf" ? "PDF" : d.contentType.replace("image/", "").toUpperCase()} · {formatBytes(d.sizeBytes)} · {d.createdAt.slice(0, 10)}{d.uploadedByName ? ` · ${d.uploadedByName}` : ""}</span>
              </span>
              {canEdit ? <Button type="button" variant="danger" onClick={() => remove(d)}>Delete</Button> : null}
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-slate-600">No drawings uploaded yet.</p>
      )}
      {canEdit ? (
        <form className="grid gap-3 rounded-lg border border-slate-200 bg-white p-3 sm:grid-cols-3" onSubmit={(e) => { e.preventDefault(); void upload(); }}>
          <label className="text-sm font-semibold">Kind
            <select className={box} value={kind} onChange={(e) => setKind(e.target.value as TDrawingKind)}>
              {DRAWING_KINDS.map((k) => <option key={k} value={k}>{DRAWING_KIND_LABELS[k]}</option>)}
            </select>
          </label>
          <label className="text-sm font-semibold">Title
            <input className={box} value={title} onChange={(e) => setTitle(e.target.value)} placeholder="e.g. 101-001 General arrangement" />
          </label>
          <label className="text-sm font-semibold">File (PDF, PNG or JPEG, up to {formatBytes(DRAWING_MAX_BYTES)})
            <input className={box} type="file" accept={DRAWING_TYPES.join(",")} data-testid="drawing-file" onChange={(e) => setFile(e.target.files?.[0] ?? null)} />
          </label>
          <div className="flex items-center gap-3 sm:col-span-3">
            <Button type="submit" disabled={progress !== null}>Upload drawing</Button>
            {progress !== null ? <progress className="h-2 w-48" max={1} value={progress} aria-label="Upload of the drawing" /> : null}
            {message ? <p role={message.tone === "error" ? "alert" : "status"} className={`text-sm ${message.tone === "error" ? "text-red-800" : "text-green-800"}`}>{message.text}</p> : null}
          </div>
        </form>
      ) : null}
    </div>
  );
}
