// The tank history in Chromium: from the tank page to its history, the three
// plots with their data tables, the projection and the recurring findings.
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
    for (const name of ["Coating breakdown per area over time", "Mean anode wastage over time", "Sediment volume over time"]) {
      await expect(page.getByRole("img", { name }).count()).resolves.toBe(1);
    }
    await expect(page.locator("[data-projection]").getAttribute("data-projection")).resolves.toBe("2028-02-29");
    await expect(page.locator("tr[data-recurring]").count()).resolves.toBe(3);
    await page.screenshot({ path: path.join(ARTIFACTS, "tank-history.png"), fullPage: true });
  });
});
