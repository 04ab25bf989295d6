// The demo superintendent plans a docking of the demo vessel in Chromium, sees
// the work list gathered from the demo's countersigned report with its totals,
// and exports the CSV.
//
// Every expected value below is worked by hand from db/seed/demo.ts and
// db/seed/complete-inspection.ts (the demo's countersigned report of
// "No. 2 DB WBT P", Skerry Lantern, inspected 2026-05-12):
// - tank No. 2 DB WBT P spans Fr. 196–228, so fillInspection's frameFrom is 196;
// - finding 1: coating breakdown, Fr. 196+2 = 198 to 196+5 = 201, inner bottom plating, coating touch-up 2.5 m²;
// - finding 2: coating breakdown, Fr. 196+8 = 204 to 196+9 = 205, bottom shell plating, coating touch-up 1.2 m²;
// - neither finding has a steel repair (both are coating touch-ups), so the demo asks for no steel;
// - anodes: 1 to renew; sediment: one zone, "Bottom between the floors, aft end", 50 mm deep over 20 m².
// The demo's other inspection (No. 3 DB WBT P) is ready to sign, not countersigned, so it is not gathered.
import fs from "node:fs";
import path from "node:path";
import { and, eq } from "drizzle-orm";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { organisations, vessels } from "@/db/schema";
import { DEMO_ORG_SLUG, DEMO_PASSWORD, DEMO_USERS, seedDemo } from "@/db/seed/demo";
import { launchBrowser } from "../fixtures/browser";
import { testEnv } from "../fixtures/env";
import { testDb } from "../fixtures/scenario";
import { signedInTabletPage } from "./pages/sign-in-page";
import { WorkListPage } from "./pages/work-list-page";

const ARTIFACTS = path.join(import.meta.dirname, "..", "artifacts");
const SUPERINTENDENT = DEMO_USERS.find((u) => u.key === "superintendent")!;
let browser: Browser;
let demoVesselId: string;

beforeAll(async () => {
  // The test database is shared by every file of the run: seedDemo seeds only
  // when the demo company is absent (another file may have seeded it already).
  const db = testDb();
  await seedDemo(db);
  const [org] = await db.select({ id: organisations.id }).from(organisations).where(eq(organisations.slug, DEMO_ORG_SLUG));
  const [vessel] = await db.select({ id: vessels.id }).from(vessels).where(and(eq(vessels.orgId, org!.id), eq(vessels.name, "Skerry Lantern")));
  demoVesselId = vessel!.id;
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("the docking work list from the demo data in Chromium", () => {
  it("the demo superintendent plans a docking, reads the totals and exports the CSV", async () => {
    const { baseUrl } = testEnv();
    const page = await signedInTabletPage(browser, baseUrl, SUPERINTENDENT.email, DEMO_PASSWORD);
    try {
      // The superintendent's home is the fleet overview: signed in as the demo office user, not another.
      await page.waitForURL(/\/fleet$/);
      const workList = new WorkListPage(page, baseUrl);
      // The demo office's rates (demo seed cost_rates, "Demo repair yard"), typed by the superintendent.
      await workList.planDocking(demoVesselId, {
        Yard: "Demo repair yard",
        Place: "Port Averly, dry dock 2",
        "Planned date": "2027-03-08",
        Currency: "USD",
        "Steel renewal, per kg": "9.50",
        "Coating repair, per m²": "38.00",
        "Anode renewal, per piece": "145",
        "Sediment removal, per m³": "60",
      });

      // Only the countersigned report is a source; rates as typed.
      expect(await workList.sources().textContent()).toBe(
        "Gathered from No. 2 DB WBT P (2026-05-12). Rates: steel $9.50/kg, coating $38.00/m², anodes $145.00/piece, sediment $60.00/m³.",
      );

      // Items, ordered by tank, then kind (steel, coating, anodes, sediment), then description.
      expect((await workList.itemRows()).map((cells) => cells.slice(0, 5))).toEqual([
        // demo seed: finding 1, coating touch-up 2.5 m² × 38.00 = 95.00
        ["No. 2 DB WBT P", "Finding 1: Local coating breakdown, Fr. 198–201, Inner bottom plating: coating repair (coating touch-up)", "2.5 m²", "$38.00", "$95.00"],
        // demo seed: finding 2, coating touch-up 1.2 m² × 38.00 = 45.60
        ["No. 2 DB WBT P", "Finding 2: Local coating breakdown, Fr. 204–205, Bottom shell plating: coating repair (coating touch-up)", "1.2 m²", "$38.00", "$45.60"],
        // demo seed: anodes toRenewCount 1 × 145.00 = 145.00
        ["No. 2 DB WBT P", "Anodes to renew", "1 pcs", "$145.00", "$145.00"],
        // demo seed: sediment 50 mm = 0.050 m × 20 m² = 1.0 m³ × 60.00 = 60.00
        // demo seed: the zone's label, "Bottom between the floors, aft end" (db/seed/complete-inspection.ts)
        ["No. 2 DB WBT P", "Sediment removal, 1 zone: Bottom between the floors, aft end", "1 m³", "$60.00", "$60.00"],
      ]);

      // Per-kind totals: kind, quantity, items, cost.
      // demo seed: no steel repair in either finding → 0 kg × 9.50 = 0.00 (plate mass, lib/calc/steel.ts, is not reached)
      expect(await workList.totalCells("steel")).toEqual(["Steel renewal", "0 kg", "0 included", "$0.00"]);
      // demo seed: coating 2.5 m² + 1.2 m² = 3.7 m² × 38.00 = 140.60
      expect(await workList.totalCells("coating")).toEqual(["Coating repair", "3.7 m²", "2 included", "$140.60"]);
      // demo seed: 1 anode × 145.00 = 145.00
      expect(await workList.totalCells("anodes")).toEqual(["Anode renewal", "1 pcs", "1 included", "$145.00"]);
      // demo seed: 0.050 m × 20 m² = 1.0 m³ × 60.00 = 60.00
      expect(await workList.totalCells("sediment")).toEqual(["Sediment removal", "1 m³", "1 included", "$60.00"]);
      // nothing added by hand: its quantity is never summed (mixed units), shown as a dash
      expect(await workList.totalCells("other")).toEqual(["Other work (added by hand)", "—", "0 included", "$0.00"]);
      // 0.00 + 140.60 + 145.00 + 60.00 = 345.60
      expect(await workList.grandTotalCells()).toEqual(["Grand total", "", "", "$345.60"]);
      expect(await page.getByText("Open findings the yard cannot price").count()).toBe(0);

      await page.screenshot({ path: path.join(ARTIFACTS, "work-list-demo.png"), fullPage: true });

      const { fileName, text } = await workList.exportCsv();
      expect(fileName).toBe("work-list-Skerry-Lantern-2027-03-08.csv");
      expect(text.endsWith("\r\n")).toBe(true);
      expect(text.slice(0, -2).split("\r\n")).toEqual([
        "Tank,Kind,Description,Included,Quantity gathered,Adjusted quantity,Quantity priced,Unit,Unit rate,Currency,Cost,Reason",
        // 2.5 m² × 38 = 95.00
        'No. 2 DB WBT P,Coating repair,"Finding 1: Local coating breakdown, Fr. 198–201, Inner bottom plating: coating repair (coating touch-up)",yes,2.5,,2.5,m²,38,USD,95.00,',
        // 1.2 m² × 38 = 45.60
        'No. 2 DB WBT P,Coating repair,"Finding 2: Local coating breakdown, Fr. 204–205, Bottom shell plating: coating repair (coating touch-up)",yes,1.2,,1.2,m²,38,USD,45.60,',
        // 1 piece × 145 = 145.00
        "No. 2 DB WBT P,Anode renewal,Anodes to renew,yes,1,,1,pcs,145,USD,145.00,",
        // 50 mm × 20 m² = 1 m³ × 60 = 60.00
        'No. 2 DB WBT P,Sediment removal,"Sediment removal, 1 zone: Bottom between the floors, aft end",yes,1,,1,m³,60,USD,60.00,',
        // no steel repair in the demo report: 0 kg, 0.00
        'Total,Steel renewal,"0 included, 0 excluded",,,,0,kg,,USD,0.00,',
        // 2.5 + 1.2 = 3.7 m² × 38 = 140.60
        'Total,Coating repair,"2 included, 0 excluded",,,,3.7,m²,,USD,140.60,',
        'Total,Anode renewal,"1 included, 0 excluded",,,,1,pcs,,USD,145.00,',
        'Total,Sediment removal,"1 included, 0 excluded",,,,1,m³,,USD,60.00,',
        // nothing added by hand: no quantity (mixed units), 0.00
        'Total,Other work (added by hand),"0 included, 0 excluded",,,,,,,USD,0.00,',
        // 0.00 + 140.60 + 145.00 + 60.00 = 345.60
        'Grand total,,"Skerry Lantern, Demo repair yard, Port Averly, dry dock 2, planned 2027-03-08",,,,,,,USD,345.60,',
      ]);
    } finally {
      await page.close();
    }
  }, 120_000);
});
