"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { uploadDirect, UploadError } from "@/components/uploads/direct-upload";
import { formatBytes, PHOTO_MAX_BYTES, PHOTO_TYPES } from "@/lib/uploads/limits";

type TItem = { key: string; photoId: string; file: File; progress: number; state: "waiting" | "uploading" | "checking" | "done" | "failed"; message?: string };
const PARALLEL = 2;

/**
 * Picks or takes photos and uploads several at once, straight to storage, each
 * with its progress bar and a retry button when it fails.
 */
export function PhotoUploader({ inspectionId }: { inspectionId: string }) {
  const queryClient = useQueryClient();
  const [items, setItems] = useState<TItem[]>([]);
  const itemsRef = useRef<TItem[]>([]);
  const pick = useRef<HTMLInputElement>(null);
  const camera = useRef<HTMLInputElement>(null);

  const patch = (key: string, p: Partial<TItem>) => {
    itemsRef.current = itemsRef.current.map((i) => (i.key === key ? { ...i, ...p } : i));
    setItems(itemsRef.current);
  };

  function pump() {
    while (itemsRef.current.filter((i) => i.state === "uploading" || i.state === "checking").length < PARALLEL) {
      const next = itemsRef.current.find((i) => i.state === "waiting");
      if (!next) return;
      patch(next.key, { state: "uploading", progress: 0, message: undefined });
      void run(next);
    }
  }

  async function run(item: TItem) {
    try {
      await uploadDirect({
        announceUrl: `/api/v1/inspections/${inspectionId}/photos`,
        announceBody: { id: item.photoId },
        completeUrl: `/api/v1/inspections/${inspectionId}/photos/${item.photoId}/complete`,
        file: item.file,
        onProgress: (f) => patch(item.key, { progress: f, state: f >= 1 ? "checking" : "uploading" }),
      });
      patch(item.key, { state: "done", progress: 1 });
    } catch (error) {
      const message = error instanceof UploadError ? error.message : "The upload failed.";
      patch(item.key, { state: "failed", message });
    }
    await queryClient.invalidateQueries({ queryKey: ["inspection", inspectionId] });
    pump();
  }

  function add(files: FileList | null) {
    if (!files?.length) return;
    const added = [...files].map<TItem>((file) => {
      const tooBig = file.size > PHOTO_MAX_BYTES;
      const wrongType = !(PHOTO_TYPES as readonly string[]).includes(file.type);
      const message = tooBig ? `This file is ${formatBytes(file.size)}; photos of up to ${formatBytes(PHOTO_MAX_BYTES)} are accepted.` : wrongType ? `${file.type || "This file"} is not a JPEG, PNG or WebP photo.` : undefined;
      return { key: crypto.randomUUID(), photoId: crypto.randomUUID(), file, progress: 0, state: message ? "failed" : "waiting", message };
    });
    itemsRef.current = [...itemsRef.current, ...added];
    setItems(itemsRef.current);
    pump();
  }

  const retry = (item: TItem) => {
    // A refused file is gone from the server; a retry announces it again under a new id.
    patch(item.key, { state: "waiting", progress: 0, photoId: crypto.randomUUID(), message: undefined });
    pump();
  };

  const visible = items.filter((i) => i.state !== "done");
  return (
    <div className="space-y-3 rounded-lg border border-slate-300 bg-white p-3">
      <div className="flex flex-wrap items-center gap-2">
        <Button type="button" onClick={() => camera.current?.click()}>Take a photo</Button>
        <Button type="button" variant="secondary" onClick={() => pick.current?.click()}>Choose photos…</Button>
        <span className="text-xs text-slate-600">JPEG, PNG or WebP, up to {formatBytes(PHOTO_MAX_BYTES)} each. Take the overview first, then the close-ups.</span>
        <input ref={camera} data-testid="photo-camera" type="file" accept="image/*" capture="environment" className="hidden" onChange={(e) => { add(e.target.files); e.target.value = ""; }} />
        <input ref={pick} data-testid="photo-files" type="file" accept={PHOTO_TYPES.join(",")} multiple className="hidden" onChange={(e) => { add(e.target.files); e.target.value = ""; }} />
      </div>
      {visible.length ? (
        <ul aria-label="Uploads" className="space-y-2">
          {visible.map((i) => (
            <li key={i.key} className="text-sm" data-testid="upload-item">
              <div className="flex items-center justify-between gap-2">
                <span className="truncate font-semibold">{i.file.name} <span className="font-normal text-slate-600">({formatBytes(i.file.size)})</span></span>
                <span className="shrink-0 text-xs">
                  {i.state === "waiting" ? "Waiting" : i.state === "uploading" ? `${Math.round(i.progress * 100)} %` : i.state === "checking" ? "Checking…" : "Failed"}
                </span>
              </div>
              <progress className="h-2 w-full" max={1} value={i.progress} aria-label={`Upload of ${i.file.name}`} />
              {i.state === "failed" ? (
                <div role="alert" className="mt-1 flex flex-wrap items-center gap-2 text-red-800">
                  <span>{i.message}</span>
                  <Button type="button" variant="secondary" onClick={() => retry(i)}>Retry</Button>
                  <Button type="button" variant="secondary" onClick={() => { itemsRef.current = itemsRef.current.filter((x) => x.key !== i.key); setItems(itemsRef.current); }}>Dismiss</Button>
                </div>
              ) : null}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
