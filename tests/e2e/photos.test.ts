// The photo step in Chromium at tablet width: two photos uploaded straight to
// storage with progress, captioned as overview and close-up, seen in the gallery.
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser } from "../fixtures/browser";
import { testEnv } from "../fixtures/env";
import { buildScenario, PASSWORD, type TScenario } from "../fixtures/scenario";
import { signedInTabletPage } from "./pages/sign-in-page";
import { WizardPage } from "./pages/wizard-page";

const ARTIFACTS = path.join(import.meta.dirname, "..", "artifacts");
let browser: Browser;
let s: TScenario;
let page: Page;

const jpeg = (r: number, g: number, b: number) =>
  sharp({ create: { width: 2400, height: 1800, channels: 3, background: { r: 120, g: 120, b: 120 }, noise: { type: "gaussian", mean: 120, sigma: 25 } } })
    .composite([{ input: { create: { width: 1200, height: 900, channels: 3, background: { r, g, b } } }, left: 600, top: 450 }])
    .jpeg({ quality: 92 })
    .toBuffer();

beforeAll(async () => {
  s = await buildScenario();
  browser = await launchBrowser();
  page = await signedInTabletPage(browser, testEnv().baseUrl, s.users.officer.email, PASSWORD);
});
afterAll(async () => {
  await browser?.close();
});

describe("photo step in Chromium (officer, tablet width)", () => {
  it("uploads two photos with progress, captions them as overview and close-up, and shows them in the gallery", async () => {
    await page.goto(`${testEnv().baseUrl}/inspections/${s.inspectionOf(s.ownVessel.id)}?step=photos`);
    await page.getByRole("heading", { level: 2, name: "Photos" }).waitFor();
    // Record every progress value the page shows while the files go up.
    await page.evaluate(() => {
      const seen: number[] = ((window as unknown as { seenProgress: number[] }).seenProgress = []);
      new MutationObserver(() => document.querySelectorAll("progress").forEach((p) => seen.push(Number((p as HTMLProgressElement).value)))).observe(document.body, { subtree: true, childList: true, attributes: true });
    });
    await page.getByTestId("photo-files").setInputFiles([
      { name: "overview-fr84-92.jpg", mimeType: "image/jpeg", buffer: await jpeg(200, 60, 40) },
      { name: "closeup-fr88.jpg", mimeType: "image/jpeg", buffer: await jpeg(40, 60, 200) },
    ]);
    const cards = page.getByTestId("photo-card");
    await expect.poll(() => cards.locator("img").count(), { timeout: 30_000 }).toBe(2);
    const seen = await page.evaluate(() => (window as unknown as { seenProgress: number[] }).seenProgress);
    expect(seen.some((v) => v > 0)).toBe(true);

    const w = new WizardPage(page);
    const first = cards.nth(0);
    await first.getByLabel("Kind").selectOption("overview");
    await first.getByLabel("From frame").fill("84");
    await first.getByLabel("To frame").fill("92");
    await first.getByLabel("Member", { exact: true }).selectOption("plating");
    await first.getByLabel("Plating region").selectOption("inner_bottom");
    await first.getByLabel("What it shows").fill("Inner bottom plating looking forward from the aft manhole");
    await w.waitSaved();

    const second = cards.nth(1);
    await second.getByLabel("Kind").selectOption("close_up");
    await second.getByLabel("From frame").fill("88");
    await second.getByLabel("To frame").fill("88");
    await second.getByLabel("Member", { exact: true }).selectOption("plating");
    await second.getByLabel("Plating region").selectOption("inner_bottom");
    await second.getByLabel("What it shows").fill("Pitting 3 mm deep over 200 × 150 mm beside the weld");
    const overview = second.getByLabel("Overview of the same place");
    await expect.poll(() => overview.locator("option").count()).toBe(2);
    await overview.selectOption({ index: 1 });
    await w.waitSaved();

    // After a reload the gallery shows the overview, then its close-up, with their captions.
    await page.reload();
    await page.getByRole("heading", { level: 2, name: "Photos" }).waitFor();
    await expect.poll(() => cards.count()).toBe(2);
    expect(await cards.evaluateAll((els) => els.map((e) => e.getAttribute("data-kind")))).toEqual(["overview", "close_up"]);
    expect(await cards.nth(0).getByLabel("What it shows").inputValue()).toMatch(/aft manhole/);
    expect(await cards.nth(1).getByLabel("What it shows").inputValue()).toMatch(/Pitting 3 mm/);
    // Filtering by a frame outside the close-up leaves the overview alone.
    await page.getByLabel("Show photos at frame").fill("85");
    await expect.poll(() => cards.count()).toBe(1);
    await page.getByLabel("Show photos at frame").fill("");
    await page.screenshot({ path: path.join(ARTIFACTS, "photos-gallery.png"), fullPage: true });
  });
});
