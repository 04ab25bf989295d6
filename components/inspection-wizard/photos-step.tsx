"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import { Notice } from "@/components/ui/notice";
import { formatFrames } from "@/lib/structure/frames";
import { FINDING_TYPE_LABELS } from "@/lib/vocabulary";
import { Input, Select } from "./inputs";
import { PhotoCard } from "./photo-card";
import { PhotoUploader } from "./photo-uploader";
import { useSync } from "./sync";
import { partUrl, type TView } from "./types";

type TPhoto = TView["photos"][number];

/** Moves a photo one place: an overview with its close-ups past the next overview, a close-up among its siblings. */
export function movedOrder(photos: readonly TPhoto[], id: string, dir: -1 | 1): string[] {
  const blocks: TPhoto[][] = [];
  for (const p of photos) {
    if (p.kind === "close_up" && p.overviewPhotoId && blocks.length && blocks.at(-1)![0]!.id === p.overviewPhotoId) blocks.at(-1)!.push(p);
    else if (p.kind === "close_up" && p.overviewPhotoId && blocks.some((b) => b[0]!.id === p.overviewPhotoId)) blocks.find((b) => b[0]!.id === p.overviewPhotoId)!.push(p);
    else blocks.push([p]);
  }
  const bi = blocks.findIndex((b) => b.some((p) => p.id === id));
  if (bi < 0) return photos.map((p) => p.id);
  const block = blocks[bi]!;
  if (block[0]!.id === id) {
    const to = bi + dir;
    if (to >= 0 && to < blocks.length) [blocks[bi], blocks[to]] = [blocks[to]!, block];
  } else {
    const i = block.findIndex((p) => p.id === id), to = i + dir;
    if (to >= 1 && to < block.length) [block[i], block[to]] = [block[to]!, block[i]!];
  }
  return blocks.flat().map((p) => p.id);
}

export function PhotosStep({ view, editable = true }: { view: TView; editable?: boolean }) {
  const sync = useSync();
  const queryClient = useQueryClient();
  const [frame, setFrame] = useState("");
  const [finding, setFinding] = useState("");
  const [order, setOrder] = useState<string[] | null>(null);
  const busy = view.photos.some((p) => p.status === "processing");

  useEffect(() => {
    if (!busy) return;
    const t = window.setInterval(() => void queryClient.invalidateQueries({ queryKey: ["inspection", view.inspection.id] }), 2000);
    return () => window.clearInterval(t);
  }, [busy, queryClient, view.inspection.id]);

  // A reorder shows at once; the server's order takes over once it has it.
  const serverIds = view.photos.map((p) => p.id).join();
  useEffect(() => setOrder(null), [serverIds]);
  const photos = order ? order.map((id) => view.photos.find((p) => p.id === id)).filter((p): p is TPhoto => Boolean(p)) : view.photos;
  const position = new Map(photos.map((p, i) => [p.id, i + 1]));

  const frameNumber = frame.trim() === "" ? null : Number(frame);
  const shown = photos.filter(
    (p) =>
      (frameNumber === null || Number.isNaN(frameNumber) || (p.frameFrom !== null && p.frameTo !== null && p.frameFrom <= frameNumber && frameNumber <= p.frameTo)) &&
      (!finding || p.findingId === finding),
  );
  const move = (id: string, dir: -1 | 1) => {
    const next = movedOrder(photos, id, dir);
    setOrder(next);
    sync.enqueue({ part: "photo-order", url: partUrl(view.inspection.id, "photo-order"), method: "PUT", body: { order: next } });
  };
  const remove = (p: TPhoto) => {
    const closeUps = photos.filter((c) => c.overviewPhotoId === p.id).length;
    if (closeUps) {
      window.alert(`${closeUps} close-up${closeUps > 1 ? "s name" : " names"} this overview: delete ${closeUps > 1 ? "them" : "it"} or choose another overview first.`);
      return;
    }
    if (!window.confirm(`Delete photo ${position.get(p.id)} (${p.fileLabel ?? "photo"})? Its files are removed from storage.`)) return;
    setOrder(photos.filter((x) => x.id !== p.id).map((x) => x.id));
    sync.drafts.drop(`photo:${p.id}`);
    sync.enqueue({ part: `photo-delete:${p.id}`, url: `/api/v1/inspections/${view.inspection.id}/photos/${p.id}`, method: "DELETE", body: {} });
  };
  const needClose = view.blockers.filter((b) => b.field.startsWith("finding-photo-"));

  return (
    <div className="space-y-4" id="photos" tabIndex={-1}>
      {editable ? <PhotoUploader inspectionId={view.inspection.id} /> : null}
      <p className="text-sm text-slate-700">
        Caption every photo with its frames and member. A close-up names the overview of the same place; in the report each overview is followed by its close-ups.
        Originals stay in storage; the report uses a smaller copy.
      </p>
      {needClose.length ? (
        <Notice tone="caution" title="Findings without a close-up">
          <ul className="list-disc pl-5">{needClose.map((b) => <li key={b.field}>{b.message.replace(/^Photos: /, "")}</li>)}</ul>
        </Notice>
      ) : null}
      {view.photos.length ? (
        <>
          <div className="grid gap-3 sm:grid-cols-3" role="search" aria-label="Filter photos">
            <Input id="photo-filter-frame" label="Show photos at frame" inputMode="numeric" value={frame} onChange={(e) => setFrame(e.target.value)} hint={`${formatFrames(view.tank.frameFrom, view.tank.frameTo)} in this tank`} />
            <Select id="photo-filter-finding" label="Show photos of finding" value={finding} onChange={setFinding}
              options={[{ value: "", label: "— all photos —" }, ...view.findings.map((f) => ({ value: f.id, label: `${f.number}. ${FINDING_TYPE_LABELS[f.type]} · ${formatFrames(f.frameFrom, f.frameTo)}` }))]} />
            <p className="self-end text-sm text-slate-700" aria-live="polite">{shown.length} of {photos.length} photo{photos.length === 1 ? "" : "s"} shown</p>
          </div>
          <ol aria-label="Gallery" className="space-y-3">
            {shown.map((p) => (
              <PhotoCard key={p.id} view={view} photo={p} position={String(position.get(p.id))} editable={editable} onMove={(d) => move(p.id, d)} onDelete={() => remove(p)} />
            ))}
          </ol>
        </>
      ) : (
        <Notice>No photos yet. Start with an overview of each place, then the close-ups of what you found there.</Notice>
      )}
    </div>
  );
}
