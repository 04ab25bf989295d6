// The load half of `npm run bench:api` (scripts/bench-api.sh starts the
// database, seeds the large fleet, builds and starts the app, then runs this).
// Signs in as the seeded superintendent, then loads each endpoint with
// autocannon for BENCH_API_SECONDS (default 10) at 1, 10 and 50 connections
// and prints p50 / p95 / p99 latency and requests per second, the work list's
// server time, the budgets, and EXPLAIN (ANALYZE, BUFFERS) of the slowest
// query behind the slowest endpoint. Prints figures; asserts nothing.
//
//   BENCH_API_IDS        JSON from scripts/bench-api-seed.ts (orgId, vesselId, tankId, dockingId, email, password)
//   BENCH_API_BASE_URL   the running app, e.g. http://127.0.0.1:3900
//   DATABASE_URL         the benchmark's database (for EXPLAIN)
//   BENCH_API_SECONDS    seconds per run (default 10)
//   BENCH_API_CONNECTIONS  e.g. 1,10,50 (the default)
import { createRequire } from "node:module";
import { performance } from "node:perf_hooks";
import pg from "pg";

type TAutocannonInstance = Promise<TAutocannonResult> & {
  on(event: "response", fn: (client: unknown, statusCode: number, resBytes: number, responseTime: number) => void): void;
};
type TAutocannonResult = { requests: { average: number; total: number }; errors: number; timeouts: number; non2xx: number; duration: number };
type TAutocannon = (opts: { url: string; connections: number; duration: number; headers: Record<string, string>; timeout?: number }) => TAutocannonInstance;
// autocannon ships no types; this is the part of its API used here.
const autocannon = createRequire(import.meta.url)("autocannon") as TAutocannon;

const ids = JSON.parse(process.env.BENCH_API_IDS ?? "null") as { orgId: string; vesselId: string; tankId: string; dockingId: string; email: string; password: string } | null;
if (!ids) throw new Error("BENCH_API_IDS is not set (run npm run bench:api)");
const baseUrl = process.env.BENCH_API_BASE_URL ?? "http://127.0.0.1:3900";
const databaseUrl = process.env.DATABASE_URL;
if (!databaseUrl) throw new Error("DATABASE_URL is not set");
const seconds = Number(process.env.BENCH_API_SECONDS ?? 10) || 10;
const connectionCounts = (process.env.BENCH_API_CONNECTIONS ?? "1,10,50")
  .split(",")
  .map((s) => Number(s.trim()))
  .filter((n) => Number.isInteger(n) && n > 0);
const BUDGET_P95_MS = 150;
const BUDGET_CONNECTIONS = 50;
const SERVER_TIME_REQUESTS = 20;

// ---- Sign in (next-auth credentials: CSRF token, then the callback) -----------

async function signIn(): Promise<string> {
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const eq = pair!.indexOf("=");
      jar.set(pair!.slice(0, eq), pair!.slice(eq + 1));
    }
  };
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const csrf = await fetch(`${baseUrl}/api/auth/csrf`);
  keep(csrf);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const res = await fetch(`${baseUrl}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookie() },
    body: new URLSearchParams({ csrfToken, email: ids!.email, password: ids!.password, json: "true" }).toString(),
  });
  keep(res);
  if (![...jar.keys()].some((k) => k.endsWith("next-auth.session-token"))) throw new Error(`sign-in as ${ids!.email} failed (${res.status})`);
  return cookie();
}

// ---- Load ----------------------------------------------------------------------

type TEndpoint = { name: string; path: string; budget: boolean };
const endpoints: TEndpoint[] = [
  { name: "fleet overview (API)", path: "/api/v1/fleet", budget: true },
  { name: "fleet overview (page)", path: "/fleet", budget: true },
  { name: "tank history (API)", path: `/api/v1/vessels/${ids.vesselId}/tanks/${ids.tankId}/history`, budget: false },
  { name: "work list (API)", path: `/api/v1/dockings/${ids.dockingId}`, budget: true },
];

type TRow = { endpoint: TEndpoint; connections: number; p50: number; p95: number; p99: number; rps: number; total: number; bad: number };

function percentile(sorted: readonly number[], p: number): number {
  if (!sorted.length) return NaN;
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i]!;
}

async function load(endpoint: TEndpoint, connections: number, cookie: string): Promise<TRow> {
  const times: number[] = [];
  let bad = 0;
  const instance = autocannon({ url: baseUrl + endpoint.path, connections, duration: seconds, headers: { cookie, accept: "application/json, text/html" }, timeout: 30 });
  instance.on("response", (_client, status, _bytes, ms) => {
    if (status >= 200 && status < 300) times.push(ms);
    else bad += 1;
  });
  const result = await instance;
  times.sort((a, b) => a - b);
  return { endpoint, connections, p50: percentile(times, 50), p95: percentile(times, 95), p99: percentile(times, 99), rps: times.length / (result.duration || seconds), total: times.length, bad: bad + result.errors + result.timeouts };
}

async function check(path: string, cookie: string) {
  const res = await fetch(baseUrl + path, { headers: { cookie }, redirect: "manual" });
  const body = await res.text();
  if (res.status !== 200) throw new Error(`GET ${path} answered ${res.status}: ${body.slice(0, 300)}`);
  return body.length;
}

// ---- Output --------------------------------------------------------------------

const ms = (x: number) => (Number.isFinite(x) ? x.toFixed(1) : "–");
function table(head: string[], rows: string[][]) {
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join("  ");
  console.log(line(head));
  console.log(widths.map((w) => "-".repeat(w)).join("  "));
  for (const r of rows) console.log(line(r));
}

// ---- The queries behind each endpoint, as the app sends them ------------------

type TQuery = { name: string; text: string; values: unknown[] };
const { orgId, vesselId, tankId, dockingId } = ids;

const areaRank = `case
    when greatest(ca.breakdown_pct, ca.rusted_pct) > 20 or (false and greatest(ca.breakdown_pct, ca.rusted_pct) >= 20)
      or ca.hard_scale_pct >= 10 or coalesce(ca.edges_rusted_pct, 0) > 50 then 2
    when greatest(ca.breakdown_pct, ca.rusted_pct) >= 3 or ca.hard_scale_pct > 0 or coalesce(ca.edges_rusted_pct, 0) >= 20 then 1
    else 0 end`;
const datedTanks = `with scoped as (
      select t.id as tank_id, t.vessel_id, t.code, t.name as tank_name, t.kind, t.side, t.coating_system, t.sort_order,
             v.name as vessel_name, v.vessel_type, li.id as inspection_id, li.inspected_on, li.revision,
             iv.default_months, iv.below_good_months, cr.rating_rank
      from tanks t
      join vessels v on v.id = t.vessel_id and v.org_id = $1::uuid
      left join lateral (
        select i.id, i.inspected_on, i.revision from inspections i
        where i.org_id = $1::uuid and i.tank_id = t.id and i.status = 'countersigned'
        order by i.inspected_on desc, i.revision desc limit 1
      ) li on true
      left join lateral (
        select ii.default_months, ii.below_good_months from inspection_intervals ii
        where ii.org_id = $1::uuid and (ii.vessel_id = t.vessel_id or ii.vessel_id is null)
        order by ii.vessel_id nulls last limit 1
      ) iv on true
      left join lateral (
        select max(${areaRank}) as rating_rank from coating_areas ca where ca.org_id = $1::uuid and ca.inspection_id = li.id
      ) cr on true
      where t.org_id = $1::uuid
    ), dated as (
      select s.*, case
          when s.inspection_id is null or s.default_months is null then null
          when s.rating_rank = 0 then (s.inspected_on + make_interval(months => s.default_months))::date
          else (s.inspected_on + make_interval(months => least(s.below_good_months, s.default_months)))::date
        end as due_on
      from scoped s
    )`;

async function queriesFor(client: pg.Client, endpoint: TEndpoint): Promise<TQuery[]> {
  const today = new Date().toISOString().slice(0, 10);
  if (endpoint.path === "/api/v1/fleet" || endpoint.path === "/fleet") {
    const page = await client.query(
      `${datedTanks} select inspection_id from dated order by vessel_name, vessel_id, sort_order, code, tank_id limit 50 offset 0`,
      [orgId],
    );
    const inspectionIds = page.rows.flatMap((r: { inspection_id: string | null }) => (r.inspection_id ? [r.inspection_id] : []));
    return [
      {
        name: "listFleetTanks (db/queries/fleet.ts), first page of 50",
        text: `${datedTanks}
    select tank_id, vessel_id, vessel_name, vessel_type, code, tank_name, kind, side, coating_system,
           inspection_id, to_char(inspected_on, 'YYYY-MM-DD') as inspected_on, revision,
           default_months, below_good_months, rating_rank, to_char(due_on, 'YYYY-MM-DD') as due_on
    from dated where true
    order by vessel_name, vessel_id, sort_order, code, tank_id limit 50 offset 0`,
        values: [orgId],
      },
      {
        name: "countFleetTanks (db/queries/fleet.ts)",
        text: `${datedTanks}
    select count(*)::int as tanks,
           count(*) filter (where due_on < $2::date)::int as overdue,
           count(*) filter (where due_on >= $2::date and due_on <= $2::date + 30)::int as due_soon,
           count(*) filter (where rating_rank = 2)::int as poor,
           count(*) filter (where rating_rank = 1)::int as fair,
           count(*) filter (where rating_rank = 0)::int as good,
           count(*) filter (where inspection_id is not null and rating_rank is null)::int as unrated,
           count(*) filter (where inspection_id is null)::int as never_inspected,
           count(*) filter (where true)::int as matching
    from dated`,
        values: [orgId, today],
      },
      {
        name: "listCoatingForInspections (db/queries/fleet.ts), one page",
        text: `select inspection_id, area, breakdown_pct, rusted_pct, hard_scale_pct, edges_rusted_pct from coating_areas
    where org_id = $1 and inspection_id = any($2::uuid[])`,
        values: [orgId, inspectionIds],
      },
    ];
  }
  if (endpoint.path.includes("/history")) {
    const ins = await client.query(`select id from inspections where org_id = $1 and vessel_id = $2 and tank_id = $3`, [orgId, vesselId, tankId]);
    const inspectionIds = ins.rows.map((r: { id: string }) => r.id);
    return [
      { name: "listTankInspections (db/queries/history.ts)", text: `select * from inspections where org_id = $1 and vessel_id = $2 and tank_id = $3 order by inspected_on, revision`, values: [orgId, vesselId, tankId] },
      { name: "findings of the tank's inspections (db/queries/history.ts)", text: `select * from findings where org_id = $1 and inspection_id = any($2::uuid[])`, values: [orgId, inspectionIds] },
      { name: "coating areas of the tank's inspections (db/queries/history.ts)", text: `select * from coating_areas where org_id = $1 and inspection_id = any($2::uuid[])`, values: [orgId, inspectionIds] },
    ];
  }
  const latest = `select distinct on (i.tank_id) i.id, i.tank_id, t.code, i.inspected_on
    from inspections i inner join tanks t on t.org_id = i.org_id and t.id = i.tank_id
    where i.org_id = $1 and i.vessel_id = $2 and i.status = 'countersigned'
    order by i.tank_id, i.inspected_on desc, i.revision desc, i.countersigned_at desc`;
  const sources = await client.query(latest, [orgId, vesselId]);
  const inspectionIds = sources.rows.map((r: { id: string }) => r.id);
  return [
    { name: "listWorkSources, latest inspection per tank (db/queries/dockings.ts)", text: latest, values: [orgId, vesselId] },
    { name: "listWorkSources, findings of those inspections (db/queries/dockings.ts)", text: `select * from findings where org_id = $1 and inspection_id = any($2::uuid[])`, values: [orgId, inspectionIds] },
    {
      name: "listDockingItems (db/queries/dockings.ts)",
      text: `select di.id, di.tank_id, t.code, di.finding_id, di.kind, di.description, di.quantity, di.unit, di.adjusted_quantity, di.included, di.adjustment_reason, di.done_at
    from docking_items di left join tanks t on t.org_id = di.org_id and t.id = di.tank_id
    where di.org_id = $1 and di.docking_id = $2 order by t.code, di.kind, di.description`,
      values: [orgId, dockingId],
    },
  ];
}

// ---- Run -----------------------------------------------------------------------

const cookie = await signIn();
console.log(`signed in as ${ids.email}; ${seconds} s per run at ${connectionCounts.join(", ")} connections on ${baseUrl}`);
for (const e of endpoints) {
  const bytes = await check(e.path, cookie);
  for (let i = 0; i < 5; i++) await check(e.path, cookie); // warm-up
  console.log(`  ${e.name.padEnd(22)} GET ${e.path} → 200, ${(bytes / 1024).toFixed(1)} KiB`);
}

const rows: TRow[] = [];
for (const e of endpoints) {
  for (const c of connectionCounts) {
    const row = await load(e, c, cookie);
    rows.push(row);
    process.stderr.write(`  ${e.name} × ${c}: p95 ${ms(row.p95)} ms, ${row.rps.toFixed(1)} req/s\n`);
  }
}

console.log("");
console.log(`Latency (ms, 2xx responses) and throughput, ${seconds} s per run`);
table(
  ["endpoint", "conns", "p50", "p95", "p99", "req/s", "2xx", "other"],
  rows.map((r) => [r.endpoint.name, String(r.connections), ms(r.p50), ms(r.p95), ms(r.p99), r.rps.toFixed(1), String(r.total), String(r.bad)]),
);

// The work list's server time: sequential requests, one at a time (no queueing), median.
const workList = endpoints.find((e) => e.path.startsWith("/api/v1/dockings/"))!;
const sequential: number[] = [];
let workListItems = 0;
for (let i = 0; i < SERVER_TIME_REQUESTS; i++) {
  const t0 = performance.now();
  const res = await fetch(baseUrl + workList.path, { headers: { cookie } });
  const body = (await res.json()) as { workList?: { items?: unknown[] } };
  sequential.push(performance.now() - t0);
  workListItems = body.workList?.items?.length ?? 0;
}
sequential.sort((a, b) => a - b);
console.log("");
console.log(
  `Work list server time (${SERVER_TIME_REQUESTS} sequential requests, ${workListItems} items): median ${ms(percentile(sequential, 50))} ms, min ${ms(sequential[0]!)} ms, max ${ms(sequential[sequential.length - 1]!)} ms`,
);

console.log("");
console.log(`Budgets: p95 ≤ ${BUDGET_P95_MS} ms at ${BUDGET_CONNECTIONS} connections`);
for (const r of rows.filter((r) => r.endpoint.budget && r.connections === BUDGET_CONNECTIONS)) {
  console.log(`  ${r.endpoint.name.padEnd(22)} p95 ${ms(r.p95).padStart(7)} ms  ${r.p95 <= BUDGET_P95_MS && r.bad === 0 ? "met" : "NOT MET"}`);
}

// The slowest endpoint at the highest connection count, and the slowest of the queries behind it.
const top = Math.max(...connectionCounts);
const slowest = rows.filter((r) => r.connections === top).sort((a, b) => b.p95 - a.p95)[0]!;
const client = new pg.Client({ connectionString: databaseUrl });
await client.connect();
const explained: { q: TQuery; plan: string[]; ms: number }[] = [];
for (const q of await queriesFor(client, slowest.endpoint)) {
  await client.query({ text: q.text, values: q.values }); // warm the cache as the load did
  const res = await client.query({ text: `explain (analyze, buffers) ${q.text}`, values: q.values });
  const plan = res.rows.map((r: Record<string, string>) => r["QUERY PLAN"]!);
  const time = Number(/Execution Time: ([\d.]+) ms/.exec(plan.join("\n"))?.[1] ?? NaN);
  explained.push({ q, plan, ms: time });
}
await client.end();
explained.sort((a, b) => b.ms - a.ms);
console.log("");
console.log(`Slowest endpoint at ${top} connections: ${slowest.endpoint.name} (p95 ${ms(slowest.p95)} ms). Execution time of the queries behind it:`);
for (const e of explained) console.log(`  ${ms(e.ms).padStart(8)} ms  ${e.q.name}`);
const worst = explained[0]!;
console.log("");
console.log(`EXPLAIN (ANALYZE, BUFFERS) of ${worst.q.name}:`);
console.log(worst.q.text.replace(/^/gm, "  "));
console.log("");
for (const line of worst.plan) console.log(`  ${line}`);
