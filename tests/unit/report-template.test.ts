// The report template: a fictional demo report is laid out, rendered to PDF and
// read back as text; and the summary counts against totals worked by hand.
import { mkdir, writeFile } from "node:fs/promises";
import path from "node:path";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import sharp from "sharp";
import { ReportView } from "@/components/report/report-view";
import { beforeAll, describe, expect, it } from "vitest";
import { rateCoatingArea, rateTank } from "@/lib/calc/coating";
import { astmD610Grade } from "@/lib/calc/rust-grade";
import { imoCheckDigit } from "@/lib/imo";
import { repairQuantities } from "@/lib/inspection/quantities";
import { assembleReport, DRAFT_MARK } from "@/lib/report/assemble";
import { photoPages } from "@/lib/report/photo-pages";
import { renderReportPdf } from "@/lib/report/render";
import { summarizeReport } from "@/lib/report/summary";
import type { TReportSource, TReportSourceFinding } from "@/lib/report/types";
import { judgeReading, ruleSet } from "@/lib/safety/atmosphere";
import type { TRepair } from "@/lib/schemas/inspection";
import { pdfText } from "../fixtures/pdf";

const ARTIFACTS = path.join(import.meta.dirname, "..", "artifacts");
const IMO = "035791" + imoCheckDigit("035791");

function finding(number: number, f: Partial<TReportSourceFinding> & Pick<TReportSourceFinding, "type" | "frameFrom" | "frameTo" | "memberKind" | "description">, repair: TRepair): TReportSourceFinding {
  const q = repairQuantities(repair);
  return {
    id: `00000000-0000-4000-8000-00000000000${number}`, number, platingRegion: null, memberNumber: null, positionDetail: null,
    lengthMm: null, widthMm: null, depthMm: null, pitDepthMm: null, affectedLengthMm: null, asBuiltThicknessMm: null, measuredThicknessMm: null,
    repairKind: repair.kind, repair, steelWeightKg: q.steelWeightKg, coatingRepairM2: q.coatingRepairM2, ...f,
  };
}

const coatingArea = (area: TReportSource["coating"][number]["area"], breakdownPct: number, rustedPct: number, hardScalePct: number, edgesRustedPct: number | null = null) => {
  const input = { breakdownPct, rustedPct, hardScalePct, edgesRustedPct };
  return { area, ...input, location: null, rating: rateCoatingArea(input, "table"), rustGrade: astmD610Grade(rustedPct) };
};

/** A fictional company, ship and inspection. */
async function demoSource(status: TReportSource["inspection"]["status"]): Promise<TReportSource> {
  const jpeg = await sharp({ create: { width: 320, height: 240, channels: 3, background: { r: 140, g: 96, b: 70 } } }).jpeg().toBuffer();
  const png = await sharp({ create: { width: 300, height: 90, channels: 4, background: { r: 0, g: 0, b: 0, alpha: 0 } } }).png().toBuffer();
  const findings = [
    finding(1, { type: "crack", frameFrom: 112, frameTo: 113, memberKind: "bracket", platingRegion: "inner_bottom", lengthMm: 180, description: "Crack at the toe of the bracket to longitudinal 5, running into the inner bottom plating." },
      { kind: "bracket_renewal", shape: "rectangular", lengthMm: 500, widthMm: 400, thicknessMm: 12, pieces: 1 }),
    finding(2, { type: "pitting", frameFrom: 118, frameTo: 121, memberKind: "plating", platingRegion: "bottom_shell", lengthMm: 1200, widthMm: 800, pitDepthMm: 4, description: "Pitting of the bottom shell between longitudinals 3 and 4, pits up to 4 mm deep." },
      { kind: "insert_plate", lengthMm: 1200, widthMm: 800, thicknessMm: 14, pieces: 1 }),
    finding(3, { type: "general_corrosion", frameFrom: 125, frameTo: 127, memberKind: "longitudinal", memberNumber: 7, platingRegion: "inner_bottom", lengthMm: 2400, widthMm: 300, description: "General corrosion of the web of longitudinal 7 along its whole span." },
      { kind: "profile_renewal", lengthMm: 2400, kgPerM: 25.4, pieces: 1 }),
    finding(4, { type: "dent", frameFrom: 130, frameTo: 130, memberKind: "web_frame", lengthMm: 400, widthMm: 250, depthMm: 18, description: "Dent in the web frame near the lightening hole, no crack." },
      { kind: "fairing", lengthMm: 400, widthMm: 250 }),
  ];
  const coating = [coatingArea("shell_plating", 2, 1, 0), coatingArea("edges_welds", 25, 12, 0, 55), coatingArea("inner_bottom_deck_plating", 8, 5, 2)];
  const tank = rateTank(coating)!;
  const set = ruleSet("msc581");
  const reading = { oxygenPct: 20.9, flammableLflPct: 0, h2sPpm: 0, coPpm: 1, co2Pct: 0.04 };
  const photo = (id: string, kind: "overview" | "close_up", frames: [number, number], extra: Partial<TReportSource["photos"][number]>) => ({
    id, kind, frameFrom: frames[0], frameTo: frames[1], platingRegion: null, memberKind: "plating" as const, memberNumber: null, findingId: null, overviewPhotoId: null,
    caption: "Looking forward from the manhole.", width: 320, height: 240, src: `/photos/${id}.jpg`, jpeg, ...extra,
  });
  return {
    company: "Aldercombe Ship Management",
    generatedAt: new Date("2026-03-15T08:00:00Z"),
    inspection: {
      id: "11111111-1111-4111-8111-111111111111", status, revision: 2, inspectedOn: "2026-03-14", placeKind: "port", place: "Port Quillan", team: ["Ama Okafor", "Tomas Reyes"],
      noFindings: false, noSediment: false, allAreasInspected: false,
      remarks: {
        type: "doc",
        content: [
          { type: "heading", attrs: { level: 2 }, content: [{ type: "text", text: "Access and lighting" }] },
          { type: "paragraph", content: [{ type: "text", text: "Lighting was " }, { type: "text", text: "adequate", marks: [{ type: "bold" }] }, { type: "text", text: " except aft of " }, { type: "text", text: "Fr. 110", marks: [{ type: "italic" }] }, { type: "text", text: "." }] },
          { type: "bulletList", content: [{ type: "listItem", content: [{ type: "paragraph", content: [{ type: "text", text: "Ladder rungs sound" }] }] }, { type: "listItem", content: [{ type: "paragraph", content: [{ type: "text", text: "Bell mouth strainer clear" }] }] }] },
          { type: "orderedList", attrs: { start: 1 }, content: [{ type: "listItem", content: [{ type: "paragraph", content: [{ type: "text", text: "Renew anodes at next docking" }] }] }] },
        ],
      },
    },
    vessel: { name: "Corran Tide", imoNumber: IMO, utcOffsetMinutes: 60, frameFirst: 0, frameLast: 240, midshipFromFrame: 80, midshipToFrame: 170, engineRoomFwdBulkheadFrame: 45, collisionBulkheadFrame: 225 },
    tank: { code: "3P", name: "No. 3 WBT Port", kind: "double_bottom_hopper", side: "port", frameFrom: 108, frameTo: 136, bottomAreaM2: 210 },
    landmarks: [{ frame: 116, label: "Fr. 116" }, { frame: 124, label: "Fr. 124" }],
    entry: { permitRef: "ESP-2026-031", standbyPerson: "Lino Baptiste (AB)", ventilation: "Two fans, 4 h", rescueEquipmentReady: true, communicationsTested: true },
    ruleSet: { name: set.name, source: set.source, limits: set.limits.map((l) => ({ label: l.label, limitText: l.limitText })) },
    readings: [{ ...reading, testedAt: "2026-03-14T07:40:00Z", measuredBy: "Ama Okafor", instrument: "4-gas meter", verdict: judgeReading(reading, set) }],
    findings,
    coating,
    tankRating: { rating: tank.rating, worstArea: tank.worst.area, decidedBy: tank.worst.rating.decidedBy },
    twentyPercentRule: "table",
    anodes: { anodeKind: "aluminium", installedCount: 24, inspectedCount: 20, meanWastagePct: 38, minWastagePct: 20, maxWastagePct: 65, toRenewCount: 4, appearUnused: false, note: null },
    anodeProjection: { date: "2027-09-30", ratePctPerYear: 7.5 },
    anodeThresholdPct: 50,
    anodeWarning: null,
    sediment: { zones: [{ label: "Aft bay", frameFrom: 108, frameTo: 112, depthMm: 50, areaM2: 12, volumeM3: 0.6 }], rate: { amount: 180, currency: "EUR", place: "Port Quillan" } },
    notInspected: [{ frameFrom: 132, frameTo: 136, platingRegion: "lower_hopper", memberKind: null, memberNumber: null, reason: "no_staging", suspected: "coating breakdown on the hopper" }],
    photos: [
      photo("p1", "overview", [110, 122], {}),
      photo("p2", "close_up", [112, 113], { memberKind: "bracket", platingRegion: "inner_bottom", findingId: findings[0]!.id, overviewPhotoId: "p1", caption: "Crack at the bracket toe." }),
      photo("p3", "close_up", [118, 121], { platingRegion: "bottom_shell", findingId: findings[1]!.id, overviewPhotoId: "p1", caption: "Pitting, pit gauge 4 mm." }),
      photo("p4", "overview", [124, 132], { caption: "Web frames aft of the hopper." }),
      photo("p5", "close_up", [125, 127], { memberKind: "longitudinal", memberNumber: 7, platingRegion: "inner_bottom", findingId: findings[2]!.id, overviewPhotoId: "p4", caption: "Longitudinal 7 web." }),
    ],
    signatures: [
      { kind: "officer", signerName: "Ama Okafor", signerRank: "Chief Officer", typedSignature: "A. Okafor", signedAt: "2026-03-14T09:30:00Z", drawnPng: null },
      ...(status === "countersigned" ? [{ kind: "master" as const, signerName: "Idris Vale", signerRank: "Master", typedSignature: null, signedAt: "2026-03-14T11:05:00Z", drawnPng: png }] : []),
    ],
    blockers: [],
  };
}

describe("report template", () => {
  let draft: string;
  let signed: string;
  beforeAll(async () => {
    const [a, b] = await Promise.all([renderReportPdf(assembleReport(await demoSource("submitted"))), renderReportPdf(assembleReport(await demoSource("countersigned")))]);
    expect(a.subarray(0, 4).toString("latin1")).toBe("%PDF");
    [draft, signed] = await Promise.all([pdfText(new Uint8Array(a)), pdfText(new Uint8Array(b))]);
    // To look at (ignored by git): pdftoppm -png -r 60 tests/artifacts/report-draft.pdf /tmp/report
    await mkdir(ARTIFACTS, { recursive: true });
    await Promise.all([writeFile(path.join(ARTIFACTS, "report-draft.pdf"), a), writeFile(path.join(ARTIFACTS, "report-countersigned.pdf"), b)]);
  }, 60_000);

  it("has the vessel, IMO number, tank, date, company and revision on the cover", () => {
    for (const text of ["Corran Tide", IMO, "3P — No. 3 WBT Port", "2026-03-14", "Aldercombe Ship Management", "Port Quillan", "Ama Okafor, Tomas Reyes", "Revision 2"]) expect(draft).toContain(text);
  });

  it("lists each finding at its frames with its steel weight", () => {
    for (const frames of ["Fr. 112–113", "Fr. 118–121", "Fr. 125–127", "Fr. 130"]) expect(draft).toContain(frames);
    // Steel density 7 850 kg/m³ (EN 1993-1-1 §3.2.6): 0.5 × 0.4 × 0.012 × 7850 = 18.84 kg; 1.2 × 0.8 × 0.014 × 7850 = 105.504 kg;
    // 2.4 m × 25.4 kg/m = 60.96 kg; total 185.304 kg (shown to 0.1 kg below 100 kg, whole kilograms above).
    for (const weight of ["18.8 kg", "106 kg", "61 kg", "185 kg"]) expect(draft).toContain(weight);
    expect(draft).toContain("Insert plate 1200 × 800 × 14 mm, 1 pc");
  });

  it("shows coating percentages with the rating and the rule that decided", () => {
    for (const text of ["25 %", "12 %", "55 %", "POOR", "FAIR", "GOOD", "edges and welds rusted 55 % is more than 50 %"]) expect(draft).toContain(text);
  });

  it("has the entry record, anodes, sediment, areas not inspected and the remarks", () => {
    for (const text of ["ESP-2026-031", "Lino Baptiste (AB)", "H2S below 2.5 ppm", "2026-03-14 08:40 (UTC+01:00)", "IMO MSC.581(110)", "Within limits", "4 of 20 inspected", "0.6 m³", "108 EUR", "No staging", "Access and lighting", "adequate", "Ladder rungs sound", "1. Renew anodes"]) {
      expect(draft).toContain(text);
    }
  });

  it("captions each photo with frames, member and finding number", () => {
    expect(draft).toContain("Photo 1 · Overview · Fr. 110–122 · Plating");
    expect(draft).toContain("Photo 2 · Close-up · Fr. 112–113 · Bracket, inner bottom · Finding 1");
    expect(draft).toContain("Photo 5 · Close-up · Fr. 125–127 · Longitudinal 7, inner bottom · Finding 3");
    expect(draft).toContain("Crack at the bracket toe.");
  });

  it("numbers every page and signs with name, rank and UTC time", () => {
    expect(draft).toMatch(/Page 1 of (\d+)/);
    const total = Number(/Page 1 of (\d+)/.exec(draft)![1]);
    expect(draft).toContain(`Page ${total} of ${total}`);
    expect(draft).toContain("Chief Officer");
    expect(draft).toContain("2026-03-14 09:30 UTC");
    expect(draft).toContain("A. Okafor");
    expect(signed).toContain("Idris Vale");
    expect(signed).toContain("2026-03-14 11:05 UTC");
  });

  it("carries the draft mark until the master countersigns", () => {
    expect(draft).toContain(DRAFT_MARK);
    expect(signed).not.toContain("DRAFT");
    expect(signed).toContain("Countersigned");
  });
});

describe("HTML preview", () => {
  it("shows the same content as the PDF, with the draft mark and print rules", async () => {
    const data = assembleReport(await demoSource("submitted"));
    const html = renderToStaticMarkup(createElement(ReportView, { data }));
    await mkdir(ARTIFACTS, { recursive: true });
    await writeFile(path.join(ARTIFACTS, "report-preview.html"), `<!doctype html><meta charset="utf-8">${html}`);
    for (const text of ["Corran Tide", "3P — No. 3 WBT Port", "Fr. 118–121", "106 kg", "55 %", "Photo 2 · Close-up · Fr. 112–113 · Bracket, inner bottom · Finding 1", DRAFT_MARK, "size: A4", "break-before: page"]) {
      expect(html).toContain(text);
    }
    expect(html).toContain('src="/photos/p2.jpg"');
    const signed = renderToStaticMarkup(createElement(ReportView, { data: assembleReport(await demoSource("countersigned")) }));
    expect(signed).not.toContain("DRAFT");
  });
});

describe("report summary", () => {
  it("adds steel, coating repair, anodes, sediment and areas not inspected", () => {
    const f = (type: TReportSourceFinding["type"], repair: TRepair) => ({ type, ...repairQuantities(repair) });
    const summary = summarizeReport({
      findings: [
        f("pitting", { kind: "insert_plate", lengthMm: 1200, widthMm: 800, thicknessMm: 14, pieces: 1 }),
        f("general_corrosion", { kind: "profile_renewal", lengthMm: 2400, kgPerM: 25.4, pieces: 2 }),
        f("crack", { kind: "bracket_renewal", shape: "rectangular", lengthMm: 500, widthMm: 400, thicknessMm: 12, pieces: 3 }),
        f("general_corrosion", { kind: "coating_touch_up", areaM2: 3.5 }),
      ],
      anodes: { toRenewCount: 4 },
      sediment: { zones: [{ depthMm: 50, areaM2: 12 }, { depthMm: 120, areaM2: 4.5 }], rate: { amount: 180, currency: "EUR" } },
      notInspected: [{}, {}],
    });
    // Steel density 7 850 kg/m³ (EN 1993-1-1 §3.2.6), worked by hand:
    //   insert 1.2 × 0.8 × 0.014 × 7850 = 105.504 kg; profile 2 × 2.4 m × 25.4 kg/m = 121.92 kg;
    //   brackets 3 × 0.5 × 0.4 × 0.012 × 7850 = 56.52 kg; total 283.944 kg.
    expect(summary.steelKg).toBeCloseTo(283.944, 6);
    // Coating repair: the insert's 1.2 × 0.8 = 0.96 m² plus the touch-up's 3.5 m² (common practice).
    expect(summary.coatingRepairM2).toBeCloseTo(4.46, 9);
    // Sediment volume = depth × area (common practice): 0.05 × 12 + 0.12 × 4.5 = 1.14 m³; at 180 EUR/m³ = 205.20 EUR.
    expect(summary.sedimentM3).toBeCloseTo(1.14, 9);
    expect(summary.sedimentCost).toEqual({ amount: 205.2, currency: "EUR" });
    expect(summary.anodesToRenew).toBe(4);
    expect(summary.notInspected).toBe(2);
    expect(summary.findings).toBe(4);
    expect(summary.findingsByType).toEqual([
      { type: "crack", label: "Crack", count: 1 },
      { type: "general_corrosion", label: "General corrosion", count: 2 },
      { type: "pitting", label: "Pitting", count: 1 },
    ]);
  });

  it("says anodes were not recorded instead of counting none", () => {
    expect(summarizeReport({ findings: [], anodes: null, sediment: { zones: [], rate: null }, notInspected: [] })).toMatchObject({ anodesToRenew: null, steelKg: 0, sedimentM3: 0, sedimentCost: null });
  });
});

describe("photo pages", () => {
  const p = (id: string, kind: "overview" | "close_up", overviewPhotoId: string | null = null) => ({ id, kind, overviewPhotoId });
  it("keeps an overview with its close-ups and puts at most four photos on a page", () => {
    const photos = [p("a", "overview"), p("a1", "close_up", "a"), p("a2", "close_up", "a"), p("b", "overview"), p("b1", "close_up", "b"), p("b2", "close_up", "b")];
    expect(photoPages(photos)).toEqual([[0, 1, 2], [3, 4, 5]]);
  });
  it("fills a page rather than leave one photo alone on it, order kept", () => {
    const photos = [p("a", "overview"), p("b", "overview"), p("b1", "close_up", "b"), p("b2", "close_up", "b"), p("b3", "close_up", "b"), p("b4", "close_up", "b")];
    expect(photoPages(photos)).toEqual([[0, 1, 2, 3], [4, 5]]);
  });
});
