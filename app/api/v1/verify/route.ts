import { AppError } from "@/lib/errors";
import { readJsonValue, route } from "@/lib/http/route";
import { VERIFY_MAX_BYTES } from "@/lib/schemas/signing";
import { verifyFile, verifyFingerprint } from "@/lib/services/verify";

/**
 * Is this a signed Tankwright report? Open without signing in: it tells only
 * vessel, tank, date and revision. Body: JSON { fingerprint }, or the PDF
 * itself (application/pdf or multipart/form-data with a "file" field).
 */
export const POST = route(async (req) => {
  const type = req.headers.get("content-type") ?? "";
  if (type.startsWith("application/json")) return verifyFingerprint(await readJsonValue(req));
  // Refuse an oversized upload from its declared length, before reading it.
  const declared = Number(req.headers.get("content-length") ?? 0);
  if (declared > VERIFY_MAX_BYTES + 64 * 1024) throw new AppError("payload_too_large", `The file is larger than ${VERIFY_MAX_BYTES / 1024 / 1024} MB: a signed report is much smaller. Check that you chose the right file.`);
  if (type.startsWith("multipart/form-data")) {
    const file = (await req.formData()).get("file");
    if (!(file instanceof File)) throw new AppError("bad_request", "Choose the PDF file to check.", [{ path: "file", message: "is required" }]);
    return verifyFile(new Uint8Array(await file.arrayBuffer()));
  }
  return verifyFile(new Uint8Array(await req.arrayBuffer()));
});
