import { z } from "zod";
import { AppError } from "@/lib/errors";
import { inspectionWrite } from "@/lib/http/inspection-write";
import { route } from "@/lib/http/route";

type P = { inspectionId: string; photoId: string };
const checkId = (id: string) => {
  if (!z.uuid().safeParse(id).success) throw new AppError("not_found", "No such photo.");
};

/** The photo's caption: kind, frames, member, finding, overview, text (a versioned inspection write). */
export const PUT = route<P>(async (req, { inspectionId, photoId }) => {
  checkId(photoId);
  return inspectionWrite(req, inspectionId, { kind: "photo", photoId });
});

/** Deletes the photo and its files while the inspection is a draft. */
export const DELETE = route<P>(async (req, { inspectionId, photoId }) => {
  checkId(photoId);
  return inspectionWrite(req, inspectionId, { kind: "delete-photo", photoId });
});
