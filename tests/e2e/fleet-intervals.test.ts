// The interval settings on the fleet page in Chromium: choosing a vessel loads
// its own intervals or the company's and says which; a non-number is told it
// must be a whole number of months.
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { inspectionIntervals } from "@/db/schema";
import { launchBrowser } from "../fixtures/browser";
import { testEnv } from "../fixtures/env";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";
import { SignInPage } from "./pages/sign-in-page";

const ARTIFACTS = path.join(import.meta.dirname, "..", "artifacts");
let browser: Browser;
let s: TScenario;

beforeAll(async () => {
  s = await buildScenario();
  // Company: 12 months, 6 below GOOD; the sibling vessel has its own 6 and 3.
  await testDb().insert(inspectionIntervals).values([
    { orgId: s.org.id, vesselId: null, defaultMonths: 12, belowGoodMonths: 6 },
    { orgId: s.org.id, vesselId: s.siblingVessel.id, defaultMonths: 6, belowGoodMonths: 3 },
  ]);
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const boxes = async (page: Page) => {
  const form = page.getByRole("form", { name: "Set inspection intervals" });
  return [await form.getByLabel("Interval (months)").inputValue(), await form.getByLabel("Below GOOD (months)").inputValue()];
};

describe("interval settings in Chromium", () => {
  it("loads the chosen vessel's intervals, says whose they are, and refuses a non-number as such", async () => {
    const { baseUrl } = testEnv();
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    const signIn = new SignInPage(page, baseUrl);
    await signIn.open();
    await signIn.signIn(s.users.superintendent.email, PASSWORD);
    await page.waitForURL(/\/fleet/);
    const summary = page.locator("summary", { hasText: "Inspection intervals:" });
    await expect(summary.textContent()).resolves.toBe("Inspection intervals: 12 months, 6 below GOOD · 1 vessel has its own intervals");
    await summary.click();
    const form = page.getByRole("form", { name: "Set inspection intervals" });

    await expect(boxes(page)).resolves.toEqual(["12", "6"]); // the company's
    await form.getByLabel("For").selectOption({ label: s.siblingVessel.name });
    await expect(boxes(page)).resolves.toEqual(["6", "3"]); // the sibling vessel's own row
    await expect(page.getByTestId("interval-source").textContent()).resolves.toBe("This vessel has its own intervals.");
    await form.getByLabel("For").selectOption({ label: s.ownVessel.name });
    await expect(boxes(page)).resolves.toEqual(["12", "6"]); // no row of its own: the company's
    await expect(page.getByTestId("interval-source").textContent()).resolves.toBe("This vessel uses the company's intervals.");

    await form.getByLabel("Interval (months)").fill("abc");
    await form.getByRole("button", { name: "Save the intervals" }).click();
    const alert = page.getByRole("alert").filter({ hasText: "Interval" });
    await expect(alert.textContent()).resolves.toBe("Interval must be a whole number of months");
    await expect(boxes(page)).resolves.toEqual(["abc", "6"]); // what was typed is kept
    await page.screenshot({ path: path.join(ARTIFACTS, "fleet-intervals-1280.png"), fullPage: true });

    // The own vessel gets its own 9 and 4: two vessels now have their own.
    await form.getByLabel("Interval (months)").fill("9");
    await form.getByLabel("Below GOOD (months)").fill("4");
    await form.getByRole("button", { name: "Save the intervals" }).click();
    await page.getByText("Saved: due dates follow the new intervals.").waitFor();
    await page.locator("summary", { hasText: "2 vessels have their own intervals" }).waitFor();
    await page.getByTestId("interval-source").filter({ hasText: "This vessel has its own intervals." }).waitFor();

    await page.setViewportSize({ width: 768, height: 900 });
    await page.screenshot({ path: path.join(ARTIFACTS, "fleet-intervals-768.png"), fullPage: true });
  });
});
