"use client";

import { useMemo } from "react";
import { Button } from "@/components/ui/button";
import { overviewCandidates } from "@/lib/photos/order";
import { photoCaptionSchema } from "@/lib/schemas/photo";
import { formatFrames } from "@/lib/structure/frames";
import { FINDING_TYPE_LABELS, MEMBER_KIND_LABELS, MEMBER_KINDS, PHOTO_KIND_LABELS, PLATING_REGION_LABELS, PLATING_REGIONS } from "@/lib/vocabulary";
import { Input, PartStatus, Select } from "./inputs";
import type { TView } from "./types";
import { usePart } from "./use-part";

type TPhoto = TView["photos"][number];
type TCaption = { kind: string; frameFrom: string; frameTo: string; memberKind: string; platingRegion: string; memberNumber: string; findingId: string; overviewPhotoId: string; caption: string };
const str = (v: number | string | null) => (v === null ? "" : String(v));

export function PhotoCard({ view, photo, position, onMove, onDelete, editable }: {
  view: TView;
  photo: TPhoto;
  position: string;
  onMove: (dir: -1 | 1) => void;
  onDelete: () => void;
  editable: boolean;
}) {
  const peers = view.photos;
  const schema = useMemo(
    () => photoCaptionSchema({ catalogue: view.catalogue, photoId: photo.id, peers, findingIds: view.findings.map((f) => f.id) }),
    [view.catalogue, photo.id, peers, view.findings],
  );
  const part = usePart<TCaption>({
    part: `photo:${photo.id}`,
    url: `/api/v1/inspections/${view.inspection.id}/photos/${photo.id}`,
    initial: {
      kind: photo.caption ? photo.kind : "", frameFrom: str(photo.frameFrom), frameTo: str(photo.frameTo), memberKind: str(photo.memberKind), platingRegion: str(photo.platingRegion),
      memberNumber: str(photo.memberNumber), findingId: str(photo.findingId), overviewPhotoId: str(photo.overviewPhotoId), caption: str(photo.caption),
    },
    schema,
    toBody: (v) => Object.fromEntries(Object.entries(v).filter(([, x]) => x !== "")),
  });
  const v = part.value;
  const set = (p: Partial<TCaption>) => part.update({ ...v, ...p });
  const e = (k: string) => part.errors[k];
  const from = Number(v.frameFrom), to = Number(v.frameTo);
  const span = v.frameFrom !== "" && v.frameTo !== "" && Number.isFinite(from) && Number.isFinite(to) ? { frameFrom: from, frameTo: to } : null;
  const candidates = span ? overviewCandidates(peers, span, photo.id) : peers.filter((p) => p.kind === "overview" && p.id !== photo.id && p.caption);
  const idp = `photo-${photo.id}`;
  const label = (p: TPhoto) => `${p.frameFrom !== null ? formatFrames(p.frameFrom, p.frameTo!) : "uncaptioned"} · ${p.caption ?? p.fileLabel ?? "photo"}`;

  return (
    <li id={idp} tabIndex={-1} data-testid="photo-card" data-kind={photo.kind} className={`grid gap-3 rounded-lg border bg-white p-3 md:grid-cols-[200px_1fr] ${photo.kind === "close_up" ? "ml-6 border-slate-300 border-l-4" : "border-slate-400"}`}>
      <div className="space-y-1">
        {photo.thumbUrl ? (
          <a href={photo.reportUrl ?? "#"} target="_blank" rel="noreferrer">
            {/* eslint-disable-next-line @next/next/no-img-element -- a short-lived storage URL, not an optimisable asset */}
            <img src={photo.thumbUrl} alt={photo.caption ?? `Photo ${position}, not captioned yet`} className="h-auto w-full rounded border border-slate-200" loading="lazy" />
          </a>
        ) : (
          <div className="flex h-32 items-center justify-center rounded border border-dashed border-slate-300 text-center text-xs text-slate-600" data-testid="photo-placeholder">
            {photo.status === "processing" ? "Making the report copy…" : photo.status === "rejected" ? photo.statusMessage : "The upload did not finish: delete this and upload the file again."}
          </div>
        )}
        <p className="text-xs text-slate-600">
          {position} · {photo.fileLabel}
          {photo.width ? ` · ${photo.width} × ${photo.height}` : ""}
          {photo.capturedAt ? ` · taken ${String(photo.capturedAt).slice(0, 16).replace("T", " ")} UTC` : ""}
        </p>
        {editable ? (
          <div className="flex flex-wrap gap-1">
            <Button type="button" variant="secondary" className="min-h-8 px-2 py-1" onClick={() => onMove(-1)} aria-label={`Move photo ${position} up`}>↑</Button>
            <Button type="button" variant="secondary" className="min-h-8 px-2 py-1" onClick={() => onMove(1)} aria-label={`Move photo ${position} down`}>↓</Button>
            <Button type="button" variant="danger" className="min-h-8 px-2 py-1" onClick={onDelete}>Delete</Button>
          </div>
        ) : null}
      </div>
      {photo.status === "ready" || photo.status === "processing" ? (
        <fieldset disabled={!editable} className="grid content-start gap-3 sm:grid-cols-3">
          <legend className="sr-only">Caption of photo {position}</legend>
          <Select id={`${idp}-kind`} label="Kind" value={v.kind} onChange={(x) => set({ kind: x, overviewPhotoId: x === "close_up" ? v.overviewPhotoId : "" })} error={e("kind")}
            options={[{ value: "", label: "— overview or close-up —" }, { value: "overview", label: PHOTO_KIND_LABELS.overview }, { value: "close_up", label: PHOTO_KIND_LABELS.close_up }]} />
          <Input id={`${idp}-frameFrom`} label="From frame" inputMode="numeric" value={v.frameFrom} onChange={(ev) => set({ frameFrom: ev.target.value })} error={e("frameFrom")} />
          <Input id={`${idp}-frameTo`} label="To frame" inputMode="numeric" value={v.frameTo} onChange={(ev) => set({ frameTo: ev.target.value })} error={e("frameTo")} />
          <Select id={`${idp}-memberKind`} label="Member" value={v.memberKind} onChange={(x) => set({ memberKind: x })} error={e("memberKind")}
            options={[{ value: "", label: "— choose the member —" }, ...MEMBER_KINDS.map((m) => ({ value: m, label: MEMBER_KIND_LABELS[m] }))]} />
          <Select id={`${idp}-platingRegion`} label="Plating region" value={v.platingRegion} onChange={(x) => set({ platingRegion: x })} error={e("platingRegion")}
            options={[{ value: "", label: "—" }, ...PLATING_REGIONS.map((r) => ({ value: r, label: PLATING_REGION_LABELS[r] }))]} />
          <Input id={`${idp}-memberNumber`} label="Member number" inputMode="numeric" value={v.memberNumber} onChange={(ev) => set({ memberNumber: ev.target.value })} error={e("memberNumber")} />
          <Select id={`${idp}-findingId`} label="Shows finding" value={v.findingId} onChange={(x) => set({ findingId: x })} error={e("findingId")}
            options={[{ value: "", label: "— none —" }, ...view.findings.map((f) => ({ value: f.id, label: `${f.number}. ${FINDING_TYPE_LABELS[f.type]} · ${formatFrames(f.frameFrom, f.frameTo)}` }))]} />
          {v.kind === "close_up" ? (
            <div className="sm:col-span-2">
              <Select id={`${idp}-overviewPhotoId`} label="Overview of the same place" value={v.overviewPhotoId} onChange={(x) => set({ overviewPhotoId: x })} error={e("overviewPhotoId")}
                options={[{ value: "", label: candidates.length ? "— choose the overview —" : "— no overview covers these frames yet —" }, ...candidates.map((p) => ({ value: p.id, label: label(p) }))]} />
            </div>
          ) : null}
          <div className="sm:col-span-3">
            <Input id={`${idp}-caption`} label="What it shows" value={v.caption} onChange={(ev) => set({ caption: ev.target.value })} error={e("caption")}
              hint="e.g. Crack 120 mm at the toe of the bracket, inner bottom long. 7" />
          </div>
          <div className="sm:col-span-3"><PartStatus refused={part.refused} errors={part.errors} dirty={part.dirty} /></div>
        </fieldset>
      ) : null}
    </li>
  );
}
