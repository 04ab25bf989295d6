// A photo as the browser sees it: app URLs for its files, never storage keys.
import type { photos } from "@/db/schema";

export function publicPhoto(p: typeof photos.$inferSelect) {
  const base = `/api/v1/inspections/${p.inspectionId}/photos/${p.id}/file`;
  return {
    id: p.id, kind: p.kind, status: p.status, statusMessage: p.statusMessage,
    frameFrom: p.frameFrom, frameTo: p.frameTo, platingRegion: p.platingRegion, memberKind: p.memberKind, memberNumber: p.memberNumber,
    findingId: p.findingId, overviewPhotoId: p.overviewPhotoId, caption: p.caption,
    width: p.width, height: p.height, sizeBytes: p.sizeBytes, capturedAt: p.capturedAt, fileLabel: p.fileLabel, sortOrder: p.sortOrder,
    thumbUrl: p.status === "ready" ? `${base}?variant=thumb` : null,
    reportUrl: p.status === "ready" ? `${base}?variant=report` : null,
    originalUrl: p.status === "ready" || p.status === "processing" ? `${base}?variant=original` : null,
  };
}
export type TPublicPhoto = ReturnType<typeof publicPhoto>;

