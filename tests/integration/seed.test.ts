import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { organisations, tanks, users, vessels } from "@/db/schema";
import { DEMO_ORG_SLUG, DEMO_USERS, seedDemo } from "@/db/seed/demo";
import { checkImoNumber } from "@/lib/imo";
import { testDb } from "../fixtures/scenario";

describe("demo seed", () => {
  it("seeds once; a second run changes nothing", async () => {
    const db = testDb();
    await seedDemo(db);
    const count = async () => ({
      orgs: await db.$count(organisations),
      users: await db.$count(users),
      vessels: await db.$count(vessels),
      tanks: await db.$count(tanks),
    });
    const before = await count();
    expect(await seedDemo(db)).toBe(false);
    expect(await count()).toEqual(before);
  });

  it("has one user per role and vessels whose IMO numbers pass the check digit", async () => {
    const db = testDb();
    await seedDemo(db);
    const org = await db.query.organisations.findFirst({ where: eq(organisations.slug, DEMO_ORG_SLUG) });
    const fleet = await db.select().from(vessels).where(eq(vessels.orgId, org!.id));
    expect(fleet.length).toBe(2);
    for (const v of fleet) expect(checkImoNumber(v.imoNumber).ok).toBe(true);
    for (const u of DEMO_USERS) expect(await db.$count(users, eq(users.email, u.email))).toBe(1);
  });
});
