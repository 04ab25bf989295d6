// The e-mail job itself, run in the test process against PostgreSQL, the local
// S3 store and the mail catcher, with its settings changed per case: a PDF over
// the attachment limit goes out as a link that expires; an SMTP service that
// cannot be reached leaves the delivery failed with its error, for the retry.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { emailDeliveries } from "@/db/schema";
import { waitForMail } from "../fixtures/mail";
import { buildScenario, testDb, type TScenario } from "../fixtures/scenario";
import { storeSignedReport } from "../fixtures/signed-report";

let s: TScenario;
let reportFileId = "";
const pdf = Buffer.from("%PDF-1.7\n" + "0".repeat(4000) + "\n%%EOF\n", "latin1");
const saved = { ...process.env };

/** A fresh copy of the job's modules, reading the settings as they are now. */
async function job(env: Record<string, string>) {
  Object.assign(process.env, env);
  vi.resetModules();
  return import("@/lib/jobs/email-delivery");
}

async function delivery(recipient: string) {
  const [row] = await testDb().insert(emailDeliveries).values({ orgId: s.org.id, reportFileId, recipient, purpose: "signed-report" }).returning();
  return row!.id;
}

beforeAll(async () => {
  s = await buildScenario();
  const inspectionId = s.inspectionOf(s.ownVessel.id);
  reportFileId = (await storeSignedReport({ orgId: s.org.id, vesselId: s.ownVessel.id, inspectionId, pdf, label: "test" })).id;
});
afterEach(() => {
  process.env = { ...saved };
});

describe("the e-mail job", () => {
  it("sends a download link that expires instead of the attachment when the PDF is over the limit", async () => {
    const to = `big-${s.run}@fleet.tankwright.test`;
    const id = await delivery(to);
    const { runEmailDelivery } = await job({ MAIL_ATTACHMENT_LIMIT_BYTES: "1024", REPORT_LINK_TTL_SECONDS: "3600" });
    const before = Date.now();
    await runEmailDelivery({ orgId: s.org.id, deliveryId: id });
    const mail = await waitForMail({ to, subjectIncludes: s.ownVessel.name });
    expect(mail.attachments).toEqual([]);
    const link = mail.text.match(/https?:\/\/\S+/g)!.find((u) => u.includes("X-Amz-Expires=3600"));
    expect(link).toBeDefined();
    const fetched = Buffer.from(await (await fetch(link!)).arrayBuffer());
    expect(fetched.equals(pdf)).toBe(true);
    const row = (await testDb().query.emailDeliveries.findFirst({ where: eq(emailDeliveries.id, id) }))!;
    expect([row.status, row.method, row.attempts]).toEqual(["sent", "link", 1]);
    // Expires one hour after sending (a few seconds' slack for the test's own pace).
    expect(Math.abs(row.linkExpiresAt!.getTime() - (before + 3600_000))).toBeLessThan(10_000);
  });

  it("records a failed try with its error and throws, so that the queue retries it", async () => {
    const id = await delivery(`down-${s.run}@fleet.tankwright.test`);
    const { runEmailDelivery } = await job({ SMTP_URL: "smtp://127.0.0.1:9" });
    await expect(runEmailDelivery({ orgId: s.org.id, deliveryId: id })).rejects.toThrow();
    const row = (await testDb().query.emailDeliveries.findFirst({ where: eq(emailDeliveries.id, id) }))!;
    expect(row.status).toBe("failed");
    expect(row.attempts).toBe(1);
    expect(row.lastError).toMatch(/ECONNREFUSED|connect/i);
  });

  it("does not send a delivery twice: a retry of a sent one does nothing", async () => {
    const to = `once-${s.run}@fleet.tankwright.test`;
    const id = await delivery(to);
    const { runEmailDelivery } = await job({});
    await runEmailDelivery({ orgId: s.org.id, deliveryId: id });
    expect(await runEmailDelivery({ orgId: s.org.id, deliveryId: id })).toEqual({ skipped: true });
    const row = (await testDb().query.emailDeliveries.findFirst({ where: eq(emailDeliveries.id, id) }))!;
    expect([row.status, row.method, row.attempts]).toEqual(["sent", "attachment", 1]);
  });

  it("ignores a delivery id of another company", async () => {
    const { runEmailDelivery } = await job({});
    expect(await runEmailDelivery({ orgId: s.otherOrg.id, deliveryId: await delivery(`x-${randomUUID()}@t.test`) })).toEqual({ skipped: true });
  });
});
