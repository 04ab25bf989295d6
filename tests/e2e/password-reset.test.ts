// "Forgot your password?" in Chromium: ask for a link, open it from the mail
// catcher, choose a new password, sign in with it; the link then refuses a second use.
import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser } from "../fixtures/browser";
import { testEnv } from "../fixtures/env";
import { waitForMail } from "../fixtures/mail";
import { trySignIn } from "../fixtures/http";
import { buildScenario, PASSWORD, type TScenario } from "../fixtures/scenario";
import { SignInPage } from "./pages/sign-in-page";

const ARTIFACTS = path.join(import.meta.dirname, "..", "artifacts");
let browser: Browser;
let s: TScenario;

beforeAll(async () => {
  s = await buildScenario();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("password reset in Chromium", () => {
  it("e-mails a link that sets a new password once", async () => {
    const { baseUrl } = testEnv();
    const email = s.users.surveyor.email;
    // Someone who has used the account before forgets the password (a never-used account is asked to "Choose your password").
    expect((await trySignIn(email, PASSWORD)).signedIn).toBe(true);
    const page = await browser.newPage({ viewport: { width: 768, height: 1024 } });
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole("link", { name: "Forgot your password?" }).click();
    await page.waitForURL(/\/forgot-password/);
    await page.waitForLoadState("networkidle");
    await page.getByLabel("E-mail").fill(email);
    await page.getByRole("button", { name: "Send me a link" }).click();
    await page.getByText(/If an account exists for that address/).waitFor();

    const mail = await waitForMail({ to: email, subjectIncludes: "password", timeoutMs: 30_000 });
    const link = mail.text.match(/https?:\/\/\S+reset-password\?token=[A-Za-z0-9_%-]+/)?.[0];
    expect(link, "the e-mail carries the reset link").toBeDefined();
    await page.goto(link!);
    await page.waitForLoadState("networkidle");
    await page.getByLabel("New password", { exact: true }).fill("a-new-password-for-the-test");
    await page.getByLabel("New password again").fill("a-different-one");
    await page.getByRole("button", { name: "Set the new password" }).click();
    await page.getByText(/does not match/).first().waitFor();
    await page.getByLabel("New password again").fill("a-new-password-for-the-test");
    await page.getByRole("button", { name: "Set the new password" }).click();
    await page.getByText("Your password has been changed. Sign in with the new password.").waitFor();
    await page.screenshot({ path: path.join(ARTIFACTS, "password-reset-done.png"), fullPage: true });

    const signIn = new SignInPage(page, baseUrl);
    await signIn.open();
    await signIn.signIn(email, "a-new-password-for-the-test");
    await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));

    // The same link a second time: refused, and the password stays as it is.
    const again = await browser.newPage();
    await again.goto(link!);
    await again.getByText(/was already used/).first().waitFor();
  });
});
