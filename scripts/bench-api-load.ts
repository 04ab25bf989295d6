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
//   DATABASE_URL         the benchmark's database (to switch auto_explain on and off)
//   BENCH_API_PG_LOG     the benchmark cluster's log file, where auto_explain writes
//   BENCH_API_SECONDS    seconds per run (default 10)
//   BENCH_API_CONNECTIONS  e.g. 1,10,50 (the default)
import { createRequire } from "node:module";
import { open, stat } from "node:fs/promises";
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

// ---- The plans of the queries the app really ran ------------------------------
// The benchmark's cluster loads auto_explain switched off (log_min_duration -1).
// For a few sequential requests to one endpoint it is switched on for every
// statement, with ANALYZE and BUFFERS; the plans are read back from the
// cluster's log. No copy of the app's SQL is kept here to drift from db/queries.

type TPlanNode = Record<string, unknown> & { "Node Type": string; Plans?: TPlanNode[] };
type TLoggedPlan = { ms: number; text: string; plan: string[] };

/** One plan node per line, indented as EXPLAIN's text format indents them. */
function planLines(node: TPlanNode, depth = 0): string[] {
  const n = (k: string) => node[k] as string | number | undefined;
  const on = [n("Relation Name") && `on ${n("Relation Name")}`, n("Index Name") && `using ${n("Index Name")}`].filter(Boolean).join(" ");
  const cond = n("Index Cond") ?? n("Hash Cond") ?? n("Recheck Cond") ?? n("Filter");
  const sortKey = node["Sort Key"] ? ` key ${(node["Sort Key"] as string[]).join(", ")}` : "";
  const line = `${"  ".repeat(depth)}${depth ? "-> " : ""}${n("Node Type")}${on ? ` ${on}` : ""}${sortKey} (actual ${n("Actual Total Time")} ms, rows ${n("Actual Rows")}, loops ${n("Actual Loops")}, shared hit ${n("Shared Hit Blocks") ?? 0} read ${n("Shared Read Blocks") ?? 0})${cond ? `  ${cond}` : ""}`;
  return [line, ...(node.Plans ?? []).flatMap((c) => planLines(c, depth + 1))];
}

/** auto_explain's JSON entries in the cluster's log (each continuation line starts with a tab). */
function parsePlans(log: string): TLoggedPlan[] {
  const plans: TLoggedPlan[] = [];
  const lines = log.split("\n");
  for (let i = 0; i < lines.length; i++) {
    const head = / LOG:  duration: ([\d.]+) ms  plan:$/.exec(lines[i]!);
    if (!head) continue;
    const json: string[] = [];
    while (i + 1 < lines.length && lines[i + 1]!.startsWith("\t")) json.push(lines[++i]!.slice(1));
    const entry = JSON.parse(json.join("\n")) as { "Query Text": string; Plan: TPlanNode };
    plans.push({ ms: Number(head[1]), text: entry["Query Text"], plan: planLines(entry.Plan) });
  }
  return plans;
}

async function explainEndpoint(endpoint: TEndpoint, cookie: string, requests: number): Promise<TLoggedPlan[]> {
  const logPath = process.env.BENCH_API_PG_LOG;
  if (!logPath) throw new Error("BENCH_API_PG_LOG is not set (run npm run bench:api)");
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  const from = (await stat(logPath)).size;
  try {
    await client.query("alter system set auto_explain.log_min_duration = 0");
    await client.query("select pg_reload_conf()");
    await new Promise((r) => setTimeout(r, 500)); // every backend reads the new setting
    for (let i = 0; i < requests; i++) await check(endpoint.path, cookie);
  } finally {
    await client.query("alter system reset auto_explain.log_min_duration");
    await client.query("select pg_reload_conf()");
    await client.end();
  }
  const handle = await open(logPath, "r");
  const { size } = await handle.stat();
  const buffer = Buffer.alloc(size - from);
  await handle.read(buffer, 0, buffer.length, from);
  await handle.close();
  return parsePlans(buffer.toString("utf8")).filter((p) => !/pg_reload_conf|auto_explain/.test(p.text));
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
let workListAll = 0;
for (let i = 0; i < SERVER_TIME_REQUESTS; i++) {
  const t0 = performance.now();
  const res = await fetch(baseUrl + workList.path, { headers: { cookie } });
  const body = (await res.json()) as { workList?: { items?: unknown[] }; paging?: { matching: number } };
  sequential.push(performance.now() - t0);
  workListItems = body.workList?.items?.length ?? 0;
  workListAll = body.paging?.matching ?? workListItems;
}
sequential.sort((a, b) => a - b);
console.log("");
console.log(
  `Work list server time (${SERVER_TIME_REQUESTS} sequential requests, a page of ${workListItems} of ${workListAll} items, totals over all): median ${ms(percentile(sequential, 50))} ms, min ${ms(sequential[0]!)} ms, max ${ms(sequential[sequential.length - 1]!)} ms`,
);

console.log("");
console.log(`Budgets: p95 ≤ ${BUDGET_P95_MS} ms at ${BUDGET_CONNECTIONS} connections`);
for (const r of rows.filter((r) => r.endpoint.budget && r.connections === BUDGET_CONNECTIONS)) {
  console.log(`  ${r.endpoint.name.padEnd(22)} p95 ${ms(r.p95).padStart(7)} ms  ${r.p95 <= BUDGET_P95_MS && r.bad === 0 ? "met" : "NOT MET"}`);
}

// The slowest endpoint at the highest connection count, and the slowest of the queries behind it.
const top = Math.max(...connectionCounts);
const slowest = rows.filter((r) => r.connections === top).sort((a, b) => b.p95 - a.p95)[0]!;
const EXPLAIN_REQUESTS = 5;
const logged = await explainEndpoint(slowest.endpoint, cookie, EXPLAIN_REQUESTS);
// The same statement from each request: its median execution time.
const byText = new Map<string, TLoggedPlan[]>();
for (const p of logged) byText.set(p.text, [...(byText.get(p.text) ?? []), p]);
const statements = [...byText.values()]
  .map((runs) => {
    const sorted = [...runs].sort((a, b) => a.ms - b.ms);
    return { text: runs[0]!.text, runs: runs.length, median: sorted[Math.floor(sorted.length / 2)]!.ms, plan: sorted[Math.floor(sorted.length / 2)]!.plan };
  })
  .sort((a, b) => b.median - a.median);
console.log("");
console.log(`Slowest endpoint at ${top} connections: ${slowest.endpoint.name} (p95 ${ms(slowest.p95)} ms). Statements it ran in ${EXPLAIN_REQUESTS} sequential requests (auto_explain, median execution time):`);
for (const st of statements) console.log(`  ${st.median.toFixed(3).padStart(8)} ms  × ${st.runs}  ${st.text.replace(/\s+/g, " ").slice(0, 110)}`);
const worst = statements[0];
if (worst) {
  console.log("");
  console.log("EXPLAIN (ANALYZE, BUFFERS) of the slowest, as the app ran it:");
  console.log(worst.text.replace(/^/gm, "  "));
  console.log("");
  for (const line of worst.plan) console.log(`  ${line}`);
} else {
  console.log("  (no plans were logged: is auto_explain loaded? see the cluster log)");
}
