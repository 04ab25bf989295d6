// The fleet overview in Chromium: the superintendent sees the counts, the
// ratings as words with their patterns, and narrows the list with the filters.
import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { coatingAreas, inspectionIntervals, inspections } from "@/db/schema";
import { insertTank } from "@/db/seed/builders";
import { launchBrowser } from "../fixtures/browser";
import { testEnv } from "../fixtures/env";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";
import { SignInPage } from "./pages/sign-in-page";

const ARTIFACTS = path.join(import.meta.dirname, "..", "artifacts");
let browser: Browser;
let s: TScenario;

beforeAll(async () => {
  s = await buildScenario();
  const db = testDb();
  await db.insert(inspectionIntervals).values({ orgId: s.org.id, vesselId: null, defaultMonths: 12, belowGoodMonths: 6 });
  const rows: [string, string, number][] = [
    ["No. 2 WBT P", "2026-06-30", 1],
    ["No. 2 WBT S", "2025-09-15", 12],
    ["No. 3 WBT P", "2026-02-01", 27],
  ];
  for (const [code, inspectedOn, breakdownPct] of rows) {
    const t = await insertTank(db, { orgId: s.org.id, vesselId: s.ownVessel.id, code, name: `Side tank ${code}`, side: code.endsWith("P") ? "port" : "starboard", kind: "side", frameFrom: 100, frameTo: 120 });
    const [ins] = await db.insert(inspections).values({ orgId: s.org.id, vesselId: s.ownVessel.id, tankId: t.id, inspectedOn, placeKind: "port", place: "Test port", status: "countersigned" }).returning();
    await db.insert(coatingAreas).values({ orgId: s.org.id, inspectionId: ins!.id, area: "shell_plating", breakdownPct, rustedPct: 0, hardScalePct: 0 });
  }
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("fleet overview in Chromium", () => {
  it("shows counts, ratings in words and patterns, and filters by rating", async () => {
    const { baseUrl } = testEnv();
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    const signIn = new SignInPage(page, baseUrl);
    await signIn.open();
    await signIn.signIn(s.users.superintendent.email, PASSWORD);
    await page.waitForURL(/\/fleet/);
    await page.getByRole("heading", { name: "Fleet" }).waitFor();
    const counts = page.getByLabel("Counts");
    await expect(counts.textContent()).resolves.toMatch(/Tanks\s*5/);
    await expect(page.locator('tr[data-tank="No. 3 WBT P"] [data-rating]').textContent()).resolves.toBe("POOR");
    await expect(page.locator('tr[data-tank="No. 2 WBT S"] [data-overdue]').count()).resolves.toBe(1);
    await page.screenshot({ path: path.join(ARTIFACTS, "fleet-overview.png"), fullPage: true });

    await page.getByLabel("Rating").selectOption("POOR");
    await page.getByRole("button", { name: "Show" }).click();
    await page.waitForURL(/rating=POOR/);
    await expect(page.locator("tr[data-tank]").count()).resolves.toBe(1);

    // Most urgent first (company: 12 months, 6 below GOOD). Due dates by hand: No. 2 WBT S (12 %: FAIR,
    // 2025-09-15 + 6 months = 2026-03-15), No. 3 WBT P (27 %: POOR, 2026-02-01 + 6 = 2026-08-01), No. 2 WBT P
    // (1 %: GOOD, 2026-06-30 + 12 = 2027-06-30); the two No. 1 WBT P (own and sibling vessel) were never inspected:
    // due today. Overdue first (oldest due date first), then due today (a dated tank before a never-inspected one),
    // then the soonest — so the order depends on today's date, which the browser run does not fix.
    const today = new Date().toISOString().slice(0, 10);
    const due: [string, string | null][] = [["No. 2 WBT S", "2026-03-15"], ["No. 3 WBT P", "2026-08-01"], ["No. 2 WBT P", "2027-06-30"], ["No. 1 WBT P", null], ["No. 1 WBT P", null]];
    const urgent = [...due].sort(([, a], [, b]) => (a ?? today).localeCompare(b ?? today) || Number(a === null) - Number(b === null)).map(([code]) => code);
    await page.getByLabel("Rating").selectOption("");
    await page.locator('select[name="sort"]').selectOption("due");
    await page.getByRole("button", { name: "Show" }).click();
    await page.waitForURL(/sort=due/);
    await expect(page.locator("tr[data-tank]").evaluateAll((rows) => rows.map((r) => r.getAttribute("data-tank")))).resolves.toEqual(urgent);
    await expect(page.locator('select[name="sort"]').inputValue()).resolves.toBe("due");

    // From the fleet, the tank code opens the tank's history.
    await page.locator('tr[data-tank="No. 3 WBT P"] a[data-link="history"]').click();
    await page.waitForURL(/\/tanks\/[0-9a-f-]+\/history$/);
    await page.getByRole("heading", { name: "No. 3 WBT P history" }).waitFor();

    await page.goto(`${baseUrl}/fleet?dueWithin=soon`);
    await page.getByText("These filters cannot be used").waitFor();
    await page.screenshot({ path: path.join(ARTIFACTS, "fleet-overview-bad-filter.png"), fullPage: true });

    await page.goto(`${baseUrl}/fleet?page=99`);
    await page.getByText("There is no page 99: the list has 1 page.").waitFor();
    await page.screenshot({ path: path.join(ARTIFACTS, "fleet-overview-past-last-page.png"), fullPage: true });
    await page.goto(`${baseUrl}/fleet?vessel=${s.otherVessel.id}`);
    await page.getByText("This record does not exist or is not open to you.").waitFor();
    await page.screenshot({ path: path.join(ARTIFACTS, "fleet-not-found.png"), fullPage: true });
    const back = page.getByRole("navigation", { name: "Where to go" }).getByRole("link");
    await expect(back.evaluateAll((links) => links.map((a) => a.getAttribute("href")))).resolves.toEqual(["/", "/fleet", "/vessels"]);

    await page.setViewportSize({ width: 768, height: 900 });
    await page.goto(`${baseUrl}/fleet?sort=due`);
    await page.getByRole("heading", { name: "Fleet" }).waitFor();
    await page.screenshot({ path: path.join(ARTIFACTS, "fleet-overview-768.png"), fullPage: true });
  });
});
