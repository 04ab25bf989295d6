import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { memberships, users, vessels } from "@/db/schema";
import { signIn, type TClient } from "../fixtures/http";
import { buildScenario, fakeImo, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

let s: TScenario;
let admin: TClient;
beforeAll(async () => {
  s = await buildScenario();
  admin = await signIn(s.users.admin.email, PASSWORD);
});

type TBody = { error: { code: string; message: string; issues: { path: string; message: string }[] } };

describe("bad input to route handlers", () => {
  it("malformed JSON → 400 and nothing written", async () => {
    const before = await testDb().$count(vessels, eq(vessels.orgId, s.org.id));
    const res = await admin.request("/api/v1/vessels", { method: "POST", json: "{not json" });
    expect(res.status).toBe(400);
    expect(((await res.json()) as TBody).error.message).toMatch(/not valid JSON/);
    expect(await testDb().$count(vessels, eq(vessels.orgId, s.org.id))).toBe(before);
  });

  it("wrong types → 400 naming each field", async () => {
    const res = await admin.request("/api/v1/vessels", {
      method: "POST",
      json: { name: 42, imoNumber: "9074728", vesselType: "submarine", frameFirst: "aft", frameLast: 100 },
    });
    expect(res.status).toBe(400);
    const body = (await res.json()) as TBody;
    const paths = body.error.issues.map((i) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["name", "imoNumber", "vesselType", "frameFirst"]));
    expect(body.error.issues.find((i) => i.path === "imoNumber")!.message).toMatch(/check digit/);
  });

  it("frames of the particulars outside the vessel → 400 naming the field", async () => {
    const res = await admin.request("/api/v1/vessels", {
      method: "POST",
      json: { name: "Frames test", imoNumber: fakeImo(), vesselType: "bulk_carrier", frameFirst: 0, frameLast: 100, collisionBulkheadFrame: 120 },
    });
    expect(res.status).toBe(400);
    expect(((await res.json()) as TBody).error.issues.map((i) => i.path)).toContain("collisionBulkheadFrame");
  });

  it("the same IMO number twice in one company → 409, the first one stays", async () => {
    const imoNumber = fakeImo();
    const body = { name: "Twin A", imoNumber, vesselType: "bulk_carrier", frameFirst: 0, frameLast: 100 };
    expect((await admin.request("/api/v1/vessels", { method: "POST", json: body })).status).toBe(201);
    const again = await admin.request("/api/v1/vessels", { method: "POST", json: { ...body, name: "Twin B" } });
    expect(again.status).toBe(409);
    expect(((await again.json()) as TBody).error.issues.map((i) => i.path)).toEqual(["imoNumber"]);
    const rows = await testDb().select().from(vessels).where(and(eq(vessels.orgId, s.org.id), eq(vessels.imoNumber, imoNumber)));
    expect(rows.map((r) => r.name)).toEqual(["Twin A"]);
  });

  it("unknown ids → 404", async () => {
    for (const path of ["/api/v1/vessels/00000000-0000-4000-8000-000000000000", "/api/v1/vessels/not-an-id", "/api/v1/vessels/not-an-id/tanks"]) {
      expect((await admin.request(path)).status, path).toBe(404);
    }
    const res = await admin.request("/api/v1/memberships/00000000-0000-4000-8000-000000000000", { method: "DELETE" });
    expect(res.status).toBe(404);
  });

  it("a user with a role on another company's vessel → 404 and no user is created", async () => {
    const email = `cross-${s.run}@tests.tankwright.test`;
    const res = await admin.request("/api/v1/users", {
      method: "POST",
      json: { email, name: "Cross company", password: "a-long-enough-password", role: "officer", vesselId: s.otherVessel.id },
    });
    expect(res.status).toBe(404);
    expect(await testDb().$count(users, eq(users.email, email))).toBe(0);
  });

  it("an officer role without a vessel → 400 naming vesselId", async () => {
    const res = await admin.request("/api/v1/users", {
      method: "POST",
      json: { email: `novessel-${s.run}@tests.tankwright.test`, name: "No vessel", password: "a-long-enough-password", role: "officer" },
    });
    expect(res.status).toBe(400);
    expect(((await res.json()) as TBody).error.issues.map((i) => i.path)).toContain("vesselId");
  });

  it("an administrator cannot remove their own administrator role", async () => {
    const res = await admin.request(`/api/v1/memberships/${s.users.admin.membershipId}`, { method: "DELETE" });
    expect(res.status).toBe(409);
    expect(await testDb().$count(memberships, eq(memberships.id, s.users.admin.membershipId))).toBe(1);
  });

  it("a duplicate e-mail address → 409 naming the field", async () => {
    const res = await admin.request("/api/v1/users", {
      method: "POST",
      json: { email: s.users.officer.email, name: "Duplicate", password: "a-long-enough-password", role: "superintendent" },
    });
    expect(res.status).toBe(409);
    expect(((await res.json()) as TBody).error.issues.map((i) => i.path)).toContain("email");
  });
});
