// The photo pipeline with sharp: check an upload before anything is kept, then
// make the variants the product shows and prints. Originals are never changed.
import exifReader from "exif-reader";
import sharp from "sharp";
import { PHOTO_MAX_PIXELS, REPORT_LONG_SIDE, REPORT_TARGET_BYTES, THUMB_LONG_SIDE } from "@/lib/uploads/limits";
import { sniffContentType } from "@/lib/uploads/sniff";

export type TImageRefusal = { status: 413 | 415; message: string };
export type TImageProbe = { ok: true; contentType: "image/jpeg" | "image/png" | "image/webp"; width: number; height: number } | { ok: false; refusal: TImageRefusal };

const FORMATS = { jpeg: "image/jpeg", png: "image/png", webp: "image/webp" } as const;

/**
 * Checks an uploaded photo by its bytes: a real JPEG, PNG or WebP, within the
 * pixel limit (read from the header, before any decoding), and whole (a small
 * decode that fails on a file cut short).
 */
export async function probePhoto(bytes: Buffer): Promise<TImageProbe> {
  const sniffed = sniffContentType(bytes);
  if (sniffed === "image/heic") return refuse(415, "HEIC photos cannot be read here: set the camera to JPEG (\"Most compatible\"), or export the photo as JPEG, and upload it again.");
  if (sniffed !== "image/jpeg" && sniffed !== "image/png" && sniffed !== "image/webp") {
    return refuse(415, "This file is not a JPEG, PNG or WebP photo, whatever its name says.");
  }
  let meta: Awaited<ReturnType<ReturnType<typeof sharp>["metadata"]>>;
  try {
    meta = await sharp(bytes, { limitInputPixels: false }).metadata();
  } catch {
    return refuse(415, "This photo cannot be read: the file is damaged.");
  }
  const format = FORMATS[meta.format as keyof typeof FORMATS];
  if (!format || format !== sniffed || !meta.width || !meta.height) return refuse(415, "This file is not a JPEG, PNG or WebP photo, whatever its name says.");
  const pixels = meta.width * meta.height;
  if (pixels > PHOTO_MAX_PIXELS) {
    return refuse(413, `This image is ${meta.width} × ${meta.height} pixels (${Math.round(pixels / 1e6)} megapixels); photos of up to ${PHOTO_MAX_PIXELS / 1e6} megapixels are accepted.`);
  }
  try {
    await sharp(bytes, { failOn: "truncated", limitInputPixels: PHOTO_MAX_PIXELS }).resize(64, 64, { fit: "inside" }).raw().toBuffer();
  } catch {
    return refuse(415, "This photo is incomplete or damaged (the file ends too early). Upload it again from the camera's original.");
  }
  return { ok: true, contentType: format, width: meta.width, height: meta.height };
}

const refuse = (status: 413 | 415, message: string): TImageProbe => ({ ok: false, refusal: { status, message } });

export type TVariant = { data: Buffer; width: number; height: number };
export type TVariants = { report: TVariant; thumb: TVariant; capturedAt: Date | null; width: number; height: number };

/**
 * The best JPEG quality whose file fits the report budget: 80 first (most photos
 * fit), then a binary search down the steps, so a photo costs two or three
 * encodes rather than five. Returns the smallest try when none fits.
 */
async function fittingJpeg(encode: (quality: number) => Promise<Buffer>, steps = [80, 72, 64, 56, 48]): Promise<Buffer> {
  const first = await encode(steps[0]!);
  if (first.length <= REPORT_TARGET_BYTES) return first;
  let lo = 1, hi = steps.length - 1, best: Buffer | null = null, smallest = first;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const out = await encode(steps[mid]!);
    if (out.length < smallest.length) smallest = out;
    if (out.length <= REPORT_TARGET_BYTES) {
      best = out;
      hi = mid - 1;
    } else lo = mid + 1;
  }
  return best ?? smallest;
}

/**
 * The report variant (longest side 1 600 px, JPEG, small enough that 60 fit a
 * report under 8 MB) and the thumbnail, both turned upright by the EXIF
 * orientation and stripped of every metadata field (GPS position included).
 * The capture time is read before stripping and returned on its own.
 */
export async function makeVariants(original: Buffer, opts: { utcOffsetMinutes?: number | null } = {}): Promise<TVariants> {
  const input = sharp(original, { failOn: "truncated", limitInputPixels: PHOTO_MAX_PIXELS });
  const meta = await input.metadata();
  // One decode: auto-orient and shrink (JPEG shrinks while it loads), then encode from the pixels.
  const { data: pixels, info } = await input
    .rotate()
    .resize(REPORT_LONG_SIDE, REPORT_LONG_SIDE, { fit: "inside", withoutEnlargement: true })
    .raw()
    .toBuffer({ resolveWithObject: true });
  const raw = { raw: { width: info.width, height: info.height, channels: info.channels } } as const;
  const encode = (quality: number) => sharp(pixels, raw).jpeg({ quality, chromaSubsampling: "4:2:0" }).toBuffer();
  let reportVariant: TVariant = { data: await fittingJpeg(encode), width: info.width, height: info.height };
  if (reportVariant.data.length > REPORT_TARGET_BYTES) {
    // A photo of fine texture (sediment, heavy scale) needs fewer pixels as well.
    const { data: small, info: si } = await sharp(pixels, raw).resize(1280, 1280, { fit: "inside" }).raw().toBuffer({ resolveWithObject: true });
    const smallRaw = { raw: { width: si.width, height: si.height, channels: si.channels } } as const;
    const data = await fittingJpeg((quality) => sharp(small, smallRaw).jpeg({ quality }).toBuffer(), [56, 48, 40, 32]);
    reportVariant = { data, width: si.width, height: si.height };
  }
  const thumb = await sharp(pixels, raw).resize(THUMB_LONG_SIDE, THUMB_LONG_SIDE, { fit: "inside", withoutEnlargement: true }).jpeg({ quality: 70 }).toBuffer({ resolveWithObject: true });
  const swapped = (meta.orientation ?? 1) >= 5;
  return {
    report: reportVariant,
    thumb: { data: thumb.data, width: thumb.info.width, height: thumb.info.height },
    capturedAt: captureTime(meta.exif, opts.utcOffsetMinutes ?? null),
    width: swapped ? meta.height! : meta.width!,
    height: swapped ? meta.width! : meta.height!,
  };
}

/**
 * When the photo was taken, from EXIF DateTimeOriginal (or DateTime). EXIF keeps
 * the camera's local clock; its offset field says which, else the ship's offset
 * is assumed where known, else UTC.
 */
export function captureTime(exif: Buffer | undefined, utcOffsetMinutes: number | null): Date | null {
  if (!exif) return null;
  let tags: ReturnType<typeof exifReader>;
  try {
    tags = exifReader(exif);
  } catch {
    return null;
  }
  const local = (tags.Photo?.DateTimeOriginal ?? tags.Image?.DateTime) as Date | undefined;
  if (!(local instanceof Date) || Number.isNaN(+local)) return null;
  const offsetText = (tags.Photo?.OffsetTimeOriginal ?? tags.Photo?.OffsetTime) as string | undefined;
  const m = typeof offsetText === "string" ? offsetText.match(/^([+-])(\d{2}):(\d{2})$/) : null;
  const offset = m ? (m[1] === "-" ? -1 : 1) * (Number(m[2]) * 60 + Number(m[3])) : (utcOffsetMinutes ?? 0);
  const at = new Date(+local - offset * 60_000);
  return at.getUTCFullYear() < 1990 || +at > Date.now() + 86_400_000 ? null : at;
}

