// The superintendent plans a docking in Chromium, sees the work list gathered
// from a countersigned report with its totals, adjusts an item with a reason,
// adds work by hand (staging) at its own rate, and downloads the CSV.
import path from "node:path";
import { and, eq } from "drizzle-orm";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { findings, inspections } from "@/db/schema";
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
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("the docking work list in Chromium", () => {
  it("plans a docking, sees the totals, adjusts an item and downloads the CSV", async () => {
    const { baseUrl } = testEnv();
    const page = await signedInTabletPage(browser, baseUrl, s.users.superintendent.email, PASSWORD);
    const workList = new WorkListPage(page, baseUrl);
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
    // fillInspection: coating 2.5 + 1.2 = 3.7 m² × 35.50 = 131.35; 1 anode × 180.00; 50 mm × 20 m² = 1.0 m³ × 95.00;
    // grand total 131.35 + 180.00 + 95.00 = 406.35 (no steel)
    expect(await workList.total("coating").textContent()).toContain("$131.35");
    expect(await workList.total("steel").textContent()).toContain("$0.00");
    expect(await workList.grandTotal().textContent()).toContain("$406.35");
    await workList.adjust(/Sediment removal/, "3", "Yard survey found more mud");
    // sediment 3 m³ × 95.00 = 285.00; grand total 131.35 + 180.00 + 285.00 = 596.35
    expect(await workList.total("sediment").textContent()).toContain("$285.00");
    expect(await workList.grandTotal().textContent()).toContain("$596.35");

    // Work no finding asks for: a refused box keeps what was typed, then the item is added at its own rate.
    const staging = { Description: "Staging in No. 1 WBT P for the coating repair", Tank: "No. 1 WBT P", Quantity: "2", Unit: "days", "Unit rate (USD per unit)": "-1250.50", Reason: "Coating repair at Fr. 82–89 is out of reach" };
    await workList.fillItem(staging);
    await workList.addItemForm().getByRole("button", { name: "Add the item" }).click();
    await page.getByText("Unit rate (USD per unit) cannot be negative").waitFor();
    expect(await workList.addItemForm().getByLabel("Description", { exact: true }).inputValue()).toBe(staging.Description);
    expect(await workList.grandTotal().textContent()).toContain("$596.35");
    await workList.addItem({ "Unit rate (USD per unit)": "1250.50" });
    // 2 days × 1 250.50 = 2 501.00; grand total 596.35 + 2 501.00 = 3 097.35
    expect(await workList.totalCells("other")).toEqual(["Other work (added by hand)", "—", "1 included", "$2,501.00"]);
    expect(await workList.grandTotal().textContent()).toContain("$3,097.35");
    expect((await workList.itemRows()).find((cells) => cells[1]!.startsWith("Staging"))?.slice(2, 5)).toEqual(["2 days", "$1,250.50", "$2,501.00"]);
    expect(await workList.addItemForm().getByLabel("Description", { exact: true }).inputValue()).toBe("");
    // The pager above is read again from the server: 4 gathered items + 1 added.
    await page.getByText(/^Items 1–5 of 5/).waitFor();
    await page.screenshot({ path: path.join(ARTIFACTS, "work-list.png"), fullPage: true });

    const { fileName, text } = await workList.exportCsv();
    expect(fileName).toMatch(/^work-list-.*-2027-04-12\.csv$/);
    const lines = text.split("\r\n");
    expect(lines[0]).toBe("Tank,Kind,Description,Included,Quantity gathered,Adjusted quantity,Quantity priced,Unit,Unit rate,Currency,Cost,Reason");
    // the sediment zone's label from fillInspection tells the yard where
    expect(lines).toContain("No. 1 WBT P,Sediment removal,\"Sediment removal, 1 zone: Bottom between the floors, aft end\",yes,1,3,3,m³,95,USD,285.00,Yard survey found more mud");
    expect(lines).toContain("Total,Coating repair,\"2 included, 0 excluded\",,,,3.7,m²,,USD,131.35,");
    expect(lines).toContain("No. 1 WBT P,Other work (added by hand),Staging in No. 1 WBT P for the coating repair,yes,2,,2,days,1250.5,USD,2501.00,Added: Coating repair at Fr. 82–89 is out of reach");
    expect(lines).toContain('Total,Other work (added by hand),"1 included, 0 excluded",,,,,,,USD,2501.00,');
    expect(lines.at(-2)).toMatch(/^Grand total,,".*",,,,,,,USD,3097\.35,$/);

    // Removed again: back to the gathered total, 596.35 as worked above.
    await workList.removeItem(/Staging in No\. 1 WBT P/);
    expect(await workList.grandTotal().textContent()).toContain("$596.35");

    // The yard's quotation changes the coating rate: 3.7 m² × 40.00 = 148.00; grand total 148.00 + 180.00 + 285.00 = 613.00.
    const details = await workList.openDetails();
    await details.getByLabel("Coating repair, per m²", { exact: true }).fill("-40");
    await details.getByRole("button", { name: "Save the docking's details" }).click();
    await page.getByText("Coating repair, per m² cannot be negative").waitFor();
    expect(await workList.grandTotal().textContent()).toContain("$596.35");
    for (const width of [1280, 768]) {
      await page.setViewportSize({ width, height: 900 });
      await page.screenshot({ path: path.join(ARTIFACTS, `work-list-edit-details-${width}.png`), fullPage: true });
    }
    await workList.editDetails({ "Coating repair, per m²": "40" });
    await page.getByText(/^Items 1–4 of 4/).waitFor();
    await workList.total("coating").filter({ hasText: "$148.00" }).waitFor();
    expect(await workList.grandTotal().textContent()).toContain("$613.00");
    expect(await workList.sources().textContent()).toContain("coating $40.00/m²");

    // After the docking: the yard's work is ticked off item by item; finding 1 closes with its only item.
    await workList.startDocking();
    await workList.markDone(/Finding 1: /);
    const [finding] = await testDb().select({ status: findings.status }).from(findings).where(and(eq(findings.inspectionId, s.inspectionOf(s.ownVessel.id)), eq(findings.number, 1)));
    expect(finding!.status).toBe("closed");
    // The vessel's dockings: 4 items included (coating × 2, anodes, sediment), the grand total as worked above.
    expect(await workList.dockingRows(s.ownVessel.id)).toEqual([["2027-04-12", "Test Yard Shipbuilding", "Test Harbour", "In progress", "4 included", "$613.00"]]);
    await page.close();
  }, 120_000);
});
