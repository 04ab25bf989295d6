// The tank history in Chromium: from the tank page to its history, the three
// plots drawn by recharts after hydration (points, tooltip) over the static SVG
// that shows without JavaScript, the projection, the recurring findings and the
// history PDF link. Data: tests/fixtures/history.ts.
import { writeFile } from "node:fs/promises";
import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser } from "../fixtures/browser";
import { testEnv } from "../fixtures/env";
import { buildTankHistory } from "../fixtures/history";
import { buildScenario, PASSWORD, type TScenario } from "../fixtures/scenario";
import { SignInPage } from "./pages/sign-in-page";

const ARTIFACTS = path.join(import.meta.dirname, "..", "artifacts");
let browser: Browser;
let s: TScenario;
let tankId = "";

beforeAll(async () => {
  s = await buildScenario();
  tankId = (await buildTankHistory(s, "No. 4 WBT P")).tank.id;
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("tank history in Chromium", () => {
  it("opens from the tank page and shows the plots, their tables and the recurring findings", async () => {
    const { baseUrl } = testEnv();
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    const signIn = new SignInPage(page, baseUrl);
    await signIn.open();
    await signIn.signIn(s.users.superintendent.email, PASSWORD);
    await page.waitForURL(/\/fleet/);
    await page.goto(`${baseUrl}/vessels/${s.ownVessel.id}/tanks/${tankId}`);
    await page.getByRole("link", { name: "History", exact: true }).click();
    await page.waitForURL(/\/history$/);
    await page.getByRole("heading", { name: "No. 4 WBT P history" }).waitFor();
    await page.locator("[data-chart=interactive]").nth(2).waitFor();
    for (const name of ["Coating breakdown per area over time", "Mean anode wastage over time", "Sediment volume over time"]) {
      await expect(page.getByRole("img", { name }).count()).resolves.toBe(1);
    }
    const anodes = page.locator("[data-plot=anodes] [data-chart=interactive] svg");
    // One marker per signed inspection: 2024-03-01, 2025-03-01, 2026-03-01.
    await expect(anodes.locator("[data-series=mean]").evaluateAll((els) => els.map((e) => e.getAttribute("data-date")))).resolves.toEqual(["2024-03-01", "2025-03-01", "2026-03-01"]);
    // Eight coating areas (the fixture's complete inspection records all of them) × three signed inspections.
    await expect(page.locator("[data-plot=coating] [data-chart=interactive] svg [data-series]").count()).resolves.toBe(24);
    await expect(page.locator("[data-plot=sediment] [data-chart=interactive] svg [data-series=volume]").count()).resolves.toBe(3);
    // Higher wastage is drawn higher: 20 → 30 → 40 % go up the screen.
    const ys = await anodes.locator("[data-series=mean]").evaluateAll((els) => els.map((e) => e.getBoundingClientRect().top));
    expect(ys[0]!).toBeGreaterThan(ys[1]!);
    expect(ys[1]!).toBeGreaterThan(ys[2]!);
    await expect(page.locator("[data-plot=anodes]").getByText("Renewal threshold 60 %").count()).resolves.toBeGreaterThan(0);
    await expect(page.locator("[data-plot=anodes]").getByText("projected 2028-02-29").count()).resolves.toBeGreaterThan(0);
    await anodes.locator("[data-series=mean][data-date='2025-03-01']").hover();
    const tip = page.locator("[data-tooltip='2025-03-01']");
    await tip.waitFor();
    await expect(tip.textContent()).resolves.toContain("Mean wastage: 30.0 %");
    await expect(page.locator("[data-projection]").getAttribute("data-projection")).resolves.toBe("2028-02-29");
    await expect(page.locator("tr[data-recurring]").count()).resolves.toBe(3);
    const pdfHref = `/api/v1/vessels/${s.ownVessel.id}/tanks/${tankId}/history.pdf`;
    await expect(page.getByRole("link", { name: "Download history PDF" }).getAttribute("href")).resolves.toBe(pdfHref);
    const pdf = await page.request.get(baseUrl + pdfHref);
    expect([pdf.status(), pdf.headers()["content-type"]]).toEqual([200, "application/pdf"]);
    await writeFile(path.join(ARTIFACTS, "tank-history.pdf"), await pdf.body());
    await page.screenshot({ path: path.join(ARTIFACTS, "tank-history.png"), fullPage: true });
    await page.locator("[data-plot=anodes]").screenshot({ path: path.join(ARTIFACTS, "tank-history-anodes.png") });
    await page.locator("[data-plot=coating] [data-chart=interactive]").screenshot({ path: path.join(ARTIFACTS, "tank-history-coating.png") });

    // Without JavaScript the server-drawn SVG stands in for each plot.
    const noScript = await browser.newContext({ javaScriptEnabled: false, viewport: { width: 1280, height: 900 } });
    await noScript.addCookies(await page.context().cookies());
    const still = await noScript.newPage();
    await still.goto(`${baseUrl}/vessels/${s.ownVessel.id}/tanks/${tankId}/history`);
    await expect(still.locator("[data-chart=interactive]").count()).resolves.toBe(0);
    await expect(still.getByRole("img", { name: "Mean anode wastage over time" }).locator("path").count()).resolves.toBeGreaterThan(3);
    await still.screenshot({ path: path.join(ARTIFACTS, "tank-history-no-script.png"), fullPage: true });
    await noScript.close();
  });
});
