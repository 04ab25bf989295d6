// Inspection intervals kept by the office: company-wide and per vessel, the
// shorter one below GOOD, checked on input; the fleet's due dates follow them.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { inspectionIntervals } from "@/db/schema";
import { signIn, type TClient } from "../fixtures/http";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

let s: TScenario;
let superintendent: TClient;
let officer: TClient;
type TErr = { error: { issues: { path: string; message: string }[] } };

beforeAll(async () => {
  s = await buildScenario();
  [superintendent, officer] = await Promise.all([signIn(s.users.superintendent.email, PASSWORD), signIn(s.users.officer.email, PASSWORD)]);
});

const put = (c: TClient, json: unknown) => c.request("/api/v1/settings/intervals", { method: "PUT", json });

describe("inspection intervals", () => {
  it("the superintendent sets the company's intervals, then one vessel's; reading shows both", async () => {
    expect((await put(superintendent, { defaultMonths: 12, belowGoodMonths: 6 })).status).toBe(200);
    expect((await put(superintendent, { defaultMonths: 12, belowGoodMonths: 4 })).status).toBe(200);
    expect((await put(superintendent, { vesselId: s.siblingVessel.id, defaultMonths: 6, belowGoodMonths: 3 })).status).toBe(200);
    const read = (await (await superintendent.request("/api/v1/settings/intervals")).json()) as { company: { defaultMonths: number; belowGoodMonths: number }; vessels: { vesselId: string; defaultMonths: number }[] };
    expect(read.company).toMatchObject({ defaultMonths: 12, belowGoodMonths: 4 });
    expect(read.vessels.map((v) => [v.vesselId, v.defaultMonths])).toEqual([[s.siblingVessel.id, 6]]);
    expect(await testDb().$count(inspectionIntervals, eq(inspectionIntervals.orgId, s.org.id))).toBe(2);
  });

  it("refuses a shorter default than the below-GOOD interval, zero months and another company's vessel; nothing changes", async () => {
    const longer = await put(superintendent, { defaultMonths: 6, belowGoodMonths: 12 });
    expect(longer.status).toBe(400);
    expect(((await longer.json()) as TErr).error.issues[0]!.path).toBe("belowGoodMonths");
    expect((await put(superintendent, { defaultMonths: 0, belowGoodMonths: 0 })).status).toBe(400);
    const word = await put(superintendent, { defaultMonths: "twelve", belowGoodMonths: 6 });
    expect(word.status).toBe(400);
    // Not a number is not "required": the field was there.
    expect(((await word.json()) as TErr).error.issues).toEqual([{ path: "defaultMonths", message: "must be a whole number of months" }]);
    const missing = await put(superintendent, { belowGoodMonths: 6 });
    expect(((await missing.json()) as TErr).error.issues).toEqual([{ path: "defaultMonths", message: "is required: the interval for tanks rated GOOD in months" }]);
    expect((await put(superintendent, { vesselId: s.otherVessel.id, defaultMonths: 12, belowGoodMonths: 6 })).status).toBe(404);
    expect((await put(officer, { defaultMonths: 24, belowGoodMonths: 12 })).status).toBe(403);
    const company = await testDb().query.inspectionIntervals.findFirst({ where: (t, { and, eq: is, isNull }) => and(is(t.orgId, s.org.id), isNull(t.vesselId)) });
    expect([company!.defaultMonths, company!.belowGoodMonths]).toEqual([12, 4]);
  });

  it("a vessel goes back to the company's intervals", async () => {
    expect((await superintendent.request(`/api/v1/settings/intervals?vesselId=${s.siblingVessel.id}`, { method: "DELETE" })).status).toBe(200);
    expect((await superintendent.request(`/api/v1/settings/intervals?vesselId=${s.siblingVessel.id}`, { method: "DELETE" })).status).toBe(404);
    expect(await testDb().$count(inspectionIntervals, eq(inspectionIntervals.orgId, s.org.id))).toBe(1);
  });
});
