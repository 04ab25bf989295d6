import "server-only";
// What every direct upload shares: the declared file is checked before a URL is
// handed out, and a refused upload leaves nothing behind.
import type { z } from "zod";
import { AppError, issuesFromZod } from "@/lib/errors";

/**
 * Validates an upload request: a type we do not take is 415, a file over the
 * limit 413, anything else 400; each with the field it concerns.
 */
export function validateUploadRequest<S extends z.ZodType>(schema: S, body: unknown): z.infer<S> {
  const parsed = schema.safeParse(body);
  if (parsed.success) return parsed.data;
  const issues = issuesFromZod(parsed.error.issues);
  const first = issues[0]!;
  const tooLarge = parsed.error.issues.find((i) => i.path[0] === "sizeBytes" && i.code === "too_big");
  if (tooLarge) throw new AppError("payload_too_large", `The file is too large: ${tooLarge.message}.`, issues);
  if (issues.some((i) => i.path === "contentType") && typeof (body as { contentType?: unknown })?.contentType === "string") {
    const t = issues.find((i) => i.path === "contentType")!;
    throw new AppError("unsupported_media_type", `This type of file is not accepted: it ${t.message}.`, issues);
  }
  throw new AppError("bad_request", `Check ${first.path}: ${first.message}`, issues);
}

/** The label to keep for a file the browser named: no paths, no control characters. */
export function fileLabel(name: string): string {
  return name.split(/[\\/]/).pop()!.replace(/[\u0000-\u001f\u007f]/g, "").slice(0, 200) || "file";
}
