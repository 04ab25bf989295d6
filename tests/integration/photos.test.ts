// Photos end to end against the running app, the local S3 fake and PostgreSQL:
// presign → upload straight to storage → complete → variants by the job queue;
// and every bad input refused with nothing left behind.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { inspections, photos } from "@/db/schema";
import { signIn, type TClient } from "../fixtures/http";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";
import { bombPng, listKeys, sidewaysJpeg, smallJpeg } from "../fixtures/storage";

let s: TScenario;
let officer: TClient;
let inspectionId = "";
type TErr = { error: { code: string; message: string; issues: { path: string; message: string }[] } };
type TPhoto = { id: string; status: string; width: number | null; height: number | null; capturedAt: string | null; kind: string };

const url = (p = "") => `/api/v1/inspections/${inspectionId}${p}`;
const version = async () => (await testDb().query.inspections.findFirst({ where: eq(inspections.id, inspectionId) }))!.version;
const photoPrefix = (photoId: string) => `org/${s.org.id}/vessel/${s.ownVessel.id}/inspection/${inspectionId}/photo/${photoId}/`;

async function announce(body: { id?: string; fileName?: string; contentType?: string; sizeBytes: number }) {
  const id = body.id ?? randomUUID();
  const res = await officer.request(url("/photos"), { method: "POST", json: { id, fileName: "photo.jpg", contentType: "image/jpeg", ...body } });
  return { id, res, json: (await res.json()) as { upload: { url: string; headers: Record<string, string> } } & TErr };
}

async function putTo(target: { url: string; headers: Record<string, string> }, bytes: Buffer) {
  return fetch(target.url, { method: "PUT", headers: target.headers, body: new Uint8Array(bytes) });
}

/** Announce, upload and complete one file; returns the completion's response. */
async function upload(bytes: Buffer, declared: { contentType?: string; sizeBytes?: number; fileName?: string } = {}) {
  const a = await announce({ sizeBytes: bytes.length, ...declared });
  expect(a.res.status).toBe(201);
  const put = await putTo(a.json.upload, bytes);
  const done = await officer.request(url(`/photos/${a.id}/complete`), { method: "POST" });
  return { id: a.id, put, done, json: (await done.json()) as { photo: TPhoto } & TErr };
}

async function waitForStatus(photoId: string, want: string, timeoutMs = 20_000) {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const row = await testDb().query.photos.findFirst({ where: eq(photos.id, photoId) });
    if (row?.status === want) return row;
    if (Date.now() > until) throw new Error(`photo ${photoId} is ${row?.status}, not ${want}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

async function expectNothingLeft(photoId: string) {
  expect(await testDb().$count(photos, eq(photos.id, photoId))).toBe(0);
  expect(await listKeys(photoPrefix(photoId))).toEqual([]);
}

beforeAll(async () => {
  s = await buildScenario();
  inspectionId = s.inspectionOf(s.ownVessel.id);
  officer = await signIn(s.users.officer.email, PASSWORD);
});

describe("a good upload, end to end", () => {
  let overviewId = "";
  it("presign → upload → complete → the job makes upright variants of the right size, strips metadata and keeps the capture time", async () => {
    const original = await sidewaysJpeg();
    const { id, put, done, json } = await upload(original, { fileName: "IMG_0001.jpg" });
    expect(put.status).toBe(200);
    expect(done.status).toBe(200);
    expect(json.photo.status).toBe("processing");
    const row = await waitForStatus(id, "ready");
    overviewId = id;
    // Stored 4000 × 3000 with orientation 6: seen upright it is 3000 wide, 4000 high.
    expect([row.width, row.height]).toEqual([3000, 4000]);
    expect(await listKeys(photoPrefix(id))).toEqual(expect.arrayContaining([photoPrefix(id) + "original", photoPrefix(id) + "report.jpg", photoPrefix(id) + "thumb.jpg"]));
    const report = Buffer.from(await (await fetch(new URL((await officer.request(url(`/photos/${id}/file?variant=report`))).headers.get("location")!))).arrayBuffer());
    const meta = await sharp(report).metadata();
    expect(meta.format).toBe("jpeg");
    expect([meta.width, meta.height]).toEqual([1200, 1600]);
    expect(report.length).toBeLessThanOrEqual(120_000);
    expect(meta.exif).toBeUndefined(); // no GPS, no orientation left to misread
    // Turned clockwise: the red left half of the stored image is now the top half.
    const { data } = await sharp(report).resize(1, 2, { fit: "fill" }).raw().toBuffer({ resolveWithObject: true });
    expect(data[0]).toBeGreaterThan(150); // top: red
    expect(data[5]).toBeGreaterThan(150); // bottom: blue
    // 09:30:15 at +02:00 is 07:30:15 UTC.
    expect(row.capturedAt?.toISOString()).toBe("2026-11-20T07:30:15.000Z");
    const thumb = Buffer.from(await (await fetch(new URL((await officer.request(url(`/photos/${id}/file?variant=thumb`))).headers.get("location")!))).arrayBuffer());
    expect(Math.max((await sharp(thumb).metadata()).width!, (await sharp(thumb).metadata()).height!)).toBe(320);
    // The original stays as it was uploaded.
    const kept = Buffer.from(await (await fetch(new URL((await officer.request(url(`/photos/${id}/file?variant=original`))).headers.get("location")!))).arrayBuffer());
    expect(kept.equals(original)).toBe(true);
  });

  it("completing again changes nothing", async () => {
    const again = await officer.request(url(`/photos/${overviewId}/complete`), { method: "POST" });
    expect(again.status).toBe(200);
    expect(((await again.json()) as { photo: TPhoto }).photo.status).toBe("ready");
  });

  it("captions place the photo; a close-up names an overview whose frames enclose it", async () => {
    const caption = { kind: "overview", frameFrom: 84, frameTo: 92, memberKind: "plating", platingRegion: "inner_bottom", caption: "Inner bottom plating looking forward from the aft manhole" };
    const ok = await officer.request(url(`/photos/${overviewId}`), { method: "PUT", json: { ...caption, version: await version() } });
    expect(ok.status).toBe(200);
    const { id: closeId } = await upload(await smallJpeg(1));
    await waitForStatus(closeId, "ready");
    const close = { kind: "close_up", frameFrom: 88, frameTo: 88, memberKind: "plating", platingRegion: "inner_bottom", caption: "Pitting 3 mm deep over 200 × 150 mm at the weld", overviewPhotoId: overviewId };
    const res = await officer.request(url(`/photos/${closeId}`), { method: "PUT", json: { ...close, version: await version() } });
    expect(res.status).toBe(200);
    // The report order: each overview followed by its close-ups.
    const view = (await (await officer.request(url())).json()) as { photos: TPhoto[] };
    expect(view.photos.map((p) => p.id).slice(0, 2)).toEqual([overviewId, closeId]);
    // Narrowing the overview past its close-up is refused.
    const narrow = await officer.request(url(`/photos/${overviewId}`), { method: "PUT", json: { ...caption, frameFrom: 90, version: await version() } });
    expect(narrow.status).toBe(422);
    // Deleting an overview that a close-up names is refused; deleting the close-up removes its files.
    expect((await officer.request(url(`/photos/${overviewId}`), { method: "DELETE", json: { version: await version() } })).status).toBe(422);
    expect((await officer.request(url(`/photos/${closeId}`), { method: "DELETE", json: { version: await version() } })).status).toBe(200);
    await expectNothingLeft(closeId);
  });
});

describe("bad input is refused, nothing left behind", () => {
  it("a text file renamed .jpg → 415", async () => {
    const { id, done, json } = await upload(Buffer.from("This is a text file pretending to be a photo.\n".repeat(20)), { fileName: "notes.jpg" });
    expect(done.status).toBe(415);
    expect(json.error.message).toMatch(/not a JPEG, PNG or WebP/);
    await expectNothingLeft(id);
  });

  it("a 0-byte file → 400 before any URL is handed out", async () => {
    const a = await announce({ sizeBytes: 0 });
    expect(a.res.status).toBe(400);
    expect(a.json.error.message).toMatch(/empty/);
    await expectNothingLeft(a.id);
  });

  it("a truncated JPEG → 415", async () => {
    const whole = await sidewaysJpeg(1600, 1200);
    const { id, done, json } = await upload(whole.subarray(0, Math.floor(whole.length * 0.6)));
    expect(done.status).toBe(415);
    expect(json.error.message).toMatch(/incomplete or damaged/);
    await expectNothingLeft(id);
  });

  it("a 30 MB photo → 413 when announced; sent under a smaller announced size, storage refuses it", async () => {
    const a = await announce({ sizeBytes: 30 * 1024 * 1024 });
    expect(a.res.status).toBe(413);
    await expectNothingLeft(a.id);
    // Announced as 1 KB, but 30 MB sent: the signed length makes storage refuse it.
    const b = await announce({ sizeBytes: 1024 });
    const put = await putTo(b.json.upload, Buffer.alloc(30 * 1024 * 1024, 1));
    expect(put.ok).toBe(false);
    const done = await officer.request(url(`/photos/${b.id}/complete`), { method: "POST" });
    expect(done.status).toBe(409);
    expect(await listKeys(photoPrefix(b.id))).toEqual([]);
  });

  it("a 20 000 × 20 000 PNG (a decompression bomb) → 413 without decoding it", async () => {
    const bomb = bombPng();
    expect(bomb.length).toBeLessThan(1024 * 1024);
    const { id, done, json } = await upload(bomb, { contentType: "image/png", fileName: "bomb.png" });
    expect(done.status).toBe(413);
    expect(json.error.message).toMatch(/20000 × 20000/);
    await expectNothingLeft(id);
  });

  it("a presigned URL reused for another object is refused by storage", async () => {
    const a = await announce({ sizeBytes: 1000 });
    const b = await announce({ sizeBytes: 1000 });
    const forged = a.json.upload.url.replace(a.id, b.id);
    const put = await fetch(forged, { method: "PUT", headers: a.json.upload.headers, body: new Uint8Array(1000) });
    expect(put.status).toBe(403);
    expect(await listKeys(photoPrefix(b.id))).toEqual([]);
    const done = await officer.request(url(`/photos/${b.id}/complete`), { method: "POST" });
    expect(done.status).toBe(409);
  });

  it("a caption naming a frame outside the tank, and a close-up with no overview, are refused", async () => {
    const { id } = await upload(await smallJpeg(2));
    await waitForStatus(id, "ready");
    const outside = await officer.request(url(`/photos/${id}`), { method: "PUT", json: { kind: "overview", frameFrom: 120, frameTo: 124, memberKind: "plating", platingRegion: "inner_bottom", caption: "Inner bottom plating at the forward end", version: await version() } });
    expect(outside.status).toBe(400);
    expect(((await outside.json()) as TErr).error.issues.map((i) => i.path)).toContain("frameFrom");
    const noOverview = await officer.request(url(`/photos/${id}`), { method: "PUT", json: { kind: "close_up", frameFrom: 88, frameTo: 88, memberKind: "plating", platingRegion: "inner_bottom", caption: "Crack 40 mm at the weld", version: await version() } });
    expect(noOverview.status).toBe(400);
    expect(((await noOverview.json()) as TErr).error.issues.map((i) => i.path)).toContain("overviewPhotoId");
    const vague = await officer.request(url(`/photos/${id}`), { method: "PUT", json: { kind: "overview", frameFrom: 84, frameTo: 92, memberKind: "plating", platingRegion: "inner_bottom", caption: "see photo", version: await version() } });
    expect(vague.status).toBe(400);
    const row = await testDb().query.photos.findFirst({ where: eq(photos.id, id) });
    expect(row?.caption).toBeNull();
  });

  it("another vessel's photo id answers 404, and files of another company's inspection are not served", async () => {
    const otherInspection = s.inspectionOf(s.siblingVessel.id);
    const mine = (await testDb().query.photos.findFirst({ where: eq(photos.inspectionId, inspectionId) }))!;
    expect((await officer.request(`/api/v1/inspections/${otherInspection}/photos/${mine.id}/complete`, { method: "POST" })).status).toBe(404);
    expect((await officer.request(`/api/v1/inspections/${otherInspection}/photos/${mine.id}/file?variant=thumb`)).status).toBe(404);
    const unknown = randomUUID();
    expect((await officer.request(url(`/photos/${unknown}/complete`), { method: "POST" })).status).toBe(404);
    expect((await officer.request(url(`/photos/${unknown}`), { method: "PUT", json: { version: await version() } })).status).toBe(404);
  });
});

describe("presigned upload URLs", () => {
  it("expire: a PUT after the URL's lifetime is refused by storage", async () => {
    const { presignUpload } = await import("@/lib/storage/s3");
    const key = `org/${s.org.id}/vessel/${s.ownVessel.id}/inspection/${inspectionId}/photo/${randomUUID()}/original`;
    const target = await presignUpload({ key, contentType: "image/jpeg", sizeBytes: 100, expiresIn: 1 });
    await new Promise((r) => setTimeout(r, 2100));
    const put = await putTo(target, Buffer.alloc(100));
    expect(put.status).toBe(403);
    expect(await listKeys(key)).toEqual([]);
  });
});
