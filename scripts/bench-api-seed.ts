// Seeds the large fleet that `npm run bench:api` loads, into DATABASE_URL (a
// database of the benchmark's own, made empty by scripts/bench-api.sh).
//
// One company, 20 vessels × 30 tanks × 10 countersigned inspections × 20
// findings, with coating areas (so every tank has a rating), an anode record
// and sediment per inspection; a company-wide inspection interval; one
// superintendent whose e-mail and password scripts/bench-api-load.ts signs in
// with; one docking per vessel whose items are gathered by lib/office/work-list.ts
// from each tank's latest countersigned inspection (what the product stores when
// a docking is created). Rows go in as multi-row inserts in batches.
//
// Prints the ids the load script needs as one JSON line prefixed "BENCH_IDS ".
import { randomUUID } from "node:crypto";
import { sql } from "drizzle-orm";
import { performance } from "node:perf_hooks";
import { createDb, type TDb } from "@/db/client";
import {
  anodeRecords,
  coatingAreas,
  dockingItems,
  dockings,
  findings,
  inspectionIntervals,
  inspections,
  memberships,
  organisations,
  orgSettings,
  sedimentZones,
  tanks,
  users,
  vessels,
} from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { gatherWorkItems, type TWorkSource, type TWorkSourceFinding } from "@/lib/office/work-list";
import { COATING_AREAS, FINDING_STATUSES, FINDING_TYPES, MEMBER_KINDS, REPAIR_KINDS, TANK_KINDS, TANK_SIDES, VESSEL_TYPES } from "@/lib/vocabulary";
import { prng } from "./prng";

const BENCH_EMAIL = "bench.super@tankwright.test";
const BENCH_PASSWORD = "bench-password-0123";

const VESSELS = Number(process.env.BENCH_API_VESSELS ?? 20);
const TANKS = 30;
const INSPECTIONS = 10;
const FINDINGS = 20;
const SEDIMENT_ZONES = 2;
const BATCH_PARAMS = 30_000;

const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set");
const db = createDb(url, 4);

const rand = prng(7);
const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)]!;
const round = (x: number, digits = 1) => Math.round(x * 10 ** digits) / 10 ** digits;

/** Inserts rows in multi-row statements, each under the driver's parameter limit. */
async function insertBatched<T extends Record<string, unknown>>(w: TDb, table: Parameters<TDb["insert"]>[0], rows: T[]) {
  if (!rows.length) return;
  const perRow = Object.keys(rows[0]!).length;
  const size = Math.max(1, Math.floor(BATCH_PARAMS / perRow));
  for (let i = 0; i < rows.length; i += size) {
    await w.insert(table).values(rows.slice(i, i + size) as any);
  }
}

const counts: Record<string, number> = {};
const t0 = performance.now();

const orgId = randomUUID();
const userId = randomUUID();
await db.insert(organisations).values({ id: orgId, slug: "bench-fleet", name: "Bench Fleet Management" });
await db.insert(orgSettings).values({ orgId });
await db.insert(inspectionIntervals).values({ orgId, vesselId: null, defaultMonths: 30, belowGoodMonths: 12 });
await db.insert(users).values({ id: userId, email: BENCH_EMAIL, name: "Bench Superintendent", passwordHash: await hashPassword(BENCH_PASSWORD) });
await db.insert(memberships).values({ orgId, userId, vesselId: null, role: "superintendent" });

const dockingIds: string[] = [];
const sample: { vesselId: string; tankId: string }[] = [];

for (let v = 0; v < VESSELS; v++) {
  const vesselId = randomUUID();
  await db.insert(vessels).values({
    id: vesselId,
    orgId,
    name: `MV Bench ${String(v + 1).padStart(2, "0")}`,
    imoNumber: String(9_300_000 + v * 7),
    vesselType: VESSEL_TYPES[v % 3]!,
    frameFirst: 0,
    frameLast: 300,
  });
  const tankRows: (typeof tanks.$inferInsert)[] = [];
  const inspRows: (typeof inspections.$inferInsert)[] = [];
  const findingRows: (typeof findings.$inferInsert)[] = [];
  const coatingRows: (typeof coatingAreas.$inferInsert)[] = [];
  const anodeRows: (typeof anodeRecords.$inferInsert)[] = [];
  const zoneRows: (typeof sedimentZones.$inferInsert)[] = [];
  const sources: TWorkSource[] = [];
  for (let t = 0; t < TANKS; t++) {
    const tankId = randomUUID();
    const frameFrom = 20 + t * 8;
    const code = `WB${String(t + 1).padStart(2, "0")}`;
    tankRows.push({ id: tankId, orgId, vesselId, code, name: `No. ${t + 1} WBT`, side: TANK_SIDES[t % 3]!, kind: TANK_KINDS[t % TANK_KINDS.length]!, frameFrom, frameTo: frameFrom + 8, bottomAreaM2: 120, sortOrder: t });
    if (v === 0 && t === 0) sample.push({ vesselId, tankId });
    for (let n = 0; n < INSPECTIONS; n++) {
      const inspectionId = randomUUID();
      // One inspection a year, the latest in 2026.
      const inspectedOn = `${2017 + n}-${String(1 + ((t + v) % 12)).padStart(2, "0")}-${String(1 + (t % 28)).padStart(2, "0")}`;
      const signedAt = new Date(`${inspectedOn}T12:00:00Z`);
      inspRows.push({ id: inspectionId, orgId, vesselId, tankId, status: "countersigned", inspectedOn, placeKind: "port", place: "Rotterdam", team: ["C/O Bench"], version: 5, noSediment: false, allAreasInspected: true, submittedAt: signedAt, countersignedAt: signedAt, lockedAt: signedAt });
      const fs: TWorkSourceFinding[] = [];
      for (let k = 0; k < FINDINGS; k++) {
        const id = randomUUID();
        const repairKind = pick(REPAIR_KINDS);
        const steel = repairKind === "insert_plate" || repairKind === "profile_renewal" || repairKind === "bracket_renewal" ? round(20 + rand() * 400) : null;
        const coating = repairKind === "monitor_only" ? null : round(0.5 + rand() * 20);
        const status = n === INSPECTIONS - 1 ? (k % 5 === 4 ? "monitoring" : "open") : pick(FINDING_STATUSES);
        const f = { id, number: k + 1, status, type: pick(FINDING_TYPES), frameFrom: frameFrom + (k % 8), frameTo: frameFrom + (k % 8) + 1, memberKind: pick(MEMBER_KINDS), memberNumber: 1 + (k % 6), platingRegion: null, repairKind, steelWeightKg: steel, coatingRepairM2: coating } satisfies TWorkSourceFinding;
        fs.push(f);
        findingRows.push({ ...f, orgId, inspectionId, description: `Bench finding ${k + 1} of inspection ${n + 1}`, lengthMm: round(50 + rand() * 500), widthMm: round(10 + rand() * 200) });
      }
      const rank = rand();
      for (const area of COATING_AREAS) {
        const breakdown = round(rank < 0.5 ? rand() * 2.5 : rank < 0.85 ? 3 + rand() * 15 : 21 + rand() * 30);
        coatingRows.push({ orgId, inspectionId, area, breakdownPct: breakdown, rustedPct: round(breakdown * 0.6), hardScalePct: rank > 0.95 ? 10 : 0, edgesRustedPct: area === "edges_welds" ? round(breakdown * 1.2) : null });
      }
      const toRenew = Math.floor(rand() * 6);
      anodeRows.push({ orgId, inspectionId, anodeKind: "aluminium", installedCount: 24, inspectedCount: 24, meanWastagePct: round(10 + n * 6 + rand() * 5), minWastagePct: 5, maxWastagePct: round(30 + n * 6), toRenewCount: toRenew });
      const zones: { label: string; depthMm: number; areaM2: number }[] = [];
      for (let z = 0; z < SEDIMENT_ZONES; z++) {
        const depthMm = round(20 + rand() * 80);
        const areaM2 = round(5 + rand() * 30);
        zones.push({ label: `Bay ${z + 1}`, depthMm, areaM2 });
        zoneRows.push({ id: randomUUID(), orgId, inspectionId, label: `Bay ${z + 1}`, frameFrom: frameFrom + z * 4, frameTo: frameFrom + z * 4 + 4, depthMm, areaM2, volumeM3: round((depthMm / 1000) * areaM2, 3) });
      }
      if (n === INSPECTIONS - 1) sources.push({ tankId, tankCode: code, inspectionId, inspectedOn, findings: fs, anodes: { toRenewCount: toRenew }, sedimentZones: zones });
    }
  }
  await db.transaction(async (tx) => {
    const w = tx as unknown as TDb;
    await insertBatched(w, tanks, tankRows);
    await insertBatched(w, inspections, inspRows);
    await insertBatched(w, findings, findingRows);
    await insertBatched(w, coatingAreas, coatingRows);
    await insertBatched(w, anodeRecords, anodeRows);
    await insertBatched(w, sedimentZones, zoneRows);
    const dockingId = randomUUID();
    await tx.insert(dockings).values({ id: dockingId, orgId, vesselId, yard: "Bench Yard", place: "Gdańsk", plannedOn: "2027-03-01", currency: "USD", steelRatePerKg: 4.5, coatingRatePerM2: 38, anodeRatePerPiece: 210, sedimentRatePerM3: 95, createdBy: userId });
    const work = gatherWorkItems(sources).items;
    await insertBatched(w, dockingItems, work.map((i) => ({ orgId, dockingId, tankId: i.tankId, findingId: i.findingId, kind: i.kind, description: i.description, quantity: i.quantity, unit: i.unit })));
    dockingIds.push(dockingId);
    counts.dockingItems = (counts.dockingItems ?? 0) + work.length;
  });
  counts.tanks = (counts.tanks ?? 0) + tankRows.length;
  counts.inspections = (counts.inspections ?? 0) + inspRows.length;
  counts.findings = (counts.findings ?? 0) + findingRows.length;
  counts.coatingAreas = (counts.coatingAreas ?? 0) + coatingRows.length;
  counts.anodeRecords = (counts.anodeRecords ?? 0) + anodeRows.length;
  counts.sedimentZones = (counts.sedimentZones ?? 0) + zoneRows.length;
}
await db.execute(sql`analyze`);
const seconds = (performance.now() - t0) / 1000;
console.log(`seeded ${VESSELS} vessels in ${seconds.toFixed(1)} s: ${Object.entries(counts).map(([k, n]) => `${n} ${k}`).join(", ")}, ${dockingIds.length} dockings`);
console.log(`BENCH_IDS ${JSON.stringify({ orgId, vesselId: sample[0]!.vesselId, tankId: sample[0]!.tankId, dockingId: dockingIds[0], email: BENCH_EMAIL, password: BENCH_PASSWORD })}`);
await db.pool.end();
