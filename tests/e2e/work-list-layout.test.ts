// The work list as the superintendent reads it, at a desk (1280 px) and on a
// tablet (768 px): an excluded item says so in words and keeps its reason
// readable, the change panel is usable at tablet width and puts each refused
// field's message beside the field, a done item says when it was done with an
// action to undo it, and the progress counts the included items. Screenshots
// (and the PDF) go to tests/artifacts/ to be looked at.
import fs from "node:fs";
import path from "node:path";
import { eq } from "drizzle-orm";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { inspections } from "@/db/schema";
import { fillInspection } from "@/db/seed/complete-inspection";
import { launchBrowser } from "../fixtures/browser";
import { testEnv } from "../fixtures/env";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";
import { signedInTabletPage } from "./pages/sign-in-page";
import { WorkListPage } from "./pages/work-list-page";

const ARTIFACTS = path.join(import.meta.dirname, "..", "artifacts");
let browser: Browser;
let s: TScenario;

beforeAll(async () => {
  s = await buildScenario();
  const inspectionId = s.inspectionOf(s.ownVessel.id);
  await fillInspection(testDb(), { orgId: s.org.id, inspectionId, frameFrom: s.tankOf(s.ownVessel.id).frameFrom, testedAt: new Date("2026-11-20T08:00:00Z"), measuredBy: "Test officer", standbyPerson: "Test bosun" });
  await testDb().update(inspections).set({ status: "countersigned", countersignedAt: new Date("2026-11-21T10:00:00Z"), lockedAt: new Date("2026-11-21T10:00:00Z") }).where(eq(inspections.id, inspectionId));
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const shoot = async (page: Page, name: string) => {
  for (const width of [1280, 768]) {
    await page.setViewportSize({ width, height: 1024 });
    await page.screenshot({ path: path.join(ARTIFACTS, `${name}-${width}.png`), fullPage: true });
  }
};

/** Whether the element or any element it sits in is struck through (a struck-through ancestor strikes its text too). */
const struckThrough = (page: Page, text: string) =>
  page.getByText(text, { exact: true }).evaluate((el) => {
    for (let e: Element | null = el; e; e = e.parentElement) if (getComputedStyle(e).textDecorationLine.includes("line-through")) return true;
    return false;
  });

describe("the work list at desk and tablet width", () => {
  it("excluded, changed and done items read clearly at 1280 and 768 px", async () => {
    const { baseUrl } = testEnv();
    const page = await signedInTabletPage(browser, baseUrl, s.users.superintendent.email, PASSWORD);
    const workList = new WorkListPage(page, baseUrl);

    // The planned date is typed as the product writes dates, not in the browser's locale.
    await page.goto(`${baseUrl}/vessels/${s.ownVessel.id}/dockings`);
    await page.getByRole("link", { name: "Plan a docking" }).click();
    const planned = page.getByLabel("Planned date", { exact: true });
    expect(await planned.getAttribute("type")).toBe("text");
    expect(await planned.getAttribute("placeholder")).toBe("YYYY-MM-DD");
    await workList.planDocking(s.ownVessel.id, {
      Yard: "Test Yard Shipbuilding",
      Place: "Test Harbour",
      "Planned date": "2027-04-12",
      Currency: "USD",
      "Steel renewal, per kg": "4.20",
      "Coating repair, per m²": "35.50",
      "Anode renewal, per piece": "180",
      "Sediment removal, per m³": "95",
    });

    // Exclude finding 2's coating with a reason.
    const f2 = page.getByTestId("work-item").filter({ hasText: /Finding 2: / });
    await f2.getByRole("button", { name: /^Change/ }).click();
    await f2.getByLabel("Included").uncheck();
    await f2.getByLabel("Reason").fill("Touched up by the crew at sea");
    await f2.getByRole("button", { name: "Save" }).click();
    await page.getByText("Saved; the totals are priced again.").waitFor();
    // fillInspection: finding 2, 1.2 m² × 35.50 = 42.60, excluded: no cost on its row; the word, not only a line, says so.
    const [tank, work, , , cost] = (await workList.itemRows()).find((cells) => cells[1]!.includes("Finding 2: "))!;
    expect(tank).toBe("No. 1 WBT P");
    expect(work).toMatch(/^Excluded Finding 2: .* Reason: Touched up by the crew at sea$/);
    expect(cost).toBe("—");
    expect(await struckThrough(page, "Reason: Touched up by the crew at sea")).toBe(false);
    expect(await struckThrough(page, "Excluded")).toBe(false);

    // A refused change keeps what was typed and puts each message beside its field.
    const sediment = page.getByTestId("work-item").filter({ hasText: /Sediment removal/ });
    await sediment.getByRole("button", { name: /^Change/ }).click();
    await sediment.getByLabel(/Adjusted quantity/).fill("-2");
    await sediment.getByRole("button", { name: "Save" }).click();
    await sediment.getByText("Adjusted quantity cannot be negative").waitFor();
    await sediment.getByText("Reason is required: say why the quantity was changed").waitFor();
    expect(await page.getByText(/items\.0\./).count()).toBe(0);
    expect(await sediment.getByLabel(/Adjusted quantity/).inputValue()).toBe("-2");

    // At tablet width the panel's fields do not overlap and the reason box is wide enough to write in.
    await page.setViewportSize({ width: 768, height: 1024 });
    const included = await sediment.getByText("Included", { exact: true }).boundingBox();
    const quantity = await sediment.getByLabel(/Adjusted quantity/).boundingBox();
    const reason = await sediment.getByLabel("Reason").boundingBox();
    expect(included!.y + included!.height).toBeLessThanOrEqual(quantity!.y);
    expect(reason!.width).toBeGreaterThan(300);
    await shoot(page, "work-list-change");
    await sediment.getByRole("button", { name: "Cancel" }).click();

    // In progress: 3 included items (finding 1's coating, anodes, sediment), finding 1's done today.
    await workList.startDocking();
    await page.getByText("0 of 3 included items done").waitFor();
    await workList.markDone(/Finding 1: /);
    await page.getByText("1 of 3 included items done").waitFor();
    const f1 = page.getByTestId("work-item").filter({ hasText: /Finding 1: / });
    expect(await f1.getByTestId("item-done").textContent()).toBe(`Done ${new Date().toISOString().slice(0, 10)}`);
    expect(await f1.getByRole("button", { name: /^Undo done: Finding 1: / }).textContent()).toBe("Undo");
    expect(await f1.getByRole("button", { name: /^Mark done/ }).count()).toBe(0);
    await shoot(page, "work-list-in-progress");

    // The document sent to the yard, to be turned into pictures and looked at.
    const pdf = await page.request.get(`${page.url().split("?")[0]}`.replace("/dockings/", "/api/v1/dockings/") + "/work-list.pdf");
    expect(pdf.status()).toBe(200);
    fs.writeFileSync(path.join(ARTIFACTS, "work-list.pdf"), await pdf.body());

    await f1.getByRole("button", { name: /^Undo done/ }).click();
    await page.getByText("0 of 3 included items done").waitFor();
    await page.close();
  }, 120_000);
});
