// Benchmarks the report PDF (templates/report.tsx through React-PDF) on a large
// report made here: 80 findings, 60 photos of 12 megapixels put through the
// product's makeVariants, long remarks. Prints, in one run: the product's
// render time (median of 5), peak memory and PDF size; a lower bound that only
// embeds the same report JPEGs one a page with pdf-lib; and Debian's Chromium
// (playwright-core) printing the HTML preview of the same report to PDF.
// Asserts nothing; prints the budgets and whether each is met.
//
//   npm run bench:pdf        (NODE_ENV=production, as the app runs)
//
// The photos are made and downscaled in a child process (files under
// os.tmpdir(), removed at the end), so their memory does not count here.
import { fork } from "node:child_process";
import { mkdir, mkdtemp, readFile, readdir, rm, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { fileURLToPath, pathToFileURL } from "node:url";
import { renderToBuffer, type DocumentProps } from "@react-pdf/renderer";
import { PDFDocument } from "pdf-lib";
import { chromium } from "playwright-core";
import { createElement, type ReactElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import sharp from "sharp";
import { ReportView } from "@/components/report/report-view";
import { rateCoatingArea, rateTank } from "@/lib/calc/coating";
import { astmD610Grade } from "@/lib/calc/rust-grade";
import { repairQuantities } from "@/lib/inspection/quantities";
import { makeVariants } from "@/lib/photos/image";
import { assembleReport } from "@/lib/report/assemble";
import type { TReportData, TReportSource, TReportSourceFinding, TRichNode } from "@/lib/report/types";
import { judgeReading, ruleSet } from "@/lib/safety/atmosphere";
import type { TRepair } from "@/lib/schemas/inspection";
import { MB } from "@/lib/uploads/limits";
import { COATING_AREAS, FINDING_TYPES, type TFindingType, type TMemberKind, type TPlatingRegion } from "@/lib/vocabulary";
import { registerPdfFonts } from "@/templates/fonts";
import { ReportDocument } from "@/templates/report";
import { prng } from "./prng";

const FINDINGS = 80;
const PHOTOS = 60;
const WIDTH = 4000;
const HEIGHT = 3000;
const PRODUCT_RUNS = 5;
const OTHER_RUNS = 3;
const BUDGET_PDF_BYTES = 8 * MB;
const BUDGET_MEDIAN_MS = 5000;
const CHROMIUM_ARGS = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];

// ---- Photos (child process) --------------------------------------------------


/** A 12-megapixel JPEG with colour, structure and grain, like a tank photo; then its report variant. */
async function makeReportVariant(index: number, grain: Buffer): Promise<Buffer> {
  const rand = prng(0x51ed + index * 7919);
  const w = 48, h = 36;
  const field = Buffer.alloc(w * h * 3);
  const base = [70 + rand() * 80, 60 + rand() * 60, 50 + rand() * 50];
  for (let i = 0; i < w * h; i++) {
    const rust = rand() < 0.15 ? 1 : 0;
    const jitter = (rand() - 0.5) * 50;
    field[i * 3] = Math.max(0, Math.min(255, base[0]! + jitter + rust * 60));
    field[i * 3 + 1] = Math.max(0, Math.min(255, base[1]! + jitter + rust * 15));
    field[i * 3 + 2] = Math.max(0, Math.min(255, base[2]! + jitter - rust * 20));
  }
  const stiffeners = Array.from({ length: 3 + Math.floor(rand() * 4) }, (_, i) => `<rect x="${Math.round((i + 0.3 + rand() * 0.4) * 800)}" y="0" width="${Math.round(60 + rand() * 120)}" height="${HEIGHT}" fill="#2b2b2b" fill-opacity="0.55"/>`).join("");
  const original = await sharp(field, { raw: { width: w, height: h, channels: 3 } })
    .resize(WIDTH, HEIGHT, { kernel: "cubic", fit: "fill" })
    .composite([
      { input: Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${HEIGHT}">${stiffeners}</svg>`) },
      { input: grain, raw: { width: WIDTH, height: HEIGHT, channels: 3 }, blend: "soft-light" },
    ])
    .jpeg({ quality: 90 })
    .toBuffer();
  return (await makeVariants(original)).report.data;
}

async function generateInto(dir: string): Promise<void> {
  const grain = await sharp({ create: { width: WIDTH, height: HEIGHT, channels: 3, background: { r: 128, g: 128, b: 128 }, noise: { type: "gaussian", mean: 128, sigma: 28 } } }).raw().toBuffer();
  let next = 0;
  await Promise.all(Array.from({ length: Math.max(1, Math.min(os.availableParallelism(), 2)) }, async () => {
    while (next < PHOTOS) {
      const i = next++;
      await writeFile(path.join(dir, `photo-${String(i).padStart(3, "0")}.jpg`), await makeReportVariant(i, grain));
    }
  }));
}

async function makePhotos(dir: string): Promise<{ file: string; jpeg: Buffer; width: number; height: number }[]> {
  const child = fork(fileURLToPath(import.meta.url), ["--generate-into", dir], { stdio: "inherit" });
  const code = await new Promise<number | null>((resolve, reject) => {
    child.once("error", reject);
    child.once("exit", resolve);
  });
  if (code !== 0) throw new Error(`making the photos failed (child exit code ${code})`);
  return readPhotos(dir);
}

async function readPhotos(dir: string): Promise<{ file: string; jpeg: Buffer; width: number; height: number }[]> {
  const files = (await readdir(dir)).filter((f) => f.endsWith(".jpg")).sort();
  return Promise.all(files.map(async (f) => {
    const jpeg = await readFile(path.join(dir, f));
    const meta = await sharp(jpeg).metadata();
    return { file: path.join(dir, f), jpeg, width: meta.width!, height: meta.height! };
  }));
}

// ---- The large report --------------------------------------------------------

const MEMBERS: { memberKind: TMemberKind; platingRegion: TPlatingRegion | null; memberNumber: number | null }[] = [
  { memberKind: "plating", platingRegion: "inner_bottom", memberNumber: null },
  { memberKind: "longitudinal", platingRegion: "bottom_shell", memberNumber: 4 },
  { memberKind: "bracket", platingRegion: "lower_hopper", memberNumber: null },
  { memberKind: "web_frame", platingRegion: null, memberNumber: null },
  { memberKind: "bottom_girder", platingRegion: null, memberNumber: 2 },
];

function repairFor(i: number): TRepair {
  switch (i % 5) {
    case 0: return { kind: "insert_plate", lengthMm: 600 + (i % 7) * 100, widthMm: 400 + (i % 3) * 100, thicknessMm: 12 + (i % 3), pieces: 1 + (i % 2) };
    case 1: return { kind: "bracket_renewal", shape: "triangular", sideAMm: 500, sideBMm: 500, sideCMm: 707, thicknessMm: 11, pieces: 1 };
    case 2: return { kind: "profile_renewal", lengthMm: 1800 + (i % 4) * 300, kgPerM: 21.4, pieces: 1 };
    case 3: return { kind: "coating_touch_up", areaM2: 1.5 + (i % 4) };
    default: return { kind: "monitor_only" };
  }
}

function paragraph(i: number): TRichNode {
  return {
    type: "paragraph",
    content: [
      { type: "text", text: `Between Fr. ${100 + (i % 40)} and Fr. ${104 + (i % 40)} the inner bottom was seen from the staging erected for the purpose; ` },
      { type: "text", text: "coating breakdown concentrated on edges and welds", marks: [{ type: "bold" }] },
      { type: "text", text: ", scale loose and easily removed by hand, pitting shallow and scattered. " },
      { type: "text", text: "To be checked again at the next inspection.", marks: [{ type: "italic" }] },
    ],
  };
}

function longRemarks(): { type: "doc"; content: TRichNode[] } {
  const content: TRichNode[] = [];
  for (let s = 0; s < 12; s++) {
    content.push({ type: "heading", attrs: { level: 2 }, content: [{ type: "text", text: `Bay ${s + 1}: Fr. ${100 + s * 4} to Fr. ${104 + s * 4}` }] });
    for (let p = 0; p < 4; p++) content.push(paragraph(s * 4 + p));
    content.push({ type: "bulletList", content: [0, 1, 2].map((k) => ({ type: "listItem", content: [{ type: "paragraph", content: [{ type: "text", text: `Item ${k + 1} of bay ${s + 1}: bell mouth, manhole and ladder checked, fastenings sound.` }] }] })) });
  }
  return { type: "doc", content };
}

function largeSource(photos: { file: string; jpeg: Buffer; width: number; height: number }[]): TReportSource {
  const findings: TReportSourceFinding[] = Array.from({ length: FINDINGS }, (_, i) => {
    const repair = repairFor(i);
    const q = repairQuantities(repair);
    const from = 100 + Math.floor((i * 48) / FINDINGS);
    return {
      id: `00000000-0000-4000-8000-${String(i).padStart(12, "0")}`, number: i + 1, type: FINDING_TYPES[i % 10] as TFindingType, frameFrom: from, frameTo: from + (i % 3),
      ...MEMBERS[i % MEMBERS.length]!, positionDetail: i % 4 === 0 ? "300 mm from the centre girder" : null,
      lengthMm: 200 + i * 10, widthMm: 150 + (i % 5) * 50, depthMm: i % 10 === 1 ? 15 : null, pitDepthMm: i % 10 === 4 ? 3.5 : null, affectedLengthMm: null,
      asBuiltThicknessMm: i % 10 === 6 ? 14 : null, measuredThicknessMm: i % 10 === 6 ? 11.2 : null,
      description: `Finding ${i + 1}: defect located and measured, extent marked with paint for the yard; see the close-up photographs.`,
      repairKind: repair.kind, repair, steelWeightKg: q.steelWeightKg, coatingRepairM2: q.coatingRepairM2,
    };
  });
  const coating = COATING_AREAS.map((area, i) => {
    const input = { breakdownPct: [2, 8, 15, 25, 4, 12, 30, 6][i]!, rustedPct: [1, 5, 10, 18, 2, 9, 22, 3][i]!, hardScalePct: [0, 2, 5, 12, 0, 3, 15, 0][i]!, edgesRustedPct: i === 6 ? 60 : null };
    return { area, ...input, location: null, rating: rateCoatingArea(input, "table"), rustGrade: astmD610Grade(input.rustedPct) };
  });
  const tank = rateTank(coating)!;
  const set = ruleSet("msc581");
  const reading = { oxygenPct: 20.9, flammableLflPct: 0, h2sPpm: 0, coPpm: 2, co2Pct: 0.05 };
  const overviews = PHOTOS / 3;
  return {
    company: "Bench Harbour Ship Management",
    generatedAt: new Date("2026-03-15T08:00:00Z"),
    inspection: {
      id: "22222222-2222-4222-8222-222222222222", status: "submitted", revision: 1, inspectedOn: "2026-03-14", placeKind: "dry_dock", place: "Bench Yard",
      team: ["Ama Okafor", "Tomas Reyes", "Lino Baptiste"], remarks: longRemarks(), noFindings: false, noSediment: false, allAreasInspected: false,
    },
    vessel: { name: "Bench Lantern", imoNumber: "0123450", utcOffsetMinutes: 0, frameFirst: 0, frameLast: 240, midshipFromFrame: 80, midshipToFrame: 170, engineRoomFwdBulkheadFrame: 45, collisionBulkheadFrame: 225 },
    tank: { code: "4S", name: "No. 4 WBT Starboard", kind: "double_bottom_hopper", side: "starboard", frameFrom: 98, frameTo: 150, bottomAreaM2: 320 },
    landmarks: Array.from({ length: 13 }, (_, i) => ({ frame: 100 + i * 4, label: `Fr. ${100 + i * 4}` })),
    entry: { permitRef: "ESP-BENCH-1", standbyPerson: "Lino Baptiste (AB)", ventilation: "Two fans, 6 h", rescueEquipmentReady: true, communicationsTested: true },
    ruleSet: { name: set.name, source: set.source, limits: set.limits.map((l) => ({ label: l.label, limitText: l.limitText })) },
    readings: [0, 1, 2].map((k) => ({ ...reading, testedAt: `2026-03-14T0${7 + k}:00:00Z`, measuredBy: "Ama Okafor", instrument: "4-gas meter", verdict: judgeReading(reading, set) })),
    findings,
    coating,
    tankRating: { rating: tank.rating, worstArea: tank.worst.area, decidedBy: tank.worst.rating.decidedBy },
    twentyPercentRule: "table",
    anodes: { anodeKind: "aluminium", installedCount: 36, inspectedCount: 30, meanWastagePct: 44, minWastagePct: 20, maxWastagePct: 80, toRenewCount: 9, appearUnused: false, note: "Two anodes loose on their studs." },
    anodeProjection: { date: "2026-12-01", ratePctPerYear: 8 },
    anodeThresholdPct: 50,
    anodeWarning: null,
    sediment: { zones: Array.from({ length: 6 }, (_, i) => ({ label: `Bay ${i + 1}`, frameFrom: 100 + i * 8, frameTo: 106 + i * 8, depthMm: 40 + i * 10, areaM2: 20, volumeM3: ((40 + i * 10) / 1000) * 20 })), rate: { amount: 180, currency: "EUR", place: "Bench Yard" } },
    notInspected: [0, 1, 2].map((i) => ({ frameFrom: 140 + i * 3, frameTo: 142 + i * 3, platingRegion: "lower_hopper" as const, memberKind: null, memberNumber: null, reason: "no_staging" as const, suspected: "coating breakdown" })),
    photos: photos.map((p, i) => {
      const group = Math.floor(i / 3);
      const overview = i % 3 === 0;
      const finding = findings[(group * 4 + (i % 3)) % FINDINGS]!;
      return {
        id: `photo-${i}`, kind: overview ? ("overview" as const) : ("close_up" as const),
        frameFrom: overview ? 100 + group * 2 : finding.frameFrom, frameTo: overview ? 112 + group * 2 : finding.frameTo,
        platingRegion: overview ? null : finding.platingRegion, memberKind: overview ? ("plating" as const) : finding.memberKind, memberNumber: overview ? null : finding.memberNumber,
        findingId: overview ? null : finding.id, overviewPhotoId: overview ? null : `photo-${group * 3}`,
        caption: overview ? `Overview of bay ${group + 1} looking forward.` : `Close-up of finding ${finding.number}.`,
        width: p.width, height: p.height, src: pathToFileURL(p.file).href, jpeg: p.jpeg,
      };
    }).slice(0, overviews * 3),
    signatures: [{ kind: "officer", signerName: "Ama Okafor", signerRank: "Chief Officer", typedSignature: "A. Okafor", signedAt: "2026-03-14T10:00:00Z", drawnPng: null }],
    blockers: [],
  };
}

// ---- Measuring ---------------------------------------------------------------

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const secs = (ms: number) => `${(ms / 1000).toFixed(2)} s`;
const mib = (bytes: number) => `${(bytes / MB).toFixed(2)} MB`;

async function timed<T>(work: () => Promise<T>): Promise<{ ms: number; value: T }> {
  const t0 = performance.now();
  const value = await work();
  return { ms: performance.now() - t0, value };
}

async function productRuns(data: TReportData) {
  registerPdfFonts();
  const rssStart = process.memoryUsage.rss();
  let sampled = rssStart;
  const timer = setInterval(() => (sampled = Math.max(sampled, process.memoryUsage.rss())), 20);
  const runs: { ms: number; value: Buffer }[] = [];
  for (let i = 0; i < PRODUCT_RUNS; i++) runs.push(await timed(() => renderToBuffer(createElement(ReportDocument, { data }) as unknown as ReactElement<DocumentProps>)));
  clearInterval(timer);
  // The high-water mark of this process (photos were made in a child): what the renders needed.
  const maxRssBytes = process.resourceUsage().maxRSS * 1024;
  return { times: runs.map((r) => r.ms), pdf: runs.at(-1)!.value, rssStart, peakRss: Math.max(sampled, maxRssBytes) };
}

async function pdfLibRun(jpegs: Buffer[]) {
  return timed(async () => {
    const doc = await PDFDocument.create();
    for (const jpeg of jpegs) {
      const image = await doc.embedJpg(jpeg);
      const page = doc.addPage([595.28, 841.89]);
      const scale = Math.min(523 / image.width, 770 / image.height);
      page.drawImage(image, { x: 36, y: 36, width: image.width * scale, height: image.height * scale });
    }
    return Buffer.from(await doc.save());
  });
}

function previewHtml(data: TReportData): string {
  const fonts = path.join(process.cwd(), "node_modules/@fontsource/noto-sans/files");
  const face = (weight: number, style: string) =>
    `@font-face{font-family:"Noto Sans";font-weight:${weight};font-style:${style};src:url(${pathToFileURL(path.join(fonts, `noto-sans-latin-${weight}-${style}.woff2`)).href}) format("woff2");}`;
  const body = renderToStaticMarkup(createElement(ReportView, { data }));
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${data.title}</title><style>${face(400, "normal")}${face(700, "normal")}${face(400, "italic")}</style></head><body>${body}</body></html>`;
}

async function chromiumRuns(html: string, dir: string) {
  const file = path.join(dir, "report.html");
  await writeFile(file, html);
  const launch = await timed(() => chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: CHROMIUM_ARGS }));
  const browser = launch.value;
  try {
    const runs: { ms: number; value: Buffer }[] = [];
    for (let i = 0; i < OTHER_RUNS; i++) {
      runs.push(await timed(async () => {
        const page = await browser.newPage();
        await page.goto(pathToFileURL(file).href, { waitUntil: "load" });
        const pdf = await page.pdf({ format: "A4", printBackground: true, preferCSSPageSize: true });
        await page.close();
        return pdf;
      }));
    }
    return { launchMs: launch.ms, times: runs.map((r) => r.ms), pdf: runs.at(-1)!.value };
  } finally {
    await browser.close();
  }
}

async function main() {
  // Other work on the machine slows every figure: the load average is printed with them.
  const loadStart = os.loadavg().map((l) => l.toFixed(1)).join(" ");
  // BENCH_PDF_PHOTO_DIR keeps the photos between runs (made once, reused while it holds them all).
  const kept = process.env.BENCH_PDF_PHOTO_DIR;
  if (kept) await mkdir(kept, { recursive: true });
  const reuse = kept ? (await readdir(kept)).filter((f) => f.endsWith(".jpg")).length === PHOTOS : false;
  const dir = kept ?? (await mkdtemp(path.join(os.tmpdir(), "tankwright-bench-pdf-")));
  try {
    console.log(reuse ? `Reusing the ${PHOTOS} report variants in ${dir}` : `Making ${PHOTOS} photos of ${WIDTH} × ${HEIGHT} px and their report variants (makeVariants) in a child process…`);
    const made = await timed(() => (reuse ? readPhotos(dir) : makePhotos(dir)));
    const photos = made.value;
    const jpegBytes = photos.reduce((s, p) => s + p.jpeg.length, 0);
    console.log(`  ${photos.length} report variants, ${mib(jpegBytes)} in all (${Math.round(jpegBytes / photos.length / 1000)} kB each on average), made in ${secs(made.ms)}`);

    const data = assembleReport(largeSource(photos));
    console.log(`Report: ${data.findings.length} findings, ${data.photos.length} photos on ${data.photoPages.length} photo pages, remarks ${JSON.stringify(data.remarks).length} characters of editor JSON`);

    const product = await productRuns(data);
    const pages = (await PDFDocument.load(product.pdf)).getPageCount();
    const productMedian = median(product.times);
    console.log(`\nProduct (React-PDF, templates/report.tsx), ${PRODUCT_RUNS} renders in this process:`);
    console.log(`  times        ${product.times.map(secs).join(", ")}`);
    console.log(`  median       ${secs(productMedian)}`);
    console.log(`  peak RSS     ${mib(product.peakRss)} (RSS before the renders ${mib(product.rssStart)})`);
    console.log(`  PDF          ${mib(product.pdf.length)}, ${pages} pages`);

    if (process.env.BENCH_PDF_ONLY === "product") return;
    const lower: number[] = [];
    let lowerPdf = Buffer.alloc(0);
    for (let i = 0; i < OTHER_RUNS; i++) {
      const run = await pdfLibRun(photos.map((p) => p.jpeg));
      lower.push(run.ms);
      lowerPdf = run.value;
    }
    const lowerMedian = median(lower);
    console.log(`\nLower bound (pdf-lib: the same ${photos.length} JPEGs, one a page, no layout), ${OTHER_RUNS} runs:`);
    console.log(`  times        ${lower.map(secs).join(", ")}`);
    console.log(`  median       ${secs(lowerMedian)}; PDF ${mib(lowerPdf.length)}`);

    const html = previewHtml(data);
    const browser = await chromiumRuns(html, dir);
    const chromiumMedian = median(browser.times);
    console.log(`\nHeadless Chromium (Debian's, playwright-core) printing the HTML preview (${mib(html.length)} of HTML, photos from files), ${OTHER_RUNS} prints:`);
    console.log(`  launch       ${secs(browser.launchMs)} (not counted below)`);
    console.log(`  times        ${browser.times.map(secs).join(", ")}`);
    console.log(`  median       ${secs(chromiumMedian)}; PDF ${mib(browser.pdf.length)}`);

    console.log(`\nRatios (medians):`);
    console.log(`  product / lower bound   ${(productMedian / lowerMedian).toFixed(1)} ×`);
    console.log(`  product / Chromium      ${(productMedian / chromiumMedian).toFixed(2)} ×`);
    console.log(`\nBudgets:`);
    const verdict = (ok: boolean) => (ok ? "met" : "NOT MET");
    console.log(`  PDF ≤ 8 MB                          ${mib(product.pdf.length)}: ${verdict(product.pdf.length <= BUDGET_PDF_BYTES)}`);
    console.log(`  product faster than Chromium        ${secs(productMedian)} vs ${secs(chromiumMedian)}: ${verdict(productMedian < chromiumMedian)}`);
    console.log(`  render median ≤ 5 s                 ${secs(productMedian)}: ${verdict(productMedian <= BUDGET_MEDIAN_MS)}`);
    console.log(`\nMachine: ${os.cpus()[0]?.model ?? "unknown CPU"}, ${os.availableParallelism()} cores, Node.js ${process.version}; load average at the start ${loadStart}, at the end ${os.loadavg().map((l) => l.toFixed(1)).join(" ")}`);
  } finally {
    if (!kept) await rm(dir, { recursive: true, force: true });
  }
}

if (process.argv[2] === "--generate-into") {
  generateInto(process.argv[3]!).catch((error) => {
    console.error(error);
    process.exit(1);
  });
} else {
  main().catch((error) => {
    console.error(error);
    process.exit(1);
  });
}
