import path from "node:path";
import type { Browser, Page } from "playwright-core";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { tankMembers } from "@/db/schema";
import { COATING_AREA_LABELS, COATING_AREAS } from "@/lib/vocabulary";
import { launchBrowser } from "../fixtures/browser";
import { testEnv } from "../fixtures/env";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";
import { signedInTabletPage } from "./pages/sign-in-page";
import { WizardPage } from "./pages/wizard-page";

const ARTIFACTS = path.join(import.meta.dirname, "..", "artifacts");
let browser: Browser;
let s: TScenario;
let page: Page;

beforeAll(async () => {
  s = await buildScenario();
  await testDb().insert(tankMembers).values({ orgId: s.org.id, tankId: s.tankOf(s.ownVessel.id).id, kind: "longitudinal", platingRegion: "bottom_shell", numberFrom: 1, numberTo: 12 });
  browser = await launchBrowser();
  page = await signedInTabletPage(browser, testEnv().baseUrl, s.users.officer.email, PASSWORD);
});
afterAll(async () => {
  await browser?.close();
});

describe("inspection wizard in Chromium (officer, tablet width)", () => {
  it("carries an inspection through every step, keeps everything over a reload, and refuses a vague finding", async () => {
    const { baseUrl } = testEnv();
    await page.goto(`${baseUrl}/vessels/${s.ownVessel.id}/inspections/new`);
    await page.getByLabel("Port or position").fill("Port Demo, berth 4");
    await page.getByLabel("Inspection team").fill("A. Officer, B. Bosun");
    await page.getByRole("button", { name: "Start the inspection" }).click();
    await page.waitForURL(/\/inspections\/[0-9a-f-]{36}\?step=entry/);
    const w = new WizardPage(page);

    // Entry record, with a test outside the limits first: the stop panel shows.
    await w.field("Entry permit reference").fill("EP-2026-114");
    await w.field("Standby person at the entrance").fill("C. Deckhand");
    await w.field("Rescue and resuscitation equipment ready at the entrance").check();
    await w.field("Time of test").fill("2026-11-28T08:15");
    await w.field("Oxygen (% vol)").fill("20.4");
    await w.field("Flammable (% LFL)").fill("0");
    await w.field("H₂S (ppm)").fill("0");
    await w.field("CO (ppm)").fill("0");
    await w.field("Measured by").fill("A. Officer");
    await page.getByRole("button", { name: "Record this test" }).click();
    await page.getByText("STOP — do not enter").waitFor();
    await page.screenshot({ path: path.join(ARTIFACTS, "wizard-stop.png"), fullPage: true });
    await w.field("Time of test").fill("2026-11-28T08:45");
    await w.field("Oxygen (% vol)").fill("20.9");
    await w.field("Flammable (% LFL)").fill("0");
    await w.field("H₂S (ppm)").fill("0");
    await w.field("CO (ppm)").fill("0");
    await page.getByRole("button", { name: "Record this test" }).click();
    await page.getByText("STOP — do not enter").waitFor({ state: "detached" });
    await w.waitSaved();

    // Findings: a vague one is refused in the browser and never sent.
    await w.goTo("Findings");
    await page.getByRole("button", { name: "Add a finding" }).click();
    const f = "Finding (new)";
    await w.field("From frame", f).fill("88");
    await w.field("Member number", f).fill("7");
    await w.field("Plating region", f).selectOption("bottom_shell");
    await w.field("Length (mm)", f).fill("40");
    await w.field("Description", f).fill("some corrosion in the tank");
    await page.getByText(/Not saved yet/).waitFor();
    await page.getByText(/only says that there is corrosion somewhere/).first().waitFor();
    await page.screenshot({ path: path.join(ARTIFACTS, "wizard-vague-finding.png"), fullPage: true });

    await w.field("Description", f).fill("Crack through the weld at the lower bracket toe, coating cracked around it");
    await w.field("Repair", f).selectOption("insert_plate");
    await w.field("Insert length (mm)", f).fill("400");
    await w.field("Insert width (mm)", f).fill("800");
    await w.field("Plate thickness (mm)", f).fill("8");
    await w.field("Pieces", f).fill("1");
    await page.getByText("Steel weight: 20.1 kg").waitFor();
    await w.waitSaved();

    // Coating: typed, then the page is reloaded before moving on.
    await w.goTo("Coating");
    for (const [i, area] of COATING_AREAS.entries()) {
      const label = COATING_AREA_LABELS[area];
      await page.getByLabel(`${label}: breakdown %`).fill(i === 6 ? "25" : "2");
      await page.getByLabel(`${label}: rusted area %`).fill("1");
      await page.getByLabel(`${label}: hard scale %`).fill("0");
    }
    await page.getByText("POOR").first().waitFor();
    await page.reload();
    await w.goTo("Coating");
    await expect(page.getByLabel("Edges and welds: breakdown %").inputValue()).resolves.toBe("25");
    await page.getByText(/worst area Edges and welds/).waitFor();
    await w.waitSaved();

    await w.goTo("Anodes");
    await w.field("Anodes installed").fill("12");
    await w.field("Anodes inspected").fill("12");
    await w.field("Mean wastage (%)").fill("35");
    await w.field("Pieces to renew").fill("2");
    await w.waitSaved();

    await w.goTo("Sediment");
    await page.getByRole("button", { name: "Add a sediment zone" }).click();
    await w.field("Where").fill("Bottom between the floors, aft end");
    await w.field("Depth (mm)").fill("100");
    await w.field("Length (m)").fill("15");
    await w.field("Breadth (m)").fill("30");
    await page.getByText("Total 45.00 m³").waitFor();
    await w.waitSaved();

    await w.goTo("Not inspected");
    await w.field("Every area of the tank was inspected").check();
    await w.waitSaved();

    await w.goTo("Remarks");
    await page.getByRole("textbox", { name: "Remarks" }).click();
    await page.keyboard.type("Tank ventilated for 24 hours before entry.");
    await w.waitSaved();

    // A reload mid-way: everything is still there, from the server. The crack
    // has no close-up yet, so the review names that as the one thing missing.
    await page.reload();
    await w.goTo("Review");
    await page.getByText("Photos: finding 1 needs at least one close-up photo that names it.").waitFor();

    // An overview of the area and a close-up of the crack that names it.
    await w.goTo("Photos");
    const photo = (shade: number) => sharp({ create: { width: 1200, height: 900, channels: 3, background: { r: shade, g: 90, b: 70 } } }).jpeg().toBuffer();
    await page.getByTestId("photo-files").setInputFiles([
      { name: "overview.jpg", mimeType: "image/jpeg", buffer: await photo(150) },
      { name: "crack.jpg", mimeType: "image/jpeg", buffer: await photo(60) },
    ]);
    const cards = page.getByTestId("photo-card");
    await expect.poll(() => cards.locator("img").count(), { timeout: 30_000 }).toBe(2);
    const caption = async (n: number, kind: string, from: string, to: string, text: string) => {
      const card = cards.nth(n);
      await card.getByLabel("Kind").selectOption(kind);
      await card.getByLabel("From frame").fill(from);
      await card.getByLabel("To frame").fill(to);
      await card.getByLabel("Member", { exact: true }).selectOption("longitudinal");
      await card.getByLabel("Plating region").selectOption("bottom_shell");
      await card.getByLabel("Member number").fill("7");
      await card.getByLabel("What it shows").fill(text);
      return card;
    };
    await caption(0, "overview", "86", "90", "Bottom longitudinal 7 between the floors, looking forward");
    await w.waitSaved();
    const closeUp = await caption(1, "close_up", "88", "88", "Crack at the lower bracket toe of longitudinal 7");
    await closeUp.getByLabel("Shows finding").selectOption({ index: 1 });
    await expect.poll(() => closeUp.getByLabel("Overview of the same place").locator("option").count()).toBe(2);
    await closeUp.getByLabel("Overview of the same place").selectOption({ index: 1 });
    await w.waitSaved();

    await w.goTo("Review");
    await page.getByText("Ready to submit").waitFor();
    await expect(page.getByRole("listitem").filter({ hasText: "#1 Crack" }).textContent()).resolves.toMatch(/Fr\. 88 .*20\.1 kg/);
    await page.getByText(/Sediment: 45\.00 m³/).waitFor();
    await page.screenshot({ path: path.join(ARTIFACTS, "wizard-review.png"), fullPage: true });
    await w.goTo("Remarks");
    await page.getByText("Tank ventilated for 24 hours before entry.").waitFor();
  });
});
