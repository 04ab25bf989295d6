import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { captureTime, makeVariants, probePhoto } from "@/lib/photos/image";
import { overviewCandidates, photoProblems, reportOrder } from "@/lib/photos/order";
import { photoCaptionSchema } from "@/lib/schemas/photo";
import { pdfLooksComplete, sniffContentType } from "@/lib/uploads/sniff";

const photo = (id: string, kind: "overview" | "close_up", sortOrder: number, overviewPhotoId: string | null = null, frames: [number, number] | null = [80, 90]) => ({
  id, kind, sortOrder, overviewPhotoId, frameFrom: frames?.[0] ?? null, frameTo: frames?.[1] ?? null,
});

describe("file signatures", () => {
  // Magic numbers from the format specifications: JPEG (ITU T.81) SOI FF D8 then a marker FF; PNG (ISO/IEC 15948) 89 50 4E 47 0D 0A 1A 0A;
  // WebP (RIFF container, "WEBP" at offset 8); PDF (ISO 32000-1 §7.5.2) "%PDF-" header and "%%EOF" trailer.
  it("judges the type by the first bytes, not the name", async () => {
    expect(sniffContentType(await sharp({ create: { width: 4, height: 4, channels: 3, background: "#fff" } }).jpeg().toBuffer())).toBe("image/jpeg");
    expect(sniffContentType(await sharp({ create: { width: 4, height: 4, channels: 3, background: "#fff" } }).png().toBuffer())).toBe("image/png");
    expect(sniffContentType(await sharp({ create: { width: 4, height: 4, channels: 3, background: "#fff" } }).webp().toBuffer())).toBe("image/webp");
    expect(sniffContentType(Buffer.from("%PDF-1.7\n"))).toBe("application/pdf");
    expect(sniffContentType(Buffer.from("hello, I am a text file"))).toBeNull();
    expect(sniffContentType(Buffer.alloc(0))).toBeNull();
    expect(pdfLooksComplete(Buffer.from("%PDF-1.4\n...\n%%EOF\n"))).toBe(true);
    expect(pdfLooksComplete(Buffer.from("%PDF-1.4\n... cut"))).toBe(false);
  });
});

describe("the photo pipeline", () => {
  it("refuses a file that is not an image and one cut short; accepts a whole JPEG", async () => {
    const whole = await sharp({ create: { width: 1200, height: 900, channels: 3, background: "#468" } }).jpeg().toBuffer();
    expect(await probePhoto(whole)).toMatchObject({ ok: true, contentType: "image/jpeg", width: 1200, height: 900 });
    expect(await probePhoto(Buffer.from("plain text"))).toMatchObject({ ok: false, refusal: { status: 415 } });
    expect(await probePhoto(whole.subarray(0, whole.length / 2))).toMatchObject({ ok: false, refusal: { status: 415 } });
  });

  it("makes a report copy no longer than 1 600 px and within its size budget, and a 320 px thumbnail, never enlarging", async () => {
    const big = await sharp({ create: { width: 4000, height: 3000, channels: 3, background: { r: 128, g: 128, b: 128 }, noise: { type: "gaussian", mean: 128, sigma: 40 } } }).jpeg({ quality: 90 }).toBuffer();
    const v = await makeVariants(big);
    expect(Math.max(v.report.width, v.report.height)).toBeLessThanOrEqual(1600);
    expect(v.report.data.length).toBeLessThanOrEqual(120_000);
    expect(Math.max(v.thumb.width, v.thumb.height)).toBe(320);
    const small = await makeVariants(await sharp({ create: { width: 200, height: 100, channels: 3, background: "#888" } }).jpeg().toBuffer());
    expect([small.report.width, small.thumb.width]).toEqual([200, 200]);
  });

  it("reads the capture time with the offset the camera gives, else the ship's offset, else UTC", async () => {
    const exif = async (ifd2: Record<string, string>) => (await sharp(await sharp({ create: { width: 8, height: 8, channels: 3, background: "#000" } }).jpeg().withExif({ IFD2: ifd2 }).toBuffer()).metadata()).exif;
    expect(captureTime(await exif({ DateTimeOriginal: "2026:03:14 09:30:00", OffsetTimeOriginal: "-05:00" }), 60)?.toISOString()).toBe("2026-03-14T14:30:00.000Z");
    expect(captureTime(await exif({ DateTimeOriginal: "2026:03:14 09:30:00" }), 480)?.toISOString()).toBe("2026-03-14T01:30:00.000Z");
    expect(captureTime(await exif({ DateTimeOriginal: "2026:03:14 09:30:00" }), null)?.toISOString()).toBe("2026-03-14T09:30:00.000Z");
    expect(captureTime(undefined, null)).toBeNull();
  });
});

describe("photo order and completeness (common practice: overview first, then its close-ups)", () => {
  it("puts each overview before its close-ups, and uncaptioned photos last", () => {
    const list = [photo("c1", "close_up", 1, "o2"), photo("o1", "overview", 2), photo("o2", "overview", 3), photo("c2", "close_up", 4, "o1"), photo("n", "close_up", 5, null, null)];
    expect(reportOrder(list).map((p) => p.id)).toEqual(["o1", "c2", "o2", "c1", "n"]);
  });

  it("offers as overviews only those whose frames enclose the close-up's", () => {
    const list = [photo("a", "overview", 1, null, [80, 90]), photo("b", "overview", 2, null, [86, 88]), photo("c", "close_up", 3, "a", [84, 84])];
    expect(overviewCandidates(list, { frameFrom: 84, frameTo: 85 }).map((p) => p.id)).toEqual(["a"]);
    expect(overviewCandidates(list, { frameFrom: 87, frameTo: 87 }).map((p) => p.id)).toEqual(["a", "b"]);
  });

  it("asks for a close-up of every finding of damage, a caption on every photo, and waits for uploads", () => {
    const problems = photoProblems({
      photos: [
        { id: "p1", status: "ready", caption: null, kind: "overview", findingId: null, fileLabel: "a.jpg" },
        { id: "p2", status: "processing", caption: null, kind: "overview", findingId: null, fileLabel: "b.jpg" },
        { id: "p3", status: "ready", caption: "Crack 120 mm at bracket toe", kind: "close_up", findingId: "f1", fileLabel: "c.jpg" },
      ],
      findings: [{ id: "f1", number: 1, type: "crack" }, { id: "f2", number: 2, type: "dent" }, { id: "f3", number: 3, type: "coating_breakdown" }],
    });
    expect(problems.map((p) => p.field)).toEqual(["photos", "photo-p1", "finding-photo-f2"]);
  });
});

describe("photo captions", () => {
  const catalogue = { tank: { code: "No. 3 WBT P", frameFrom: 80, frameTo: 100 }, members: [{ kind: "longitudinal", platingRegion: "bottom_shell", numberFrom: 1, numberTo: 12, frames: null }], specialFrames: [] } as never;
  const peers = [{ id: "11111111-1111-4111-8111-111111111111", kind: "overview" as const, frameFrom: 84, frameTo: 92 }];
  const schema = photoCaptionSchema({ catalogue, photoId: "22222222-2222-4222-8222-222222222222", peers, findingIds: [] });
  const base = { kind: "close_up", frameFrom: 88, frameTo: 88, memberKind: "longitudinal", platingRegion: "bottom_shell", memberNumber: 7, overviewPhotoId: peers[0]!.id, caption: "Crack 120 mm at the toe of the bracket" };
  const paths = (r: ReturnType<typeof schema.safeParse>) => (r.success ? [] : r.error.issues.map((i) => i.path.join(".")));

  it("accepts a close-up inside its overview's frames, with a member of the catalogue", () => {
    expect(paths(schema.safeParse(base))).toEqual([]);
  });
  it("refuses frames outside the tank, a number the catalogue lacks, a close-up outside or without its overview, and vague text", () => {
    expect(paths(schema.safeParse({ ...base, frameFrom: 120, frameTo: 121 }))).toContain("frameFrom");
    expect(paths(schema.safeParse({ ...base, memberNumber: 40 }))).toContain("memberNumber");
    expect(paths(schema.safeParse({ ...base, frameFrom: 95, frameTo: 96 }))).toContain("overviewPhotoId");
    expect(paths(schema.safeParse({ ...base, overviewPhotoId: undefined }))).toContain("overviewPhotoId");
    expect(paths(schema.safeParse({ ...base, caption: "see photo" }))).toContain("caption");
    expect(paths(schema.safeParse({ ...base, caption: "some corrosion" }))).toContain("caption");
  });
});
