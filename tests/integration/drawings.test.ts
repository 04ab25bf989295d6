// Vessel drawings through the S3 API: a real PDF is kept and opened; a file that
// only claims to be a PDF is refused and removed.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { drawings } from "@/db/schema";
import { signIn, type TClient } from "../fixtures/http";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";
import { listKeys } from "../fixtures/storage";

let s: TScenario;
let officer: TClient;
const pdf = Buffer.from("%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[]/Count 0>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n");

async function uploadDrawing(bytes: Buffer, contentType = "application/pdf") {
  const id = randomUUID();
  const base = `/api/v1/vessels/${s.ownVessel.id}/drawings`;
  const a = await officer.request(base, { method: "POST", json: { id, kind: "midship_section", title: "101-002 Midship section", fileName: "midship.pdf", contentType, sizeBytes: bytes.length } });
  expect(a.status).toBe(201);
  const { upload } = (await a.json()) as { upload: { url: string; headers: Record<string, string> } };
  expect((await fetch(upload.url, { method: "PUT", headers: upload.headers, body: new Uint8Array(bytes) })).status).toBe(200);
  return { id, done: await officer.request(`${base}/${id}/complete`, { method: "POST" }) };
}

beforeAll(async () => {
  s = await buildScenario();
  officer = await signIn(s.users.officer.email, PASSWORD);
});

describe("drawings", () => {
  it("a PDF is kept, listed and opened through a short-lived storage URL", async () => {
    const { id, done } = await uploadDrawing(pdf);
    expect(done.status).toBe(200);
    const list = (await (await officer.request(`/api/v1/vessels/${s.ownVessel.id}/drawings`)).json()) as { drawings: { id: string; title: string }[] };
    expect(list.drawings.map((d) => d.id)).toContain(id);
    const open = await officer.request(`/api/v1/vessels/${s.ownVessel.id}/drawings/${id}/file`);
    expect(open.status).toBe(302);
    const body = Buffer.from(await (await fetch(open.headers.get("location")!)).arrayBuffer());
    expect(body.equals(pdf)).toBe(true);
    expect(await officer.request(`/api/v1/vessels/${s.siblingVessel.id}/drawings/${id}/file`).then((r) => r.status)).toBe(404);
  });

  it("a text file named .pdf is refused with 415 and nothing is kept", async () => {
    const { id, done } = await uploadDrawing(Buffer.from("not a drawing at all, just text\n".repeat(10)));
    expect(done.status).toBe(415);
    expect(await testDb().$count(drawings, eq(drawings.id, id))).toBe(0);
    expect(await listKeys(`org/${s.org.id}/vessel/${s.ownVessel.id}/drawing/${id}/`)).toEqual([]);
  });

  it("a 60 MB drawing is refused before any URL is handed out", async () => {
    const res = await officer.request(`/api/v1/vessels/${s.ownVessel.id}/drawings`, { method: "POST", json: { id: randomUUID(), kind: "other", title: "Big scan of everything", fileName: "big.pdf", contentType: "application/pdf", sizeBytes: 60 * 1024 * 1024 } });
    expect(res.status).toBe(413);
  });
});
