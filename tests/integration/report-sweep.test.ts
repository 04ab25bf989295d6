// A countersigned report always ends with its signed PDF: one whose render job
// was lost (here: countersigned straight in the database, as the demo seed
// does) is found by the sweep, queued, rendered by the app's worker and stored.
import { createHash } from "node:crypto";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { inspections, reportFiles, signatures } from "@/db/schema";
import { fillInspection } from "@/db/seed/complete-inspection";
import { signIn } from "../fixtures/http";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

let s: TScenario;
let inspectionId = "";

beforeAll(async () => {
  s = await buildScenario();
  inspectionId = s.inspectionOf(s.ownVessel.id);
  await fillInspection(testDb(), { orgId: s.org.id, inspectionId, frameFrom: s.tankOf(s.ownVessel.id).frameFrom, testedAt: new Date("2026-11-20T08:00:00Z"), measuredBy: "T", standbyPerson: "T" });
  const at = new Date("2026-11-21T08:00:00Z");
  await testDb().update(inspections).set({ status: "countersigned", submittedAt: at, countersignedAt: at, lockedAt: at }).where(eq(inspections.id, inspectionId));
  await testDb().insert(signatures).values([
    { orgId: s.org.id, inspectionId, userId: s.users.officer.id, kind: "officer", signerName: "Test officer", typedSignature: "Test officer", signedAt: at },
    { orgId: s.org.id, inspectionId, userId: s.users.master.id, kind: "master", signerName: "Test master", typedSignature: "Test master", signedAt: at },
  ]);
});
afterAll(async () => {
  const { jobQueue } = await import("@/lib/jobs/queue");
  await (await jobQueue()).stop({ graceful: false, wait: false });
});

describe("the sweep of countersigned reports without a PDF", () => {
  it("finds the report, queues it, and the worker renders and stores its PDF with the right fingerprint", async () => {
    const { unsafeListCountersignedWithoutPdf } = await import("@/db/queries/signing");
    expect((await unsafeListCountersignedWithoutPdf(10_000)).map((r) => r.inspectionId)).toContain(inspectionId);
    const { requeueMissingReports } = await import("@/lib/jobs/report-sweep");
    expect((await requeueMissingReports()).requeued).toBeGreaterThanOrEqual(1);
    const until = Date.now() + 60_000;
    let file;
    while (!(file = await testDb().query.reportFiles.findFirst({ where: eq(reportFiles.inspectionId, inspectionId) }))) {
      if (Date.now() > until) throw new Error("the swept report was not rendered within 60 s");
      await new Promise((r) => setTimeout(r, 300));
    }
    const officer = await signIn(s.users.officer.email, PASSWORD);
    const res = await officer.request(`/api/v1/inspections/${inspectionId}/signed-report`);
    const pdf = new Uint8Array(await (await fetch(res.headers.get("location")!)).arrayBuffer());
    // SHA-256 (FIPS 180-4) of the stored bytes, as node:crypto computes it.
    expect(createHash("sha256").update(pdf).digest("hex")).toBe(file.sha256);
  }, 90_000);
});
