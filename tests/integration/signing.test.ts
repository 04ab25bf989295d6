// The signed report end to end against the running app, PostgreSQL, the local
// S3 store and the local mail catcher: submit → return → resubmit →
// countersign → PDF stored with its fingerprint → locked → e-mailed with the
// PDF attached → verified; and every refusal of the issue, with nothing changed.
import { createHash, randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { auditLog, comments, emailDeliveries, inspections, reportFiles, signatures, vesselRecipients } from "@/db/schema";
import { fillInspection } from "@/db/seed/complete-inspection";
import { anonymousClient, signIn, type TClient } from "../fixtures/http";
import { mailAttachment, waitForMail } from "../fixtures/mail";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

let s: TScenario;
let officer: TClient;
let master: TClient;
let superintendent: TClient;
let inspectionId = "";
const office = () => `office-${s.run}@fleet.tankwright.test`;
const classAddress = () => `class-${s.run}@society.tankwright.test`;
type TErr = { error: { code: string; message: string; issues: { path: string; message: string }[] } };

const url = (p = "", id = inspectionId) => `/api/v1/inspections/${id}${p}`;
const row = async (id = inspectionId) => (await testDb().query.inspections.findFirst({ where: eq(inspections.id, id) }))!;
const sign = (c: TClient, action: "submit" | "countersign", body: Record<string, unknown>) => c.request(url(`/${action}`), { method: "POST", json: body });
const sha = (b: Uint8Array) => createHash("sha256").update(b).digest("hex");

async function waitForReport(id: string, timeoutMs = 60_000) {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const file = await testDb().query.reportFiles.findFirst({ where: eq(reportFiles.inspectionId, id) });
    if (file) return file;
    if (Date.now() > until) throw new Error(`no signed PDF for ${id} after ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 300));
  }
}

async function download(c: TClient, id: string) {
  const res = await c.request(url("/signed-report", id));
  expect(res.status).toBe(302);
  return new Uint8Array(await (await fetch(res.headers.get("location")!)).arrayBuffer());
}

beforeAll(async () => {
  s = await buildScenario();
  inspectionId = s.inspectionOf(s.ownVessel.id);
  const db = testDb();
  await fillInspection(db, { orgId: s.org.id, inspectionId, frameFrom: s.tankOf(s.ownVessel.id).frameFrom, testedAt: new Date("2026-11-20T08:00:00Z"), measuredBy: "Test officer", standbyPerson: "Test bosun" });
  await db.insert(vesselRecipients).values([
    { orgId: s.org.id, vesselId: s.ownVessel.id, kind: "office", name: "Fleet office", email: office() },
    { orgId: s.org.id, vesselId: s.ownVessel.id, kind: "class", name: "Class surveyor", email: classAddress() },
  ]);
  [officer, master, superintendent] = await Promise.all([signIn(s.users.officer.email, PASSWORD), signIn(s.users.master.email, PASSWORD), signIn(s.users.superintendent.email, PASSWORD)]);
});

describe("refusals before anything is signed", () => {
  it("refuses a wrong password with 403 and records nothing", async () => {
    const before = await row();
    const res = await sign(officer, "submit", { version: before.version, password: "not-the-password", typedSignature: "Test officer" });
    expect(res.status).toBe(403);
    expect(((await res.json()) as TErr).error.message).toMatch(/password is not right/);
    expect((await row()).status).toBe("draft");
    expect(await testDb().$count(signatures, eq(signatures.inspectionId, inspectionId))).toBe(0);
  });

  it("refuses a countersignature from an officer with 403", async () => {
    const res = await sign(officer, "countersign", { version: (await row()).version, password: PASSWORD, typedSignature: "Test officer" });
    expect(res.status).toBe(403);
    expect((await row()).status).toBe("draft");
  });

  it("refuses to sign a report that still has blockers (422, each blocker named)", async () => {
    const [other] = await testDb().insert(inspections).values({ orgId: s.org.id, vesselId: s.ownVessel.id, tankId: s.tankOf(s.ownVessel.id).id, inspectedOn: "2026-11-21", placeKind: "port", place: "Test port", team: ["Test team"] }).returning();
    for (const [client, action] of [[officer, "submit"], [master, "countersign"]] as const) {
      const res = await client.request(url(`/${action}`, other!.id), { method: "POST", json: { version: 1, password: PASSWORD, typedSignature: "Test" } });
      expect(res.status).toBe(422);
      const body = (await res.json()) as TErr;
      expect(body.error.message).toMatch(/cannot be signed yet/);
      expect(body.error.issues.map((i) => i.path)).toContain("entry.permitRef");
    }
    expect((await row(other!.id)).status).toBe("draft");
  });

  it("refuses a signature without a typed name (400) and a stale version (409)", async () => {
    const v = (await row()).version;
    expect((await sign(officer, "submit", { version: v, password: PASSWORD, typedSignature: " " })).status).toBe(400);
    expect((await sign(officer, "submit", { version: v + 5, password: PASSWORD, typedSignature: "Test officer" })).status).toBe(409);
    expect((await row()).status).toBe("draft");
  });
});

describe("submit → return → resubmit → countersign → stored, fingerprinted, locked, e-mailed", () => {
  it("the officer signs and submits; the report can no longer be edited", async () => {
    const res = await sign(officer, "submit", { version: (await row()).version, password: PASSWORD, typedSignature: "Test officer" });
    expect(res.status).toBe(200);
    const r = await row();
    expect(r.status).toBe("submitted");
    expect(r.submittedAt).not.toBeNull();
    const edit = await officer.request(url("/sections/anodes"), { method: "PUT", json: { version: r.version, installedCount: 12, inspectedCount: 12, meanWastagePct: 31, toRenewCount: 1 } });
    expect(edit.status).toBe(409);
  });

  it("the master returns it with comments: back to the officer, comments visible, officer signature withdrawn", async () => {
    const short = await master.request(url("/return"), { method: "POST", json: { version: (await row()).version, comments: "no" } });
    expect(short.status).toBe(400);
    const res = await master.request(url("/return"), { method: "POST", json: { version: (await row()).version, comments: "Give the sediment depth at the forward end as well, then submit again." } });
    expect(res.status).toBe(200);
    expect((await row()).status).toBe("returned");
    const state = (await (await officer.request(url("/signatures"))).json()) as { signatures: unknown[]; returnComments: { body: string; authorName: string }[] };
    expect(state.signatures).toEqual([]);
    expect(state.returnComments[0]!.body).toMatch(/forward end/);
    expect(await testDb().$count(comments, and(eq(comments.inspectionId, inspectionId), eq(comments.kind, "return")))).toBe(1);
  });

  it("the officer edits and submits again; the master countersigns (a wrong password first)", async () => {
    const edit = await officer.request(url("/sections/anodes"), { method: "PUT", json: { version: (await row()).version, installedCount: 12, inspectedCount: 12, meanWastagePct: 31, toRenewCount: 1 } });
    expect(edit.status).toBe(200);
    expect((await sign(officer, "submit", { version: (await row()).version, password: PASSWORD, typedSignature: "Test officer" })).status).toBe(200);
    const wrong = await sign(master, "countersign", { version: (await row()).version, password: "wrong", typedSignature: "Test master" });
    expect(wrong.status).toBe(403);
    expect((await row()).status).toBe("submitted");
    const res = await sign(master, "countersign", { version: (await row()).version, password: PASSWORD, typedSignature: "Test master" });
    expect(res.status).toBe(200);
    const r = await row();
    expect(r.status).toBe("countersigned");
    expect(r.lockedAt).not.toBeNull();
    const kinds = (await testDb().select().from(signatures).where(eq(signatures.inspectionId, inspectionId))).map((x) => x.kind).sort();
    expect(kinds).toEqual(["master", "officer"]);
    expect(await testDb().$count(auditLog, and(eq(auditLog.entityId, inspectionId), eq(auditLog.action, "inspection.countersign")))).toBe(1);
  });

  it("stores the PDF through the S3 API with the SHA-256 of its exact bytes", async () => {
    const file = await waitForReport(inspectionId);
    const pdf = await download(officer, inspectionId);
    expect(Buffer.from(pdf.subarray(0, 5)).toString("latin1")).toBe("%PDF-");
    // The fingerprint is the SHA-256 (FIPS 180-4) of the stored file, as node:crypto computes it.
    expect(sha(pdf)).toBe(file.sha256);
    expect(file.sizeBytes).toBe(pdf.length);
    expect(pdf.length).toBeLessThanOrEqual(8 * 1024 * 1024);
  }, 90_000);

  it("after countersigning no route changes it", async () => {
    const v = (await row()).version;
    const attempts = [
      officer.request(url("/sections/anodes"), { method: "PUT", json: { version: v, installedCount: 12, inspectedCount: 12, meanWastagePct: 40, toRenewCount: 2 } }),
      master.request(url("/sections/remarks"), { method: "PUT", json: { version: v, doc: { type: "doc", content: [] } } }),
      officer.request(url(`/findings/${randomUUID()}`), { method: "PUT", json: { version: v } }),
      officer.request(url("/photos"), { method: "POST", json: { id: randomUUID(), fileName: "late.jpg", contentType: "image/jpeg", sizeBytes: 1000 } }),
      sign(officer, "submit", { version: v, password: PASSWORD, typedSignature: "Test officer" }),
      sign(master, "countersign", { version: v, password: PASSWORD, typedSignature: "Test master" }),
      master.request(url("/return"), { method: "POST", json: { version: v, comments: "Trying to return a signed report." } }),
    ];
    for (const res of await Promise.all(attempts)) expect(res.status).toBe(409);
    const after = await row();
    expect(after.version).toBe(v);
    expect(after.status).toBe("countersigned");
  });

  it("e-mails the PDF to the office and to class, attached, and logs both deliveries as sent", async () => {
    const file = await waitForReport(inspectionId);
    for (const to of [office(), classAddress()]) {
      const mail = await waitForMail({ to, subjectIncludes: s.ownVessel.name, timeoutMs: 60_000 });
      expect(mail.subject).toMatch(/revision 1/);
      expect(mail.text).toContain(file.sha256);
      const pdf = mail.attachments.find((a) => a.contentType === "application/pdf");
      expect(pdf).toBeDefined();
      expect(sha(await mailAttachment(mail.id, pdf!.filename))).toBe(file.sha256);
    }
    const until = Date.now() + 30_000;
    let rows = await testDb().select().from(emailDeliveries).where(eq(emailDeliveries.reportFileId, file.id));
    while (rows.some((d) => d.status !== "sent") && Date.now() < until) {
      await new Promise((r) => setTimeout(r, 300));
      rows = await testDb().select().from(emailDeliveries).where(eq(emailDeliveries.reportFileId, file.id));
    }
    expect(rows.map((d) => [d.recipient, d.status, d.method]).sort()).toEqual([[classAddress(), "sent", "attachment"], [office(), "sent", "attachment"]].sort());
  }, 120_000);

  it("the superintendent re-sends one delivery; an officer may not", async () => {
    const { deliveries } = (await (await superintendent.request(url("/deliveries"))).json()) as { deliveries: { id: string; recipient: string }[] };
    const toOffice = deliveries.find((d) => d.recipient === office())!;
    expect((await officer.request(`/api/v1/deliveries/${toOffice.id}/resend`, { method: "POST" })).status).toBe(403);
    const res = await superintendent.request(`/api/v1/deliveries/${toOffice.id}/resend`, { method: "POST" });
    expect(res.status).toBe(201);
    const file = await waitForReport(inspectionId);
    const until = Date.now() + 30_000;
    for (;;) {
      const sent = await testDb().$count(emailDeliveries, and(eq(emailDeliveries.reportFileId, file.id), eq(emailDeliveries.recipient, office()), eq(emailDeliveries.status, "sent")));
      if (sent === 2) break;
      if (Date.now() > until) throw new Error("the re-sent delivery was not sent");
      await new Promise((r) => setTimeout(r, 300));
    }
  }, 60_000);
});

describe("/verify", () => {
  const anon = () => anonymousClient();
  it("recognises the signed PDF by fingerprint and by file, without signing in, naming only vessel, tank, date and revision", async () => {
    const file = await waitForReport(inspectionId);
    const byPrint = await anon().request("/api/v1/verify", { method: "POST", json: { fingerprint: file.sha256.toUpperCase() } });
    expect(byPrint.status).toBe(200);
    const answer = (await byPrint.json()) as { known: boolean; report: Record<string, unknown> };
    expect(answer.known).toBe(true);
    expect(answer.report).toMatchObject({ vesselName: s.ownVessel.name, tankCode: "No. 1 WBT P", inspectedOn: "2026-11-20", revision: 1 });
    expect(Object.keys(answer.report).sort()).toEqual(["countersignedAt", "current", "imoNumber", "inspectedOn", "newerRevision", "revision", "tankCode", "tankName", "vesselName"]);
    const pdf = await download(officer, inspectionId);
    const byFile = await anon().request("/api/v1/verify", { method: "POST", headers: { "content-type": "application/pdf" }, body: pdf });
    expect(((await byFile.json()) as { known: boolean }).known).toBe(true);
    const form = new FormData();
    form.set("file", new Blob([pdf], { type: "application/pdf" }), "report.pdf");
    const byForm = await anon().request("/api/v1/verify", { method: "POST", body: form });
    expect(((await byForm.json()) as { known: boolean }).known).toBe(true);
  }, 90_000);

  it("says that a changed copy or a foreign file is not ours", async () => {
    const pdf = await download(officer, inspectionId);
    const changed = Buffer.concat([pdf, Buffer.from("\n% edited\n")]);
    const res = await anon().request("/api/v1/verify", { method: "POST", headers: { "content-type": "application/pdf" }, body: changed });
    expect(res.status).toBe(200);
    expect(((await res.json()) as { known: boolean }).known).toBe(false);
    const foreign = await anon().request("/api/v1/verify", { method: "POST", json: { fingerprint: sha(Buffer.from("some other document")) } });
    expect(((await foreign.json()) as { known: boolean; message: string }).message).toMatch(/not a signed Tankwright report/);
  });

  it("refuses a malformed fingerprint (400), a file that is not a PDF (415) and a 100 MB upload (413)", async () => {
    expect((await anon().request("/api/v1/verify", { method: "POST", json: { fingerprint: "abc" } })).status).toBe(400);
    const notPdf = await anon().request("/api/v1/verify", { method: "POST", headers: { "content-type": "application/pdf" }, body: Buffer.from("just some text, not a PDF") });
    expect(notPdf.status).toBe(415);
    const huge = Buffer.alloc(100 * 1024 * 1024, 0x20);
    huge.write("%PDF-1.7\n", 0, "latin1");
    const big = await anon().request("/api/v1/verify", { method: "POST", headers: { "content-type": "application/pdf" }, body: huge }).catch((error: unknown) => error);
    expect(big instanceof Response ? big.status : String(big)).toBe(413);
  }, 60_000);
});

describe("a correction is a new revision", () => {
  it("copies the countersigned report into a draft revision 2; revision 1 and its PDF stay as they were", async () => {
    const first = await waitForReport(inspectionId);
    const res = await officer.request(url("/revisions"), { method: "POST" });
    expect(res.status).toBe(201);
    const { id, revision } = (await res.json()) as { id: string; revision: number };
    expect(revision).toBe(2);
    const copy = await row(id);
    expect([copy.status, copy.revision, copy.previousRevisionId, copy.seriesId]).toEqual(["draft", 2, inspectionId, (await row()).seriesId]);
    const view = (await (await officer.request(url("", id))).json()) as { findings: { number: number; description: string }[]; blockers: unknown[] };
    expect(view.findings.map((f) => f.number)).toEqual([1, 2]);
    expect(view.blockers).toEqual([]);
    // A second correction of revision 1 is refused while revision 2 exists.
    expect((await officer.request(url("/revisions"), { method: "POST" })).status).toBe(409);
    expect((await row()).status).toBe("countersigned");
    expect(sha(await download(superintendent, inspectionId))).toBe(first.sha256);
  });
});
