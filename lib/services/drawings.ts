import "server-only";
// A vessel's drawings (general arrangement, midship section, shell expansion):
// uploaded by the browser straight to storage, checked by their bytes, listed
// on the vessel page and linked from the brief.
import { createHash } from "node:crypto";
import { z } from "zod";
import * as q from "@/db/queries/drawings";
import type { TActor } from "@/lib/auth/actor";
import { authorizeVessel } from "@/lib/auth/authorize";
import { serverEnv } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { probePhoto } from "@/lib/photos/image";
import { ZDrawingUploadRequest } from "@/lib/schemas/photo";
import { drawingKey } from "@/lib/storage/keys";
import { deleteObjects, presignDownload, presignUpload, readObject, statObject } from "@/lib/storage/s3";
import { DRAWING_MAX_BYTES, formatBytes } from "@/lib/uploads/limits";
import { pdfLooksComplete, sniffContentType } from "@/lib/uploads/sniff";
import { STRUCTURE_EDITORS } from "./tanks";
import { fileLabel, validateUploadRequest } from "./uploads";
import { VESSEL_READERS } from "./vessels";

const checkDrawingId = (id: string) => {
  if (!z.uuid().safeParse(id).success) throw new AppError("not_found", "No such drawing.");
};

export const drawingFileUrl = (vesselId: string, drawingId: string) => `/api/v1/vessels/${vesselId}/drawings/${drawingId}/file`;

export async function listDrawingsAs(actor: TActor, vesselId: string) {
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: VESSEL_READERS });
  return (await q.listDrawings({ orgId, vesselId })).map((d) => ({ ...d, url: drawingFileUrl(vesselId, d.id) }));
}

export async function presignDrawingAs(actor: TActor, vesselId: string, body: unknown) {
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: STRUCTURE_EDITORS });
  const input = validateUploadRequest(ZDrawingUploadRequest, body);
  const ttl = serverEnv().UPLOAD_URL_TTL_SECONDS;
  const objectKey = drawingKey({ orgId, vesselId, drawingId: input.id });
  const row =
    (await q.announceDrawing({
      orgId, vesselId, drawingId: input.id, kind: input.kind, title: input.title, objectKey, contentType: input.contentType, sizeBytes: input.sizeBytes,
      fileLabel: fileLabel(input.fileName), uploadedBy: actor.userId, uploadExpiresAt: new Date(Date.now() + (ttl + 3600) * 1000),
    })) ?? (await q.getDrawing({ orgId, vesselId, drawingId: input.id }));
  if (!row || row.status !== "awaiting_upload" || row.sizeBytes !== input.sizeBytes || row.contentType !== input.contentType) {
    throw new AppError("conflict", "This drawing id is already in use.", [{ path: "id", message: "is already used" }]);
  }
  const upload = await presignUpload({ key: row.objectKey, contentType: input.contentType, sizeBytes: input.sizeBytes, expiresIn: ttl });
  return { drawing: { id: row.id, kind: row.kind, title: row.title, status: row.status }, upload, expiresAt: new Date(Date.now() + ttl * 1000).toISOString() };
}

/** The upload is done: a real PDF, PNG or JPEG within the limits is kept; anything else is deleted with a clear message. */
export async function completeDrawingAs(actor: TActor, vesselId: string, drawingId: string) {
  checkDrawingId(drawingId);
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: STRUCTURE_EDITORS });
  const row = await q.getDrawing({ orgId, vesselId, drawingId });
  if (!row) throw new AppError("not_found", "No such drawing.");
  const done = { id: row.id, kind: row.kind, title: row.title, status: "ready" as const, url: drawingFileUrl(vesselId, row.id) };
  if (row.status === "ready") return done;
  const stat = await statObject(row.objectKey);
  if (!stat) throw new AppError("conflict", "The file has not reached storage: upload it again.", [{ path: "upload", message: "no file was uploaded" }]);
  const refuse = async (code: "bad_request" | "payload_too_large" | "unsupported_media_type", message: string): Promise<never> => {
    await deleteObjects([row.objectKey]);
    await q.deleteDrawing({ orgId, vesselId, drawingId });
    throw new AppError(code, message, [{ path: "file", message }]);
  };
  if (stat.sizeBytes === 0) return refuse("bad_request", "The file is empty (0 bytes).");
  if (stat.sizeBytes > DRAWING_MAX_BYTES) return refuse("payload_too_large", `The file is ${formatBytes(stat.sizeBytes)}; drawings of up to ${formatBytes(DRAWING_MAX_BYTES)} are accepted.`);
  if (stat.sizeBytes !== row.sizeBytes) return refuse("bad_request", `The file that arrived (${formatBytes(stat.sizeBytes)}) is not the one announced (${formatBytes(row.sizeBytes)}); upload it again.`);
  const bytes = await readObject(row.objectKey, DRAWING_MAX_BYTES);
  const type = sniffContentType(bytes);
  if (type === "application/pdf") {
    if (!pdfLooksComplete(bytes)) return refuse("unsupported_media_type", "This PDF is incomplete (it has no end-of-file marker). Upload it again.");
  } else if (type === "image/png" || type === "image/jpeg") {
    const probe = await probePhoto(bytes);
    if (!probe.ok) return refuse(probe.refusal.status === 413 ? "payload_too_large" : "unsupported_media_type", probe.refusal.message);
  } else {
    return refuse("unsupported_media_type", "This file is not a PDF, PNG or JPEG drawing, whatever its name says.");
  }
  await q.markDrawingReady({ orgId, vesselId, drawingId, contentType: type, sha256: createHash("sha256").update(bytes).digest("hex"), actorUserId: actor.userId });
  return done;
}

export async function drawingFileUrlAs(actor: TActor, vesselId: string, drawingId: string) {
  checkDrawingId(drawingId);
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: VESSEL_READERS });
  const row = await q.getDrawing({ orgId, vesselId, drawingId });
  if (!row || row.status !== "ready") throw new AppError("not_found", "No such drawing.");
  const ext = row.contentType === "application/pdf" ? "pdf" : row.contentType === "image/png" ? "png" : "jpg";
  return presignDownload({ key: row.objectKey, fileName: `${row.title}.${ext}`, inline: true, contentType: row.contentType });
}

export async function deleteDrawingAs(actor: TActor, vesselId: string, drawingId: string) {
  checkDrawingId(drawingId);
  const { orgId } = await authorizeVessel({ actor, vesselId, allow: STRUCTURE_EDITORS });
  const row = await q.deleteDrawing({ orgId, vesselId, drawingId, actorUserId: actor.userId });
  if (!row) throw new AppError("not_found", "No such drawing.");
  await deleteObjects([row.objectKey]);
  return { ok: true };
}
