import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser } from "../fixtures/browser";
import { testEnv } from "../fixtures/env";
import { pdfText } from "../fixtures/pdf";
import { buildScenario, PASSWORD, type TScenario } from "../fixtures/scenario";
import { signedInTabletPage } from "./pages/sign-in-page";
import { NewTankPage, TankPage } from "./pages/structure-map-pages";

const ARTIFACTS = path.join(import.meta.dirname, "..", "artifacts");
let browser: Browser;
let s: TScenario;
let page: Page;

beforeAll(async () => {
  s = await buildScenario();
  browser = await launchBrowser();
  page = await signedInTabletPage(browser, testEnv().baseUrl, s.users.officer.email, PASSWORD);
});
afterAll(async () => {
  await browser?.close();
});

describe("structure map in Chromium (officer, tablet width)", () => {
  it("refuses a vague tank in the browser, then creates it with members and prints its brief", async () => {
    const { baseUrl } = testEnv();
    await page.goto(`${baseUrl}/vessels/${s.ownVessel.id}/tanks/new`);
    const form = new NewTankPage(page);
    await form.fill({ code: "No. 4 WBT P", name: "No. 4 ballast tank, port", side: "port", kind: "double_bottom_side", frameFrom: "120", frameTo: "110" });
    await form.submit();
    await page.getByText("Forward frame must be forward of (greater than) the aft frame").waitFor();
    expect(page.url()).toMatch(/\/tanks\/new$/);

    await page.getByLabel("Forward frame").fill("138");
    await page.getByLabel("At the waterline").check();
    await form.submit();
    await page.waitForURL(/\/tanks\/[0-9a-f-]{36}$/);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("No. 4 WBT P");
    // The product says why the tank is in the midship region (scenario vessel: midship Fr. 60–140).
    await page.getByText("lies within the midship region (Fr. 60–140)").first().waitFor();

    const tank = new TankPage(page);
    await tank.addLongitudinals("side_shell", "20", "38", "Side shell longitudinals 20–38");
    await tank.addWebFrames("122-134/4", "Web frames at Fr. 122, 126, 130, 134");
    await expect(tank.catalogue().textContent()).resolves.toContain("Side shell longitudinals 20–38");
    await expect(tank.catalogue().textContent()).resolves.toContain("Web frames at Fr. 122, 126, 130, 134");
    await page.screenshot({ path: path.join(ARTIFACTS, "tank-page.png"), fullPage: true });

    await page.getByRole("link", { name: "Pre-entry brief" }).click();
    await page.waitForURL(/\/brief$/);
    await page.getByText("Bracket connections near deck and bottom").waitFor();
    await page.screenshot({ path: path.join(ARTIFACTS, "brief-page.png"), fullPage: true });
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download PDF to print" }).click()]);
    const file = path.join(ARTIFACTS, "brief.pdf");
    await download.saveAs(file);
    const { readFile } = await import("node:fs/promises");
    const text = await pdfText(new Uint8Array(await readFile(file)));
    expect(text).toContain("No. 4 WBT P");
    expect(text).toContain("Fr. 120–138");
    expect(text).toContain("Side shell longitudinals 20–38");
    expect(text).toContain("Bracket connections near deck and bottom");
    expect(text).toContain("Contact damage at the waterline");
  });
});
