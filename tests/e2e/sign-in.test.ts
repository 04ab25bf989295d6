import fs from "node:fs";
import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD, DEMO_USERS } from "@/db/seed/demo";
import { launchBrowser } from "../fixtures/browser";
import { testEnv } from "../fixtures/env";
import { testDb } from "../fixtures/scenario";
import { seedDemo } from "@/db/seed/demo";
import { AppShell, SignInPage } from "./pages/sign-in-page";

const ARTIFACTS = path.join(import.meta.dirname, "..", "artifacts");
let browser: Browser;

beforeAll(async () => {
  await seedDemo(testDb());
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Where each demo role lands, and a heading that proves it is that page. */
const HOMES: Record<(typeof DEMO_USERS)[number]["key"], { path: RegExp; heading: string }> = {
  officer: { path: /\/vessels\/[0-9a-f-]{36}$/, heading: "Skerry Lantern" },
  master: { path: /\/vessels\/[0-9a-f-]{36}$/, heading: "Skerry Lantern" },
  superintendent: { path: /\/fleet$/, heading: "Fleet" },
  surveyor: { path: /\/shared$/, heading: "Reports shared with you" },
  admin: { path: /\/admin$/, heading: "Administration" },
};

describe("sign in and out in Chromium", () => {
  for (const user of DEMO_USERS) {
    it(`${user.key} lands on their home page and signs out`, async () => {
      const { baseUrl } = testEnv();
      const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
      try {
        const signInPage = new SignInPage(page, baseUrl);
        await signInPage.open();
        await signInPage.signIn(user.email, DEMO_PASSWORD);
        await page.waitForURL(HOMES[user.key].path);
        await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe(HOMES[user.key].heading);
        const shell = new AppShell(page);
        await expect(shell.signedInAs().textContent()).resolves.toContain(user.name);
        await page.screenshot({ path: path.join(ARTIFACTS, `home-${user.key}.png`), fullPage: true });
        await shell.signOut();
        await page.waitForURL(/\/sign-in/);
        // Signed out for real: a protected page sends the visitor back to sign-in.
        await page.goto(`${baseUrl}/vessels`);
        await page.waitForURL(/\/sign-in\?callbackUrl=%2Fvessels/);
      } finally {
        await page.close();
      }
    });
  }

  it("a wrong password shows the one generic refusal and keeps the e-mail typed", async () => {
    const { baseUrl } = testEnv();
    const page = await browser.newPage({ viewport: { width: 768, height: 1024 } });
    try {
      const signInPage = new SignInPage(page, baseUrl);
      await signInPage.open();
      await signInPage.signIn("master@tankwright.test", "not-the-password");
      await expect(signInPage.refusalText()).resolves.toMatch(/Sign-in refused: check the e-mail address and password/);
      await expect(page.getByLabel("E-mail").inputValue()).resolves.toBe("master@tankwright.test");
      expect(page.url()).toMatch(/\/sign-in$/);
      await page.screenshot({ path: path.join(ARTIFACTS, "sign-in-refused.png") });
    } finally {
      await page.close();
    }
  });

  it("after sign-in the visitor returns to the page they asked for", async () => {
    const { baseUrl } = testEnv();
    const page = await browser.newPage();
    try {
      await page.goto(`${baseUrl}/admin/vessels`);
      await page.waitForURL(/callbackUrl=%2Fadmin%2Fvessels/);
      await new SignInPage(page, baseUrl).signIn("admin@tankwright.test", DEMO_PASSWORD);
      await page.waitForURL(/\/admin\/vessels$/);
      await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("Vessels");
    } finally {
      await page.close();
    }
  });
});
