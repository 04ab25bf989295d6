import { z } from "zod";
import { checkFreeText } from "@/lib/rules/vagueness";
import { checkMemberReference, type TCatalogue } from "@/lib/structure/catalogue";
import { spanInside } from "@/lib/structure/frames";
import { DRAWING_TYPES, DRAWING_MAX_BYTES, formatBytes, PHOTO_MAX_BYTES, PHOTO_TYPES } from "@/lib/uploads/limits";
import { DRAWING_KINDS, MEMBER_KINDS, PHOTO_KINDS, PLATING_REGIONS } from "@/lib/vocabulary";
import { numberFromForm, wholeNumber } from "./common";

const blankToUndefined = (v: unknown) => (v === "" || v === null ? undefined : v);
const frame = z.preprocess(numberFromForm, wholeNumber("a frame number").min(-50).max(1000));

/** What the browser declares before it uploads a file: checked again against the bytes once they arrive. */
const uploadRequest = (types: readonly string[], maxBytes: number, what: string) =>
  z.object({
    id: z.uuid({ error: "is required: a new id for the file" }),
    fileName: z.string({ error: "is required" }).trim().min(1, "is required").max(200, "must be at most 200 characters"),
    contentType: z.string({ error: "is required" }).refine((t) => types.includes(t), `must be ${types.map((t) => t.replace(/^\w+\//, "").toUpperCase()).join(", ")}`),
    sizeBytes: z
      .number({ error: "is required: the file's size in bytes" })
      .int()
      .min(1, "the file is empty (0 bytes)")
      .max(maxBytes, `${what} of up to ${formatBytes(maxBytes)} are accepted`),
  });

export const ZPhotoUploadRequest = uploadRequest(PHOTO_TYPES, PHOTO_MAX_BYTES, "photos");
export type TPhotoUploadRequest = z.infer<typeof ZPhotoUploadRequest>;

export const ZDrawingUploadRequest = uploadRequest(DRAWING_TYPES, DRAWING_MAX_BYTES, "drawings").extend({
  kind: z.enum(DRAWING_KINDS, { error: "choose the kind of drawing" }),
  title: z.string({ error: "is required" }).trim().min(3, "give the drawing's title, e.g. its number and name").max(160),
});
export type TDrawingUploadRequest = z.infer<typeof ZDrawingUploadRequest>;

/** The other photos of the inspection, as far as a caption needs them. */
export type TPhotoPeer = { id: string; kind: "overview" | "close_up"; frameFrom: number | null; frameTo: number | null };

/**
 * A caption that places the photo: kind, frames inside the tank, a member of its
 * catalogue, optionally the finding it shows, and a short text held to the same
 * vagueness rules as a finding. A close-up names the overview of the same place
 * (the same or an enclosing frame range).
 */
export function photoCaptionSchema(ctx: { catalogue: TCatalogue; photoId: string; peers: readonly TPhotoPeer[]; findingIds: readonly string[] }) {
  return z
    .object({
      kind: z.enum(PHOTO_KINDS, { error: "say whether this is an overview or a close-up" }),
      frameFrom: frame,
      frameTo: frame,
      memberKind: z.enum(MEMBER_KINDS, { error: "choose the structural member in the photo" }),
      platingRegion: z.preprocess(blankToUndefined, z.enum(PLATING_REGIONS, { error: "is not a known plating region" }).optional()),
      memberNumber: z.preprocess(numberFromForm, wholeNumber("a member number").min(0).max(9999).optional()),
      findingId: z.preprocess(blankToUndefined, z.uuid({ error: "is not a finding of this inspection" }).optional()),
      overviewPhotoId: z.preprocess(blankToUndefined, z.uuid({ error: "choose the overview photo" }).optional()),
      caption: z.string({ error: "is required" }).trim().min(1, "is required: say what the photo shows").max(300, "must be at most 300 characters"),
    })
    .superRefine((p, issue) => {
      const place = checkMemberReference(ctx.catalogue, p);
      if (place) issue.addIssue({ code: "custom", path: [place.path], message: place.message });
      if (p.findingId && !ctx.findingIds.includes(p.findingId)) issue.addIssue({ code: "custom", path: ["findingId"], message: "is not a finding of this inspection" });
      if (p.kind === "close_up") {
        const overview = ctx.peers.find((o) => o.id === p.overviewPhotoId);
        if (!p.overviewPhotoId) issue.addIssue({ code: "custom", path: ["overviewPhotoId"], message: "a close-up needs the overview photo of the same place: take or choose the overview first" });
        else if (!overview || overview.id === ctx.photoId || overview.kind !== "overview") issue.addIssue({ code: "custom", path: ["overviewPhotoId"], message: "is not an overview photo of this inspection" });
        else if (overview.frameFrom === null || overview.frameTo === null || !spanInside({ frameFrom: p.frameFrom, frameTo: p.frameTo }, { frameFrom: overview.frameFrom, frameTo: overview.frameTo })) {
          issue.addIssue({ code: "custom", path: ["overviewPhotoId"], message: "shows other frames: the overview must cover the close-up's frames" });
        }
      } else if (p.overviewPhotoId) {
        issue.addIssue({ code: "custom", path: ["overviewPhotoId"], message: "only a close-up names an overview" });
      }
      const text = checkFreeText(p.caption, { location: !place, extent: true }, "The caption");
      if (!text.ok) issue.addIssue({ code: "custom", path: ["caption"], message: text.message });
    }, { when: (s) => typeof (s.value as { frameFrom?: unknown })?.frameFrom === "number" && typeof (s.value as { memberKind?: unknown }).memberKind === "string" });
}
export type TPhotoCaptionInput = z.infer<ReturnType<typeof photoCaptionSchema>>;

export const ZPhotoOrderInput = z.object({ order: z.array(z.uuid()).max(1000) });
