// The tank history as a PDF, for the tank of tests/fixtures/history.ts: three
// countersigned inspections (2024-03-01, 2025-03-01, 2026-03-01; the last with
// its signed PDF stored) and a submitted one (2026-06-01). The plots are read
// back from the PDF's text: tick values in drawing order, dates placed in
// proportion to the days between them, labels with their units.
import { createHash } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { buildTankHistory } from "../fixtures/history";
import { signIn } from "../fixtures/http";
import { pdfItems, type TPdfItem } from "../fixtures/pdf-items";
import { pdfText } from "../fixtures/pdf";
import { buildScenario, PASSWORD, type TScenario } from "../fixtures/scenario";
import { storeSignedReport } from "../fixtures/signed-report";

const SIGNED_PDF = Buffer.from("%PDF-1.4\n% a stand-in for the signed report of 2026-03-01\n%%EOF\n");
let s: TScenario;
let tankId = "";
let res: Response;
let bytes: Uint8Array;
let items: TPdfItem[];
let text: string;

beforeAll(async () => {
  s = await buildScenario();
  const built = await buildTankHistory(s);
  tankId = built.tank.id;
  await storeSignedReport({ orgId: s.org.id, vesselId: s.ownVessel.id, inspectionId: built.countersignedIds[2]!, pdf: SIGNED_PDF, label: "history" });
  const superintendent = await signIn(s.users.superintendent.email, PASSWORD);
  res = await superintendent.request(`/api/v1/vessels/${s.ownVessel.id}/tanks/${tankId}/history.pdf`);
  bytes = new Uint8Array(await res.arrayBuffer());
  // pdfjs takes over the buffer it is given: each reader gets its own copy.
  items = await pdfItems(bytes.slice());
  text = await pdfText(bytes.slice());
});

/** The pieces drawn after a plot's heading, up to the next heading. */
function plotItems(heading: string, next: string) {
  const from = items.findIndex((i) => i.str === heading);
  const to = items.findIndex((i, n) => n > from && i.str === next);
  expect(from).toBeGreaterThanOrEqual(0);
  expect(to).toBeGreaterThan(from);
  return items.slice(from + 1, to);
}
const centreOf = (piece: TPdfItem[], str: string) => piece.find((i) => i.str === str)!.centreX;
/** The pieces on the same line as the first piece that reads `str`, left to right. */
function rowOf(str: string) {
  const first = items.find((i) => i.str === str)!;
  return items.filter((i) => i.page === first.page && Math.abs(i.y - first.y) < 1).sort((a, b) => a.centreX - b.centreX).map((i) => i.str);
}
const squash = (t: string) => t.replace(/\s+/g, "");
/** The row of a plot's data table that starts with `first`: the last piece reading it (the axis and legend come before the table), and the pieces on its line. */
function tableRow(piece: TPdfItem[], first: string) {
  const at = piece.filter((i) => i.str === first).at(-1)!;
  expect(at).toBeDefined();
  return piece.filter((i) => i.page === at.page && Math.abs(i.y - at.y) < 1).sort((a, b) => a.centreX - b.centreX).map((i) => i.str);
}

describe("tank history PDF", () => {
  it("is a PDF download named after the vessel and tank", () => {
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="history-Own-vessel-${s.run}-HT-1.pdf"`);
    expect(Buffer.from(bytes.slice(0, 5)).toString()).toBe("%PDF-");
  });

  it("lists every inspection newest first, with the signed PDF's fingerprint where one was stored", () => {
    const dates = ["2026-06-01", "2026-03-01", "2025-03-01", "2024-03-01"];
    const at = dates.map((d) => text.indexOf(d));
    expect(at.every((i) => i >= 0)).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
    expect(rowOf("2026-06-01")).toEqual(["2026-06-01", "1", "Submitted (not plotted)", "—", "None rendered"]);
    // Ratings as tests/integration/history.test.ts works them (IMO MSC.1/Circ.1330 Table 1): POOR, FAIR, FAIR.
    expect(rowOf("2026-03-01")).toEqual(["2026-03-01", "1", "Countersigned", "POOR", "Signed PDF"]);
    expect(rowOf("2024-03-01")).toEqual(["2024-03-01", "1", "Countersigned", "FAIR", "None rendered"]);
    expect(text).toContain(createHash("sha256").update(SIGNED_PDF).digest("hex"));
  });

  it("draws the coating plot with round ticks of 5 up to 25 % and the dates in proportion", () => {
    const plot = plotItems("Coating breakdown per area", "Mean anode wastage");
    // Largest value 25 % (shell plating, 2026-03-01): 25 / 5 ticks → steps of 5.
    expect(plot.slice(0, 9).map((i) => i.str)).toEqual(["0", "5", "10", "15", "20", "25", "2024-03-01", "2025-03-01", "2026-03-01"]);
    const ticks = plot.slice(0, 6).map((i) => i.y);
    for (let k = 1; k < ticks.length; k++) expect(ticks[k]! - ticks[k - 1]!).toBeCloseTo(ticks[1]! - ticks[0]!, 1);
    expect(plot.map((i) => i.str)).toEqual(expect.arrayContaining(["Breakdown (%)", "Inspection date", "Shell plating", "Stringers"]));
    // 2024-03-01 → 2025-03-01 → 2026-03-01: 365 and 365 days, so the middle date sits half-way.
    const [a, b, c] = ["2024-03-01", "2025-03-01", "2026-03-01"].map((d) => centreOf(plot, d));
    expect((b! - a!) / (c! - a!)).toBeCloseTo(0.5, 2);
  });

  it("draws the anode plot with the 60 % threshold and the projected date 2028-02-29 on the date axis", () => {
    const plot = plotItems("Mean anode wastage", "Sediment volume");
    // Threshold 60 % is the largest value: 60 / 5 = 12 → steps of 20.
    expect(plot.slice(0, 8).map((i) => i.str)).toEqual(["0", "20", "40", "60", "2024-03-01", "2025-03-01", "2026-03-01", "2028-02-29"]);
    expect(plot.map((i) => i.str)).toEqual(expect.arrayContaining(["Mean wastage (%)", "Renewal threshold 60 %", "projected 2028-02-29"]));
    // Days from 2024-03-01: 365, 730, 1460 (2028-02-29; 2028 is a leap year) → 1/4, 1/2 of the axis.
    const [a, b, c, d] = ["2024-03-01", "2025-03-01", "2026-03-01", "2028-02-29"].map((x) => centreOf(plot, x));
    expect((b! - a!) / (d! - a!)).toBeCloseTo(0.25, 2);
    expect((c! - a!) / (d! - a!)).toBeCloseTo(0.5, 2);
    // The threshold's label sits on the top tick (60), above the 40 tick.
    const y = (str: string) => plot.find((i) => i.str === str)!.y;
    expect(y("Renewal threshold 60 %")).toBeGreaterThan(y("40"));
    expect(squash(text)).toContain(squash("reaches the company's renewal threshold of 60 % on 2028-02-29"));
  });

  it("draws the sediment plot in m³ with ticks 0 to 4 (largest 1 + 2.5 = 3.5 m³)", () => {
    const plot = plotItems("Sediment volume", "Findings found again");
    expect(plot.slice(0, 5).map((i) => i.str)).toEqual(["0", "1", "2", "3", "4"]);
    expect(plot.map((i) => i.str)).toContain("Sediment (m³)");
  });

  it("prints the coating data table under its plot: every area × inspection date, so that the seven areas at 1 % can be read", () => {
    const plot = plotItems("Coating breakdown per area", "Mean anode wastage");
    expect(tableRow(plot, "Area")).toEqual(["Area", "2024-03-01", "2025-03-01", "2026-03-01"]);
    // Shell plating: 4, 10 and 25 % as tests/fixtures/history.ts sets them, with one decimal.
    expect(tableRow(plot, "Shell plating")).toEqual(["Shell plating", "4.0 %", "10.0 %", "25.0 %"]);
    // The other seven areas keep db/seed/complete-inspection.ts's 1 % at every inspection.
    for (const area of ["Bulkhead plating", "Inner bottom / deck plating", "Stringers", "Girders and web frames", "Longitudinals and brackets", "Edges and welds", "Piping and fittings"]) {
      expect(tableRow(plot, area)).toEqual([area, "1.0 %", "1.0 %", "1.0 %"]);
    }
    // The submitted inspection of 2026-06-01 (90 %) is not plotted, so it has no column.
    expect(plot.map((i) => i.str)).not.toContain("90.0 %");
  });

  it("prints the anode data table: mean wastage and anodes to renew per date", () => {
    const plot = plotItems("Mean anode wastage", "Sediment volume");
    expect(tableRow(plot, "Date")).toEqual(["Date", "Mean wastage", "Anodes to renew"]);
    // Mean wastage 20, 30, 40 % (tests/fixtures/history.ts); 1 anode to renew each time (the seed's toRenewCount, left as it is).
    expect(tableRow(plot, "2024-03-01")).toEqual(["2024-03-01", "20.0 %", "1"]);
    expect(tableRow(plot, "2025-03-01")).toEqual(["2025-03-01", "30.0 %", "1"]);
    expect(tableRow(plot, "2026-03-01")).toEqual(["2026-03-01", "40.0 %", "1"]);
  });

  it("prints the sediment data table: volume (two decimals) and zones per date", () => {
    const plot = plotItems("Sediment volume", "Findings found again");
    expect(tableRow(plot, "Date")).toEqual(["Date", "Volume", "Zones"]);
    // Zones of 1 m³, 2 m³, then 1 + 2.5 = 3.5 m³ in two zones (tests/fixtures/history.ts).
    expect(tableRow(plot, "2024-03-01")).toEqual(["2024-03-01", "1.00 m³", "1"]);
    expect(tableRow(plot, "2025-03-01")).toEqual(["2025-03-01", "2.00 m³", "1"]);
    expect(tableRow(plot, "2026-03-01")).toEqual(["2026-03-01", "3.50 m³", "2"]);
  });

  it("lists the recurring findings (as tests/integration/history.test.ts marks them)", () => {
    for (const before of ["No. 1 on 2025-03-01", "No. 1 on 2024-03-01", "No. 2 on 2024-03-01"]) expect(text).toContain(before);
  });

  it("is not found for another company's tank, and for the other company's reader of our tank", async () => {
    const superintendent = await signIn(s.users.superintendent.email, PASSWORD);
    const other = s.otherVessel;
    expect((await superintendent.request(`/api/v1/vessels/${other.id}/tanks/${s.tankOf(other.id).id}/history.pdf`)).status).toBe(404);
    const otherAdmin = await signIn(s.otherAdmin.email, PASSWORD);
    expect((await otherAdmin.request(`/api/v1/vessels/${s.ownVessel.id}/tanks/${tankId}/history.pdf`)).status).toBe(404);
  });
});
