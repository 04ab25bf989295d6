// The real type of a file, judged by its first bytes, never by its name or the
// type the browser declared. Signatures: JPEG FF D8 FF, PNG 89 50 4E 47 0D 0A 1A 0A,
// WebP "RIFF" … "WEBP", PDF "%PDF-", HEIF/HEIC an ISO-BMFF "ftyp" box with a heic/heix/mif1 brand.

export type TSniffed = "image/jpeg" | "image/png" | "image/webp" | "application/pdf" | "image/heic";

const ascii = (b: Uint8Array, from: number, to: number) => String.fromCharCode(...b.subarray(from, to));

export function sniffContentType(bytes: Uint8Array): TSniffed | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return "image/jpeg";
  if (bytes.length >= 8 && [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a].every((v, i) => bytes[i] === v)) return "image/png";
  if (bytes.length >= 12 && ascii(bytes, 0, 4) === "RIFF" && ascii(bytes, 8, 12) === "WEBP") return "image/webp";
  if (bytes.length >= 5 && ascii(bytes, 0, 5) === "%PDF-") return "application/pdf";
  if (bytes.length >= 12 && ascii(bytes, 4, 8) === "ftyp" && ["heic", "heix", "hevc", "mif1", "msf1"].includes(ascii(bytes, 8, 12))) return "image/heic";
  return null;
}

/** A PDF that was cut short has no end-of-file marker in its last kilobyte. */
export function pdfLooksComplete(bytes: Uint8Array): boolean {
  const tail = ascii(bytes, Math.max(0, bytes.length - 1024), bytes.length);
  return tail.includes("%%EOF");
}
