// The whole way of a report in Chromium: the officer signs and submits, the
// master reads and countersigns, the signed PDF is fingerprinted and e-mailed,
// the message is seen in the local mail catcher, and /verify recognises it.
import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { vesselRecipients } from "@/db/schema";
import { fillInspection } from "@/db/seed/complete-inspection";
import { launchBrowser } from "../fixtures/browser";
import { testEnv } from "../fixtures/env";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";
import { signedInTabletPage } from "./pages/sign-in-page";

const ARTIFACTS = path.join(import.meta.dirname, "..", "artifacts");
let browser: Browser;
let s: TScenario;
let inspectionId = "";
const office = () => `office-${s.run}@fleet.tankwright.test`;

beforeAll(async () => {
  s = await buildScenario();
  inspectionId = s.inspectionOf(s.ownVessel.id);
  await fillInspection(testDb(), { orgId: s.org.id, inspectionId, frameFrom: s.tankOf(s.ownVessel.id).frameFrom, testedAt: new Date("2026-11-20T08:00:00Z"), measuredBy: "Test officer", standbyPerson: "Test bosun" });
  await testDb().insert(vesselRecipients).values({ orgId: s.org.id, vesselId: s.ownVessel.id, kind: "office", name: "Fleet office", email: office() });
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("signing in Chromium: officer, then master, then the mail catcher", () => {
  it("submits, countersigns, fingerprints, e-mails and verifies the report", async () => {
    const { baseUrl } = testEnv();
    const officer = await signedInTabletPage(browser, baseUrl, s.users.officer.email, PASSWORD);
    await officer.goto(`${baseUrl}/inspections/${inspectionId}?step=review`);
    await officer.getByText("Ready to submit").waitFor();
    const submit = officer.getByRole("form", { name: "Sign and submit for countersigning" });
    await submit.getByLabel("Your password").fill("not-my-password");
    await submit.getByRole("button", { name: "Sign and submit for countersigning" }).click();
    await officer.getByText(/password is not right/).first().waitFor();
    // The typed signature survives the refusal; only the password is asked again.
    expect(await submit.getByLabel("Signature (your name as you sign)").inputValue()).toBe("Test officer");
    await submit.getByLabel("Your password").fill(PASSWORD);
    await submit.getByRole("button", { name: "Sign and submit for countersigning" }).click();
    await officer.getByText("Submitted: awaiting the master's countersignature").waitFor({ timeout: 20_000 });
    await officer.close();

    const master = await signedInTabletPage(browser, baseUrl, s.users.master.email, PASSWORD);
    await master.goto(`${baseUrl}/inspections/${inspectionId}`);
    await master.getByText("Submitted: awaiting the master's countersignature").waitFor();
    await master.getByRole("form", { name: "Return to the officer" }).waitFor();
    const countersign = master.getByRole("form", { name: "Countersign the report" });
    await countersign.getByLabel("Your password").fill(PASSWORD);
    await master.screenshot({ path: path.join(ARTIFACTS, "signing-master.png"), fullPage: true });
    await countersign.getByRole("button", { name: "Countersign the report" }).click();
    const print = master.getByTestId("fingerprint");
    await print.waitFor({ timeout: 90_000 });
    const fingerprint = (await print.textContent())!.trim();
    expect(fingerprint).toMatch(/^[0-9a-f]{64}$/);
    await expect.poll(() => master.getByTestId("delivery").filter({ hasText: office() }).textContent(), { timeout: 60_000 }).toMatch(/Sent.*PDF attached/);
    await master.screenshot({ path: path.join(ARTIFACTS, "signing-countersigned.png"), fullPage: true });

    // The local mail catcher's own page shows the message with its PDF.
    const mailUrl = process.env.MAILDEV_WEB_URL;
    expect(mailUrl, "scripts/test.sh sets MAILDEV_WEB_URL").toBeTruthy();
    const catcher = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await catcher.goto(mailUrl!);
    await catcher.getByText(s.ownVessel.name).first().waitFor({ timeout: 30_000 });
    await catcher.getByText(s.ownVessel.name).first().click();
    await catcher.getByText(/\.pdf/).first().waitFor({ timeout: 15_000 });
    await catcher.screenshot({ path: path.join(ARTIFACTS, "signing-mail-catcher.png"), fullPage: true });

    // Anyone with the fingerprint can check it, signed in or not.
    const visitor = await browser.newPage();
    await visitor.goto(`${baseUrl}/verify`);
    await visitor.getByLabel("or its fingerprint (SHA-256)").fill(fingerprint);
    await visitor.getByRole("button", { name: "Check" }).click();
    await visitor.getByTestId("verify-answer").filter({ hasText: s.ownVessel.name }).waitFor();
    expect(await visitor.getByTestId("verify-answer").textContent()).toMatch(/revision 1/);
    await visitor.screenshot({ path: path.join(ARTIFACTS, "verify.png"), fullPage: true });
  }, 240_000);
});
