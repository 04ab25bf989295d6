// The fleet overview: latest countersigned rating per tank, due dates from the
// company's intervals (company row and a vessel's own row), overdue, filters,
// counts, server-side paging, and who may see which vessel. Due dates are worked
// by hand below; the thresholds are IMO MSC.1/Circ.1330 §4.1.3 Table 1 (read).
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { listFleetTanks } from "@/db/queries/fleet";
import { getUserWithMemberships } from "@/db/queries/users";
import { coatingAreas, inspectionIntervals, inspections } from "@/db/schema";
import { fillInspection } from "@/db/seed/complete-inspection";
import { insertOrganisation, insertTank, insertVessel } from "@/db/seed/builders";
import { rateCoatingArea, type TTwentyPercentRule } from "@/lib/calc/coating";
import type { TActor } from "@/lib/auth/actor";
import { fleetQueryFromParams } from "@/lib/schemas/fleet";
import { getFleetOverviewAs, type TFleetOverview } from "@/lib/services/fleet";
import { signIn, type TClient } from "../fixtures/http";
import { buildScenario, fakeImo, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

const TODAY = "2026-03-10";
let s: TScenario;
let superintendent: TClient;
let officer: TClient;
let surveyor: TClient;
const codes = { good: "FT-A", fair: "FT-B", poor: "FT-C", unrated: "FT-D", sGood: "FT-S1", sFair: "FT-S2", sSoon: "FT-S3" };

type TCoating = { breakdownPct: number; rustedPct?: number; hardScalePct?: number; edgesRustedPct?: number | null };

async function tank(v: { id: string; orgId: string }, code: string) {
  return insertTank(testDb(), { orgId: v.orgId, vesselId: v.id, code, name: `Tank ${code}`, side: "port", kind: "side", frameFrom: 40, frameTo: 60 });
}

/** A report of the past, countersigned: the status is set directly in the test data. */
async function countersigned(t: { id: string; orgId: string; vesselId: string }, inspectedOn: string, coating: TCoating[] | "fill" | null, extra: Partial<typeof inspections.$inferInsert> = {}) {
  const db = testDb();
  const [ins] = await db
    .insert(inspections)
    .values({ orgId: t.orgId, vesselId: t.vesselId, tankId: t.id, inspectedOn, placeKind: "port", place: "Test port", team: ["Test team"], status: "countersigned", countersignedAt: new Date(`${inspectedOn}T12:00:00Z`), ...extra })
    .returning();
  if (coating === "fill") {
    // shell plating 4 % breakdown, the rest 1 %: FAIR, worst area shell plating.
    await fillInspection(db, { orgId: t.orgId, inspectionId: ins!.id, frameFrom: 40, testedAt: new Date(`${inspectedOn}T08:00:00Z`), measuredBy: "Test officer", standbyPerson: "Test bosun" });
  } else if (coating) {
    const areas = ["shell_plating", "bulkhead_plating", "stringers", "edges_welds"] as const;
    await db.insert(coatingAreas).values(coating.map((c, i) => ({ orgId: t.orgId, inspectionId: ins!.id, area: areas[i]!, rustedPct: 0, hardScalePct: 0, ...c })));
  }
  return ins!;
}

async function actorOf(userId: string): Promise<TActor> {
  const found = (await getUserWithMemberships({ userId }))!;
  return { userId, email: found.user.email, name: found.user.name, rank: null, memberships: found.memberships };
}

const query = (p: Record<string, string> = {}) => {
  const parsed = fleetQueryFromParams(p);
  if (!parsed.success) throw new Error(parsed.error.message);
  return parsed.data;
};
const byCode = (o: TFleetOverview, code: string) => o.tanks.find((t) => t.code === code)!;

beforeAll(async () => {
  s = await buildScenario();
  const db = testDb();
  // Company: 12 months, 6 below GOOD. The sibling vessel has its own row: 6 months, 3 below GOOD.
  await db.insert(inspectionIntervals).values([
    { orgId: s.org.id, vesselId: null, defaultMonths: 12, belowGoodMonths: 6 },
    { orgId: s.org.id, vesselId: s.siblingVessel.id, defaultMonths: 6, belowGoodMonths: 3 },
    { orgId: s.otherOrg.id, vesselId: null, defaultMonths: 1, belowGoodMonths: 1 },
  ]);
  const own = s.ownVessel;
  const sib = s.siblingVessel;

  const a = await tank(own, codes.good);
  await countersigned(a, "2025-03-01", [{ breakdownPct: 30 }]); // older and POOR: not the latest
  await countersigned(a, "2026-01-31", [{ breakdownPct: 1 }, { breakdownPct: 2.5, rustedPct: 1 }]);
  await db.insert(inspections).values({ orgId: own.orgId, vesselId: own.id, tankId: a.id, inspectedOn: "2026-03-01", placeKind: "port", place: "Test port", status: "submitted" }); // not countersigned: ignored

  await countersigned(await tank(own, codes.fair), "2025-08-31", "fill");

  const c = await tank(own, codes.poor);
  const seriesId = randomUUID();
  await countersigned(c, "2026-02-15", [{ breakdownPct: 1 }], { seriesId, revision: 1 });
  await countersigned(c, "2026-02-15", [{ breakdownPct: 1 }, { breakdownPct: 25, rustedPct: 5 }], { seriesId, revision: 2 });

  await countersigned(await tank(own, codes.unrated), "2026-01-10", null);

  await countersigned(await tank(sib, codes.sGood), "2025-12-31", [{ breakdownPct: 0 }]);
  await countersigned(await tank(sib, codes.sFair), "2025-11-30", [{ breakdownPct: 1 }, { breakdownPct: 1, hardScalePct: 2 }]);
  await countersigned(await tank(sib, codes.sSoon), "2025-09-20", [{ breakdownPct: 2 }]);

  // Another company's tank, countersigned POOR: never in our overview.
  await countersigned(s.tankOf(s.otherVessel.id), "2026-02-01", [{ breakdownPct: 60 }]);

  [superintendent, officer, surveyor] = await Promise.all([
    signIn(s.users.superintendent.email, PASSWORD),
    signIn(s.users.officer.email, PASSWORD),
    signIn(s.users.surveyor.email, PASSWORD),
  ]);
});

describe("ratings and due dates (today 2026-03-10)", () => {
  let o: TFleetOverview;
  beforeAll(async () => {
    o = await getFleetOverviewAs(await actorOf(s.users.superintendent.id), query({ pageSize: "50" }), TODAY);
  });

  it("lists every tank of the company and none of another company", () => {
    expect(o.tanks.map((t) => t.vesselId).every((id) => id === s.ownVessel.id || id === s.siblingVessel.id)).toBe(true);
    expect(o.tanks).toHaveLength(9);
  });

  it("GOOD from the latest countersigned report: 2026-01-31 + 12 months = 2027-01-31, in 327 days", () => {
    const t = byCode(o, codes.good);
    expect(t.lastInspection?.inspectedOn).toBe("2026-01-31");
    expect(t.rating).toMatchObject({ rating: "GOOD", worstArea: "bulkhead_plating", breakdownPct: 2.5 });
    expect(t.due).toMatchObject({ dueOn: "2027-01-31", intervalMonths: 12, daysUntilDue: 327, overdue: false, status: "not_due" });
  });

  it("FAIR (shell plating 4 %): 2025-08-31 + 6 months = 2026-02-28 (end of month), overdue by 10 days; bulk-carrier annual reason", () => {
    const t = byCode(o, codes.fair);
    expect(t.rating).toMatchObject({ rating: "FAIR", worstArea: "shell_plating", breakdownPct: 4 });
    expect(t.due).toMatchObject({ dueOn: "2026-02-28", intervalMonths: 6, daysUntilDue: -10, overdue: true, status: "overdue" });
    expect(t.reasons.map((r) => r.source)).toContain("IMO Res. MSC.525(106)");
  });

  it("POOR from revision 2 of the same day (25 % breakdown): 2026-02-15 + 6 months = 2026-08-15, in 158 days", () => {
    const t = byCode(o, codes.poor);
    expect(t.lastInspection).toMatchObject({ inspectedOn: "2026-02-15", revision: 2 });
    expect(t.rating).toMatchObject({ rating: "POOR", breakdownPct: 25 });
    expect(t.due).toMatchObject({ dueOn: "2026-08-15", daysUntilDue: 158, overdue: false });
  });

  it("countersigned without a coating record: not rated, the shorter interval, 2026-01-10 + 6 = 2026-07-10", () => {
    const t = byCode(o, codes.unrated);
    expect(t.rating).toBeNull();
    expect(t.due).toMatchObject({ dueOn: "2026-07-10", intervalMonths: 6 });
    expect(t.reasons[0]!.kind).toBe("not_rated");
  });

  it("the vessel's own interval row wins over the company's: 2025-12-31 + 6 = 2026-06-30; FAIR (hard scale) 2025-11-30 + 3 = 2026-02-28", () => {
    expect(byCode(o, codes.sGood).due).toMatchObject({ dueOn: "2026-06-30", intervalMonths: 6, daysUntilDue: 112 });
    expect(byCode(o, codes.sFair).rating?.rating).toBe("FAIR");
    expect(byCode(o, codes.sFair).due).toMatchObject({ dueOn: "2026-02-28", intervalMonths: 3, overdue: true });
    expect(byCode(o, codes.sSoon).due).toMatchObject({ dueOn: "2026-03-20", daysUntilDue: 10 });
  });

  it("the reason names whose interval applies: the sibling vessel's own row (6/3), the company's for the own vessel (12/6)", () => {
    expect(byCode(o, codes.sGood).reasons[0]!.text).toBe("Coating GOOD: the vessel's own interval of 6 months applies.");
    expect(byCode(o, codes.sFair).reasons[0]!.text).toBe("Coating FAIR, below GOOD (the tank takes the rating of its worst area): the vessel's own shorter interval of 3 months applies.");
    expect(byCode(o, codes.good).reasons[0]!.text).toBe("Coating GOOD: the company's interval of 12 months applies.");
    expect(byCode(o, codes.fair).reasons[0]!.text).toBe("Coating FAIR, below GOOD (the tank takes the rating of its worst area): the company's shorter interval of 6 months applies.");
  });

  it("a tank with only a draft is never inspected and due now", () => {
    const never = o.tanks.filter((t) => t.code === "No. 1 WBT P");
    expect(never).toHaveLength(2);
    for (const t of never) expect(t.due).toMatchObject({ status: "never_inspected", dueOn: null });
  });

  it("counts by SQL aggregate", () => {
    // dueSoon counts what dueWithin=30 lists, due by 2026-04-09: FT-B and FT-S2 (overdue, 2026-02-28),
    // FT-S3 (2026-03-20) and the two never inspected "No. 1 WBT P" = 5. FT-S1 (2026-06-30) and later are not.
    expect(o.counts).toEqual({ tanks: 9, overdue: 2, dueSoon: 5, poor: 1, fair: 2, good: 3, unrated: 1, neverInspected: 2, matching: 9 });
  });
});

describe("filters and paging", () => {
  const codesOf = (o: TFleetOverview) => o.tanks.map((t) => t.code).sort();
  let actor: TActor;
  beforeAll(async () => {
    actor = await actorOf(s.users.superintendent.id);
  });

  it("rating, never inspected, due within N days, vessel", async () => {
    expect(codesOf(await getFleetOverviewAs(actor, query({ rating: "GOOD" }), TODAY))).toEqual([codes.good, codes.sGood, codes.sSoon].sort());
    expect(codesOf(await getFleetOverviewAs(actor, query({ rating: "POOR" }), TODAY))).toEqual([codes.poor]);
    expect(codesOf(await getFleetOverviewAs(actor, query({ rating: "unrated" }), TODAY))).toEqual([codes.unrated]);
    expect(codesOf(await getFleetOverviewAs(actor, query({ rating: "never" }), TODAY))).toEqual(["No. 1 WBT P", "No. 1 WBT P"]);
    // Due by 2026-04-09: the two overdue, FT-S3 (2026-03-20) and the two never inspected.
    const soon = await getFleetOverviewAs(actor, query({ dueWithin: "30" }), TODAY);
    expect(codesOf(soon)).toEqual([codes.fair, codes.sFair, codes.sSoon, "No. 1 WBT P", "No. 1 WBT P"].sort());
    expect(soon.counts.matching).toBe(5);
    expect(soon.counts.tanks).toBe(9);
    // The "Due within 30 days" card links to dueWithin=30: it counts exactly the tanks that link lists.
    expect(soon.counts.dueSoon).toBe(soon.counts.matching);
    const sib = await getFleetOverviewAs(actor, query({ vessel: s.siblingVessel.id, rating: "FAIR" }), TODAY);
    expect(codesOf(sib)).toEqual([codes.sFair]);
    expect(sib.counts).toMatchObject({ tanks: 4, fair: 1, good: 2, neverInspected: 1, matching: 1 });
  });

  it("sort=due: overdue oldest first, then due now (never inspected), then the soonest; by vessel on a tie", async () => {
    // By hand (today 2026-03-10): FT-B and FT-S2 both overdue since 2026-02-28 (own vessel first), then the two
    // never inspected (no due date, due today: "Own vessel" before "Sibling vessel"), FT-S3 2026-03-20,
    // FT-S1 2026-06-30, FT-D 2026-07-10, FT-C 2026-08-15, FT-A 2027-01-31.
    const inOrder = (o: TFleetOverview) => o.tanks.map((t) => `${t.vesselId === s.ownVessel.id ? "own" : "sib"} ${t.code}`);
    const expected = [`own ${codes.fair}`, `sib ${codes.sFair}`, "own No. 1 WBT P", "sib No. 1 WBT P", `sib ${codes.sSoon}`, `sib ${codes.sGood}`, `own ${codes.unrated}`, `own ${codes.poor}`, `own ${codes.good}`];
    expect(inOrder(await getFleetOverviewAs(actor, query({ sort: "due" }), TODAY))).toEqual(expected);
    // Sorted in SQL before LIMIT/OFFSET: page 2 of 4 holds the 5th to 8th of that order.
    const page2 = await getFleetOverviewAs(actor, query({ sort: "due", pageSize: "4", page: "2" }), TODAY);
    expect(inOrder(page2)).toEqual(expected.slice(4, 8));
    expect(page2.query.sort).toBe("due");
    // The default stays by vessel: the five tanks of "Own vessel" before the four of "Sibling vessel".
    const byVessel = await getFleetOverviewAs(actor, query({}), TODAY);
    expect(byVessel.query.sort).toBe("vessel");
    expect(inOrder(byVessel).map((x) => x.slice(0, 3))).toEqual(["own", "own", "own", "own", "own", "sib", "sib", "sib", "sib"]);
  });

  it("pages on the server: disjoint pages that together hold every tank once", async () => {
    const pages = await Promise.all([1, 2, 3].map((p) => getFleetOverviewAs(actor, query({ pageSize: "4", page: String(p) }), TODAY)));
    expect(pages.map((p) => p.tanks.length)).toEqual([4, 4, 1]);
    expect(pages[0]!.paging).toMatchObject({ page: 1, pageSize: 4, matching: 9, totalPages: 3 });
    const ids = pages.flatMap((p) => p.tanks.map((t) => t.tankId));
    expect(new Set(ids).size).toBe(9);
    expect((await getFleetOverviewAs(actor, query({ pageSize: "4", page: "9" }), TODAY)).tanks).toEqual([]);
  });
});

describe("the SQL rating agrees with lib/calc/coating.ts at every threshold", () => {
  it("for both readings of the 20 % boundary", async () => {
    const db = testDb();
    const org = await insertOrganisation(db, { slug: `parity-${s.run}`, name: `Parity ${s.run}` });
    const v = await insertVessel(db, { orgId: org.id, name: "Parity vessel", imoNumber: fakeImo(), vesselType: "oil_tanker", frameFirst: 0, frameLast: 200 });
    const cases: TCoating[] = [
      { breakdownPct: 0 }, { breakdownPct: 2.9 }, { breakdownPct: 3 }, { breakdownPct: 19.9 }, { breakdownPct: 20 }, { breakdownPct: 20.1 },
      { breakdownPct: 1, rustedPct: 3 }, { breakdownPct: 1, rustedPct: 20 }, { breakdownPct: 1, rustedPct: 21 },
      { breakdownPct: 0, hardScalePct: 0.5 }, { breakdownPct: 0, hardScalePct: 9.9 }, { breakdownPct: 0, hardScalePct: 10 },
      { breakdownPct: 0, edgesRustedPct: 19.9 }, { breakdownPct: 0, edgesRustedPct: 20 }, { breakdownPct: 0, edgesRustedPct: 50 }, { breakdownPct: 0, edgesRustedPct: 50.1 },
    ];
    const expected = new Map<string, TCoating>();
    for (const [i, c] of cases.entries()) {
      const t = await tank(v, `P-${String(i).padStart(2, "0")}`);
      await countersigned(t, "2026-01-01", [c]);
      expected.set(t.id, c);
    }
    for (const rule of ["table", "wording"] as TTwentyPercentRule[]) {
      const rows = await listFleetTanks({ scope: { orgId: org.id, vesselIds: null, twentyPercentRule: rule, today: TODAY }, filters: {}, limit: 100, offset: 0 });
      expect(rows).toHaveLength(cases.length);
      for (const r of rows) {
        const c = expected.get(r.tankId)!;
        const lib = rateCoatingArea({ rustedPct: 0, hardScalePct: 0, ...c }, rule).rating;
        expect([r.ratingRank, rule, c]).toEqual([{ GOOD: 0, FAIR: 1, POOR: 2 }[lib], rule, c]);
      }
    }
    const exactly20 = [...expected].find(([, c]) => c.breakdownPct === 20 && !c.rustedPct)![0];
    const rankFor = async (rule: TTwentyPercentRule) =>
      (await listFleetTanks({ scope: { orgId: org.id, vesselIds: null, twentyPercentRule: rule, today: TODAY }, filters: {}, limit: 100, offset: 0 })).find((r) => r.tankId === exactly20)!.ratingRank;
    expect(await rankFor("table")).toBe(1); // FAIR: Circ.1330 Table 1 "3–20 %"
    expect(await rankFor("wording")).toBe(2); // POOR: "20 % or more"
  });
});

describe("GET /api/v1/fleet and the page, by role", () => {
  type TBody = { tanks: { vesselId: string; code: string }[]; counts: { tanks: number }; paging: { matching: number; totalPages: number } };
  type TErr = { error: { code: string; issues: { path: string; message: string }[] } };

  it("the superintendent gets the company, paged", async () => {
    const res = await superintendent.request("/api/v1/fleet?pageSize=4&page=2");
    expect(res.status).toBe(200);
    const body = (await res.json()) as TBody;
    expect(body.tanks).toHaveLength(4);
    expect(body.paging).toMatchObject({ matching: 9, totalPages: 3 });
    expect(JSON.stringify(body)).not.toContain(s.otherVessel.name);
  });

  it("an officer gets only their own vessel, and 404 for another vessel's overview", async () => {
    const own = (await (await officer.request("/api/v1/fleet")).json()) as TBody;
    expect(own.counts.tanks).toBe(5);
    expect(own.tanks.every((t) => t.vesselId === s.ownVessel.id)).toBe(true);
    const sibling = await officer.request(`/api/v1/fleet?vessel=${s.siblingVessel.id}`);
    expect(sibling.status).toBe(404);
    expect(await sibling.text()).not.toContain(s.siblingVessel.name);
    expect((await officer.request(`/api/v1/fleet?vessel=${s.otherVessel.id}`)).status).toBe(404);
    expect((await officer.request(`/fleet?vessel=${s.siblingVessel.id}`)).status).toBe(404);
    expect((await officer.request(`/fleet?vessel=${s.ownVessel.id}`)).status).toBe(200);
  });

  it("a surveyor is refused: 403 from the API, 404 page", async () => {
    expect((await surveyor.request("/api/v1/fleet")).status).toBe(403);
    expect((await surveyor.request("/fleet")).status).toBe(404);
  });

  // Its links back are followed in tests/e2e/fleet.test.ts.
  it("the 404 page of the signed-in app says the record does not exist or is not open to you", async () => {
    for (const [who, client, path] of [
      ["officer, another vessel", officer, `/fleet?vessel=${s.siblingVessel.id}`],
      ["officer, another company's vessel", officer, `/fleet?vessel=${s.otherVessel.id}`],
      ["officer, no such vessel", officer, `/fleet?vessel=${randomUUID()}`],
      ["surveyor", surveyor, "/fleet"],
    ] as const) {
      const res = await client.request(path);
      expect(res.status, who).toBe(404);
      const html = await res.text();
      expect(html, who).toContain("This record does not exist or is not open to you.");
      expect(html, who).toContain("it belongs to a vessel or company your account does not cover");
      expect(html, who).not.toContain(s.siblingVessel.name);
      expect(html, who).not.toContain(s.otherVessel.name);
    }
  });

  it("bad filter values: 400 naming the parameter from the API, a message on the page", async () => {
    for (const [q, path] of [["dueWithin=abc", "dueWithin"], ["dueWithin=-3", "dueWithin"], ["rating=BAD", "rating"], ["page=0", "page"], ["pageSize=5000", "pageSize"], ["vessel=not-an-id", "vessel"], ["sort=worst", "sort"]] as const) {
      const res = await superintendent.request(`/api/v1/fleet?${q}`);
      expect(res.status, q).toBe(400);
      expect(((await res.json()) as TErr).error.issues.map((i) => i.path)).toEqual([path]);
    }
    const page = await superintendent.request("/fleet?dueWithin=abc&rating=BAD");
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("These filters cannot be used");
    expect(html).toContain("dueWithin (days) must be a whole number");
    expect(html).toContain("rating must be one of");
  });

  it("the page shows ratings as words with the counts", async () => {
    const html = await (await superintendent.request(`/fleet?vessel=${s.ownVessel.id}`)).text();
    for (const word of ["GOOD", "FAIR", "POOR", "Never inspected", "Overdue", codes.fair, "2026-02-28"]) expect(html).toContain(word);
  });

  it("with a vessel filter the subtitle counts that vessel only", async () => {
    // The superintendent may choose between 2 vessels; the own vessel holds FT-A…FT-D and No. 1 WBT P = 5 tanks.
    const html = await (await superintendent.request(`/fleet?vessel=${s.ownVessel.id}`)).text();
    expect(html).toContain("1 vessel · 5 ballast tanks");
    // Without it: the company's 2 vessels and their 9 tanks.
    expect(await (await superintendent.request("/fleet")).text()).toContain("2 vessels · 9 ballast tanks");
  });

  it("the legend lists Not rated and Never inspected with different swatches; the tank code opens its history", async () => {
    const html = await (await superintendent.request(`/fleet?vessel=${s.ownVessel.id}`)).text();
    const legend = html.slice(html.indexOf('aria-label="Legend"'));
    expect(legend).toContain('data-swatch="unrated"');
    expect(legend).toContain('data-swatch="never"');
    expect(legend).toContain("Not rated");
    // Both dashed outlines; only "unrated" carries the dot.
    const swatch = (kind: string) => legend.slice(legend.indexOf(`data-swatch="${kind}"`), legend.indexOf("</svg>", legend.indexOf(`data-swatch="${kind}"`)));
    expect(swatch("unrated")).toContain("<circle");
    expect(swatch("never")).not.toContain("<circle");
    const ftA = (await getFleetOverviewAs(await actorOf(s.users.superintendent.id), query({ vessel: s.ownVessel.id }), TODAY)).tanks.find((t) => t.code === codes.good)!;
    expect(html).toContain(`href="/vessels/${s.ownVessel.id}/tanks/${ftA.tankId}/history"`);
  });

  it("a page past the last says so and links to the last page; sort is kept in the pager's links", async () => {
    // 9 tanks in 50s: 1 page.
    const past = await (await superintendent.request("/fleet?page=99")).text();
    expect(past).toContain("There is no page 99: the list has 1 page.");
    expect(past).toMatch(/<a[^>]*href="\/fleet"[^>]*>Go to page 1<\/a>/);
    expect(past).not.toContain("rel=\"prev\"");
    expect(past).not.toContain("No tank matches these filters.");
    // 9 tanks in 4s: 3 pages; from page 5 the last is 3, with the sort and page size kept.
    const sorted = await (await superintendent.request("/fleet?sort=due&pageSize=4&page=5")).text();
    expect(sorted).toContain("There is no page 5: the list has 3 pages.");
    expect(sorted).toContain('href="/fleet?sort=due&amp;page=3&amp;pageSize=4"');
    const first = await (await superintendent.request("/fleet?sort=due&pageSize=4")).text();
    expect(first).toContain('href="/fleet?sort=due&amp;page=2&amp;pageSize=4"');
  });
});
