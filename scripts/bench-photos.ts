// Benchmarks the photo variant pipeline (makeVariants) against bare sharp calls
// making the same two outputs the obvious way. Prints figures; asserts nothing.
//
//   npm run bench:photos                       counts 8, 16, 32
//   BENCH_PHOTOS_COUNTS=4,8 npm run bench:photos
//   npm run bench:photos -- --counts=4,8
//   BENCH_PHOTOS_ROUNDS=3 npm run bench:photos   rounds per count (default 2; best time kept)
//
// The photos are made here, not downloaded: 4000 × 3000 JPEGs at quality 90 with
// an EXIF capture time, every third one stored sideways (EXIF orientation 6). A
// child process makes them into a folder under os.tmpdir() (removed at the end),
// so the memory spent making them does not count in this process's RSS.
import { fork } from "node:child_process";
import { mkdtemp, readFile, readdir, rm, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { fileURLToPath } from "node:url";
import sharp from "sharp";
import { makeVariants } from "@/lib/photos/image";
import { REPORT_TARGET_BYTES } from "@/lib/uploads/limits";
import { prng } from "./prng";

const WIDTH = 4000;
const HEIGHT = 3000;
const CAPTURED = "2026:11:20 09:30:15";
const REPORT_PHOTOS = 60;
const GOAL_RATIO = 0.8;
const RSS_SAMPLE_MS = 20;
const KB = 1000;
const MB = 1024 * 1024; // as in lib/uploads/limits.ts

function parseRounds(): number {
  const rounds = Number(process.env.BENCH_PHOTOS_ROUNDS ?? 2);
  return Number.isInteger(rounds) && rounds > 0 ? rounds : 2;
}

function parseCounts(): number[] {
  const arg = process.argv.slice(2).find((a) => a.startsWith("--counts="))?.slice("--counts=".length);
  const text = arg ?? process.env.BENCH_PHOTOS_COUNTS ?? "8,16,32";
  const counts = text.split(",").map((s) => Number(s.trim())).filter((n) => Number.isInteger(n) && n > 0);
  if (counts.length === 0) throw new Error(`no usable photo counts in "${text}" (expected e.g. 8,16,32)`);
  return counts;
}

// ---- Test photos -------------------------------------------------------------


/**
 * Surface texture and sensor grain, made once and laid over every photo (flipped
 * differently per photo): mottling at a quarter of the resolution, upscaled,
 * overlaid with fine gaussian noise.
 */
async function grainField(): Promise<Buffer> {
  const noise = (width: number, height: number, sigma: number) =>
    sharp({ create: { width, height, channels: 3, background: { r: 128, g: 128, b: 128 }, noise: { type: "gaussian", mean: 128, sigma } } }).raw().toBuffer();
  const mottle = await noise(WIDTH / 4, HEIGHT / 4, 14);
  const fine = await noise(WIDTH, HEIGHT, 30);
  return sharp(mottle, { raw: { width: WIDTH / 4, height: HEIGHT / 4, channels: 3 } })
    .resize(WIDTH, HEIGHT, { kernel: "cubic", fit: "fill" })
    .composite([{ input: fine, raw: { width: WIDTH, height: HEIGHT, channels: 3 }, blend: "overlay" }])
    .removeAlpha()
    .raw()
    .toBuffer();
}

/** Coarse seeded colour field (coating, rust, shadow), smoothly upscaled to the full frame. */
function colourField(rand: () => number): { data: Buffer; width: number; height: number } {
  const width = 40;
  const height = 30;
  const data = Buffer.alloc(width * height * 3);
  const base = [70 + rand() * 80, 70 + rand() * 60, 60 + rand() * 60];
  const light = { x: rand() * width, y: rand() * height };
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const shade = 1.25 - Math.hypot(x - light.x, y - light.y) / (width * 1.1);
      const rust = rand() < 0.12 ? 1 : 0;
      const jitter = (rand() - 0.5) * 40;
      const i = (y * width + x) * 3;
      data[i] = clamp((base[0]! + jitter + rust * 60) * shade);
      data[i + 1] = clamp((base[1]! + jitter + rust * 15) * shade);
      data[i + 2] = clamp((base[2]! + jitter - rust * 20) * shade);
    }
  }
  return { data, width, height };
}

const clamp = (v: number) => Math.max(0, Math.min(255, Math.round(v)));

/**
 * Structure a tank photo has: stiffeners, welds, scale patches, pitting, a shadowed corner.
 * fill-opacity/stroke-opacity, never `opacity`: librsvg renders each element with
 * `opacity` through a full-frame layer, which takes tens of seconds at 12 MP.
 */
function structureSvg(rand: () => number): Buffer {
  const parts: string[] = [];
  const stiffeners = 3 + Math.floor(rand() * 4);
  for (let i = 0; i < stiffeners; i++) {
    const x = (i + 0.5 + (rand() - 0.5) * 0.4) * (WIDTH / stiffeners);
    const w = 60 + rand() * 120;
    parts.push(`<rect x="${x.toFixed(0)}" y="0" width="${w.toFixed(0)}" height="${HEIGHT}" fill="url(#bar)" fill-opacity="${(0.5 + rand() * 0.4).toFixed(2)}"/>`);
    parts.push(`<line x1="${(x - 6).toFixed(0)}" y1="0" x2="${(x - 6).toFixed(0)}" y2="${HEIGHT}" stroke="#3a3028" stroke-width="${(4 + rand() * 8).toFixed(0)}" stroke-opacity="0.7"/>`);
  }
  const patches = 6 + Math.floor(rand() * 10);
  for (let i = 0; i < patches; i++) {
    const cx = rand() * WIDTH;
    const cy = rand() * HEIGHT;
    parts.push(`<ellipse cx="${cx.toFixed(0)}" cy="${cy.toFixed(0)}" rx="${(80 + rand() * 500).toFixed(0)}" ry="${(60 + rand() * 350).toFixed(0)}" fill="url(#rust)" transform="rotate(${(rand() * 180).toFixed(0)} ${cx.toFixed(0)} ${cy.toFixed(0)})"/>`);
  }
  const pits = 40 + Math.floor(rand() * 120);
  for (let i = 0; i < pits; i++) {
    parts.push(`<circle cx="${(rand() * WIDTH).toFixed(0)}" cy="${(rand() * HEIGHT).toFixed(0)}" r="${(3 + rand() * 18).toFixed(1)}" fill="#1e1410" fill-opacity="${(0.3 + rand() * 0.5).toFixed(2)}"/>`);
  }
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${HEIGHT}">
<defs>
<linearGradient id="bar" x1="0" x2="1" y1="0" y2="0"><stop offset="0" stop-color="#2a2a2a"/><stop offset="0.4" stop-color="#b0a898"/><stop offset="1" stop-color="#403830"/></linearGradient>
<radialGradient id="rust"><stop offset="0" stop-color="#7a3a12" stop-opacity="0.85"/><stop offset="0.6" stop-color="#a0521c" stop-opacity="0.5"/><stop offset="1" stop-color="#a0521c" stop-opacity="0"/></radialGradient>
<radialGradient id="vignette" cx="${(0.3 + rand() * 0.4).toFixed(2)}" cy="${(0.3 + rand() * 0.4).toFixed(2)}" r="0.8"><stop offset="0.5" stop-color="#000" stop-opacity="0"/><stop offset="1" stop-color="#000" stop-opacity="0.6"/></radialGradient>
</defs>
${parts.join("\n")}
<rect width="${WIDTH}" height="${HEIGHT}" fill="url(#vignette)"/>
</svg>`;
  return Buffer.from(svg);
}

async function makePhoto(index: number, grain: Buffer): Promise<Buffer> {
  const rand = prng(0x7a9c + index * 7919);
  const field = colourField(rand);
  const composed = await sharp(field.data, { raw: { width: field.width, height: field.height, channels: 3 } })
    .resize(WIDTH, HEIGHT, { kernel: "cubic", fit: "fill" })
    .composite([
      { input: structureSvg(rand) },
      { input: grain, raw: { width: WIDTH, height: HEIGHT, channels: 3 }, blend: "soft-light" },
    ])
    .raw()
    .toBuffer({ resolveWithObject: true });
  const { width, height, channels } = composed.info;
  let out = sharp(composed.data, { raw: { width, height, channels } })
    .removeAlpha()
    .flip(index % 2 === 1)
    .flop(index % 4 >= 2)
    .blur(0.7)
    .withExif({ IFD0: { Make: "Bench", Model: "Tankwright synthetic" }, IFD2: { DateTimeOriginal: CAPTURED } });
  if (index % 3 === 2) out = out.withMetadata({ orientation: 6 });
  return out.jpeg({ quality: 90 }).toBuffer();
}

const photoFile = (dir: string, index: number) => path.join(dir, `photo-${String(index).padStart(3, "0")}.jpg`);

/** Child-process side: makes `count` photos into `dir`, two at a time on two cores. */
async function generateInto(dir: string, count: number): Promise<void> {
  const grain = await grainField();
  const lanes = Math.max(1, Math.min(os.availableParallelism(), 2));
  let next = 0;
  await Promise.all(
    Array.from({ length: lanes }, async () => {
      while (next < count) {
        const i = next++;
        await writeFile(photoFile(dir, i), await makePhoto(i, grain));
      }
    }),
  );
}

type TPhoto = { data: Buffer; orientation: number };

async function makePhotos(dir: string, count: number): Promise<TPhoto[]> {
  const child = fork(fileURLToPath(import.meta.url), ["--generate-into", dir, String(count)], { stdio: "inherit" });
  const code = await new Promise<number | null>((resolve, reject) => {
    child.once("error", reject);
    child.once("exit", resolve);
  });
  if (code !== 0) throw new Error(`making the test photos failed (child exit code ${code})`);
  const files = (await readdir(dir)).filter((f) => f.endsWith(".jpg")).sort();
  if (files.length !== count) throw new Error(`expected ${count} test photos in ${dir}, found ${files.length}`);
  return Promise.all(
    files.map(async (f) => {
      const data = await readFile(path.join(dir, f));
      return { data, orientation: (await sharp(data).metadata()).orientation ?? 1 };
    }),
  );
}

// ---- Measuring ---------------------------------------------------------------

type TRun = { ms: number; rssStartMB: number; rssPeakMB: number };

/** Best (shortest) time of the rounds; RSS from the first round's start to the highest peak of any round. */
const combine = (runs: TRun[]): TRun => ({
  ms: Math.min(...runs.map((r) => r.ms)),
  rssStartMB: runs[0]!.rssStartMB,
  rssPeakMB: Math.max(...runs.map((r) => r.rssPeakMB)),
});

async function measure(work: () => Promise<void>): Promise<TRun> {
  const rssStart = process.memoryUsage.rss();
  let rssPeak = rssStart;
  const timer = setInterval(() => {
    rssPeak = Math.max(rssPeak, process.memoryUsage.rss());
  }, RSS_SAMPLE_MS);
  const t0 = performance.now();
  try {
    await work();
  } finally {
    clearInterval(timer);
  }
  const ms = performance.now() - t0;
  rssPeak = Math.max(rssPeak, process.memoryUsage.rss());
  return { ms, rssStartMB: rssStart / MB, rssPeakMB: rssPeak / MB };
}

type TProductStats = { reportBytes: number[]; reportWidths: number[]; thumbBytes: number[]; withCaptureTime: number; uprightOk: number };

async function runProduct(photos: TPhoto[], stats?: TProductStats): Promise<void> {
  for (const p of photos) {
    const v = await makeVariants(p.data);
    if (!stats) continue;
    stats.reportBytes.push(v.report.data.length);
    stats.reportWidths.push(Math.max(v.report.width, v.report.height));
    stats.thumbBytes.push(v.thumb.data.length);
    if (v.capturedAt) stats.withCaptureTime++;
    // Sideways (orientation 6) originals must come out portrait, the others landscape.
    if ((p.orientation === 6) === v.report.height > v.report.width) stats.uprightOk++;
  }
}

async function runBare(photos: TPhoto[], reportBytes?: number[]): Promise<void> {
  for (const p of photos) {
    const report = await sharp(p.data).rotate().resize(1600, 1600, { fit: "inside", withoutEnlargement: true }).jpeg().toBuffer();
    await sharp(p.data).rotate().resize(320, 320, { fit: "inside" }).jpeg().toBuffer();
    reportBytes?.push(report.length);
  }
}

// ---- Output ------------------------------------------------------------------

const mean = (xs: number[]) => (xs.length ? xs.reduce((a, b) => a + b, 0) / xs.length : 0);
const f = (n: number, digits = 2) => n.toFixed(digits);

function table(header: string[], rows: string[][]): string {
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? "").length)));
  const line = (cells: string[]) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join("  ");
  return [line(header), widths.map((w) => "-".repeat(w)).join("  "), ...rows.map(line)].join("\n");
}

async function main() {
  const counts = parseCounts();
  const rounds = parseRounds();
  const maxCount = Math.max(...counts);
  const cpus = os.cpus();

  console.log("bench:photos — makeVariants (lib/photos/image.ts) vs bare sharp");
  console.log(`machine: ${cpus.length} CPUs (${cpus[0]?.model.trim() ?? "unknown"}), ${f(os.totalmem() / 1024 ** 3, 1)} GB RAM, ${os.platform()} ${os.arch()}`);
  console.log(`node ${process.version}, sharp ${sharp.versions.sharp ?? "?"}, libvips ${sharp.versions.vips}`);
  console.log(`sharp.concurrency() = ${sharp.concurrency()} (library default, not changed), libuv threadpool = ${process.env.UV_THREADPOOL_SIZE ?? "4 (default)"}, sharp cache = default`);
  console.log(
    `counts: ${counts.join(", ")}; ${rounds} round(s) per count, order alternating, best time kept; ` +
      `each run processes its photos one after another; RSS sampled every ${RSS_SAMPLE_MS} ms`,
  );
  console.log("");

  const dir = await mkdtemp(path.join(os.tmpdir(), "tankwright-bench-photos-"));
  const tGen = performance.now();
  let photos: TPhoto[];
  try {
    photos = await makePhotos(dir, maxCount);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
  const genSec = (performance.now() - tGen) / 1000;
  const sizes = photos.map((p) => p.data.length);
  const sideways = photos.filter((p) => p.orientation === 6).length;
  const meta = await sharp(photos[0]!.data).metadata();
  console.log(
    `photos: ${photos.length} synthetic JPEGs ${meta.width} × ${meta.height} (${f((WIDTH * HEIGHT) / 1e6, 0)} MP), quality 90, ` +
      `mean ${f(mean(sizes) / MB)} MB (min ${f(Math.min(...sizes) / MB)}, max ${f(Math.max(...sizes) / MB)}), ` +
      `${sideways} with EXIF orientation 6, all with DateTimeOriginal ${CAPTURED}; made in ${f(genSec, 1)} s by a child process (temp folder removed)`,
  );

  // Warm-up: load libvips code paths, the JPEG codec and the module graph once.
  const warm = photos.slice(0, Math.min(2, photos.length));
  await runProduct(warm);
  await runBare(warm);

  type TRow = { n: number; product: TRun; bare: TRun };
  const rows: TRow[] = [];
  const productStats: TProductStats = { reportBytes: [], reportWidths: [], thumbBytes: [], withCaptureTime: 0, uprightOk: 0 };
  const bareReportBytes: number[] = [];
  for (const n of counts) {
    const set = photos.slice(0, n);
    const largest = n === maxCount && productStats.reportBytes.length === 0;
    const productRuns: TRun[] = [];
    const bareRuns: TRun[] = [];
    for (let round = 0; round < rounds; round++) {
      const collect = largest && round === 0;
      const runP = async () => productRuns.push(await measure(() => runProduct(set, collect ? productStats : undefined)));
      const runB = async () => bareRuns.push(await measure(() => runBare(set, collect ? bareReportBytes : undefined)));
      if (round % 2 === 0) {
        await runP();
        await runB();
      } else {
        await runB();
        await runP();
      }
    }
    const product = combine(productRuns);
    const bare = combine(bareRuns);
    rows.push({ n, product, bare });
    const secs = (runs: TRun[]) => runs.map((r) => f(r.ms / 1000)).join(" / ");
    console.log(`  N=${n}: pipeline ${secs(productRuns)} s, bare ${secs(bareRuns)} s`);
  }
  console.log("");

  const pps = (n: number, run: TRun) => n / (run.ms / 1000);
  console.log(
    table(
      ["N", "pipeline s", "pipeline ph/s", "pipeline ms/ph", "bare s", "bare ph/s", "bare ms/ph", "ratio", "pipeline RSS MB", "bare RSS MB"],
      rows.map(({ n, product, bare }) => [
        String(n),
        f(product.ms / 1000),
        f(pps(n, product)),
        f(product.ms / n, 0),
        f(bare.ms / 1000),
        f(pps(n, bare)),
        f(bare.ms / n, 0),
        f(pps(n, product) / pps(n, bare)),
        `${f(product.rssStartMB, 0)}→${f(product.rssPeakMB, 0)}`,
        `${f(bare.rssStartMB, 0)}→${f(bare.rssPeakMB, 0)}`,
      ]),
    ),
  );
  console.log(`(ratio = pipeline photos/s ÷ bare photos/s, goal ≥ ${f(GOAL_RATIO)}; RSS = at the start → peak during that run; KB = 1000 bytes, MB = 1 048 576 bytes)`);
  console.log("");

  const reportMean = mean(productStats.reportBytes);
  const over = productStats.reportBytes.filter((b) => b > REPORT_TARGET_BYTES).length;
  const fallback = productStats.reportWidths.filter((w) => w < 1600).length;
  const n = productStats.reportBytes.length;
  const kb = (bytes: number) => f(bytes / KB, 1);
  console.log(
    `report variant (pipeline, N=${n}): mean ${kb(reportMean)} KB (min ${kb(Math.min(...productStats.reportBytes))}, max ${kb(Math.max(...productStats.reportBytes))}), ` +
      `target ≤ ${kb(REPORT_TARGET_BYTES)} KB, ${over} over target; ${REPORT_PHOTOS} of them ≈ ${f((reportMean * REPORT_PHOTOS) / MB)} MB`,
  );
  console.log(`  long side 1600 px: ${n - fallback}; shrunk to 1280 px because the quality ladder ran out: ${fallback}`);
  console.log(`  thumbnail mean ${kb(mean(productStats.thumbBytes))} KB; capture time read: ${productStats.withCaptureTime}/${n}; upright (EXIF orientation applied): ${productStats.uprightOk}/${n}`);
  console.log(`bare sharp 1600 px JPEG (sharp default quality 80): mean ${kb(mean(bareReportBytes))} KB; ${REPORT_PHOTOS} of them ≈ ${f((mean(bareReportBytes) * REPORT_PHOTOS) / MB)} MB`);
  console.log("");

  const small = rows.reduce((a, b) => (b.n < a.n ? b : a));
  const big = rows.reduce((a, b) => (b.n > a.n ? b : a));
  const peakOf = (r: TRow) => Math.max(r.product.rssPeakMB, r.bare.rssPeakMB);
  const firstPeak = peakOf(small);
  const lastPeak = peakOf(big);
  // Pooled over every count (all photos ÷ all best times): steadier than any one row on a shared machine.
  const photosTotal = rows.reduce((a, r) => a + r.n, 0);
  const pipelinePps = photosTotal / (rows.reduce((a, r) => a + r.product.ms, 0) / 1000);
  const barePps = photosTotal / (rows.reduce((a, r) => a + r.bare.ms, 0) / 1000);
  console.log(
    `bench:photos pipeline ${f(pipelinePps)} photos/s, bare sharp ${f(barePps)} photos/s, ratio ${f(pipelinePps / barePps)} (goal ≥ ${f(GOAL_RATIO)}), ` +
      `peak RSS ${f(firstPeak, 0)}→${f(lastPeak, 0)} MB (N=${small.n}→${big.n}; photos/s pooled over all ${photosTotal} photos; concurrency ${sharp.concurrency()})`,
  );
}

const generateAt = process.argv.indexOf("--generate-into");
if (generateAt >= 0) await generateInto(process.argv[generateAt + 1]!, Number(process.argv[generateAt + 2]));
else await main();
