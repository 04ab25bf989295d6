// The key scheme of object storage. The server chooses every key, prefixed by
// company and vessel; a file name from the browser is only ever a label.

export type TPhotoVariant = "original" | "report" | "thumb";

export function photoKey(p: { orgId: string; vesselId: string; inspectionId: string; photoId: string }, variant: TPhotoVariant): string {
  const name = variant === "original" ? "original" : `${variant}.jpg`;
  return `org/${p.orgId}/vessel/${p.vesselId}/inspection/${p.inspectionId}/photo/${p.photoId}/${name}`;
}

export function drawingKey(p: { orgId: string; vesselId: string; drawingId: string }): string {
  return `org/${p.orgId}/vessel/${p.vesselId}/drawing/${p.drawingId}/original.pdf`;
}

/** The signed report of one revision; written once, never overwritten. */
export function signedReportKey(p: { orgId: string; vesselId: string; inspectionId: string; revision: number }): string {
  return `org/${p.orgId}/vessel/${p.vesselId}/inspection/${p.inspectionId}/report/revision-${p.revision}.pdf`;
}

/** A drawn signature (PNG) given when signing. */
export function signatureKey(p: { orgId: string; vesselId: string; inspectionId: string; signatureId: string }): string {
  return `org/${p.orgId}/vessel/${p.vesselId}/inspection/${p.inspectionId}/signature/${p.signatureId}.png`;
}
