import { describe, expect, it } from "vitest";
import { parseServerEnv } from "@/lib/env";
import { formatDate, formatDateTime, formatUtcOffset } from "@/lib/format";
import { safeCallbackPath } from "@/lib/http/paths";
import { ZMembershipInput, ZUserInput } from "@/lib/schemas/user";
import { ZVesselInput } from "@/lib/schemas/vessel";

const vessel = { name: "Test", imoNumber: "9074729", vesselType: "bulk_carrier", frameFirst: "0", frameLast: "250" };
const paths = (r: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) =>
  r.error?.issues.map((i) => i.path.join(".")) ?? [];

describe("vessel particulars", () => {
  it("accepts form strings and turns empty optional fields into nothing", () => {
    const r = ZVesselInput.safeParse({ ...vessel, flag: "", midshipFromFrame: "", midshipToFrame: "" });
    expect(r.success).toBe(true);
    expect(r.data).toMatchObject({ frameFirst: 0, frameLast: 250, flag: undefined, midshipFromFrame: undefined });
  });

  it("refuses frames out of order or outside the vessel, naming the field", () => {
    expect(paths(ZVesselInput.safeParse({ ...vessel, frameFirst: 250, frameLast: 10 }))).toEqual(["frameLast"]);
    expect(paths(ZVesselInput.safeParse({ ...vessel, collisionBulkheadFrame: 260 }))).toEqual(["collisionBulkheadFrame"]);
    expect(paths(ZVesselInput.safeParse({ ...vessel, midshipFromFrame: 100 }))).toEqual(["midshipToFrame"]);
    expect(paths(ZVesselInput.safeParse({ ...vessel, midshipFromFrame: 150, midshipToFrame: 100 }))).toEqual(["midshipToFrame"]);
  });

  it("a blank first frame is missing, not frame 0", () => {
    const r = ZVesselInput.safeParse({ ...vessel, frameFirst: "" });
    expect(paths(r)).toEqual(["frameFirst"]);
    expect(r.error?.issues[0]?.message).toBe("is required");
  });

  it("refuses a frame number that is not whole", () => {
    expect(paths(ZVesselInput.safeParse({ ...vessel, frameLast: "250.5" }))).toEqual(["frameLast"]);
  });
});

describe("users and roles", () => {
  it("officer and master need a vessel; the company roles must not have one", () => {
    expect(paths(ZMembershipInput.safeParse({ role: "master" }))).toEqual(["vesselId"]);
    expect(paths(ZMembershipInput.safeParse({ role: "admin", vesselId: "7c1f6a3e-1111-4a5b-8c9d-0123456789ab" }))).toEqual(["vesselId"]);
    expect(ZMembershipInput.safeParse({ role: "surveyor", vesselId: "" }).success).toBe(true);
  });

  it("lower-cases the e-mail and asks for a long password", () => {
    const ok = ZUserInput.safeParse({ email: "Chief.Officer@Example.TEST", name: "A B", password: "twelve-chars", role: "admin" });
    expect(ok.data?.email).toBe("chief.officer@example.test");
    expect(paths(ZUserInput.safeParse({ email: "x@y.test", name: "A B", password: "short", role: "admin" }))).toEqual(["password"]);
  });
});

describe("environment", () => {
  it("names the variable that is missing or wrong", () => {
    expect(() => parseServerEnv({ AUTH_SECRET: "x".repeat(40) })).toThrow(/DATABASE_URL/);
    expect(() => parseServerEnv({ DATABASE_URL: "postgres://h/db", AUTH_SECRET: "short" })).toThrow(/AUTH_SECRET/);
    expect(() => parseServerEnv({ DATABASE_URL: "mysql://h/db", AUTH_SECRET: "x".repeat(40) })).toThrow(/DATABASE_URL/);
    expect(() => parseServerEnv({ DATABASE_URL: "postgres://h/db", AUTH_SECRET: "x".repeat(40) })).toThrow(/S3_BUCKET/);
    expect(() => parseServerEnv({ DATABASE_URL: "postgres://h/db", AUTH_SECRET: "x".repeat(40), S3_BUCKET: "b-1", S3_ENDPOINT: "not a url" })).toThrow(/S3_ENDPOINT/);
  });

  it("accepts next-auth's own variable names as well", () => {
    const env = parseServerEnv({ DATABASE_URL: "postgres://h/db", NEXTAUTH_SECRET: "x".repeat(40), NEXTAUTH_URL: "http://127.0.0.1:3000", S3_BUCKET: "tankwright" });
    expect(env.AUTH_SECRET).toHaveLength(40);
    expect(env.APP_URL).toBe("http://127.0.0.1:3000");
  });
});

describe("formats and paths", () => {
  it("dates are ISO calendar dates; times carry their offset", () => {
    const at = new Date("2026-03-14T21:30:00Z");
    expect(formatDate(at)).toBe("2026-03-14");
    expect(formatDate(at, 480)).toBe("2026-03-15");
    expect(formatDateTime(at)).toBe("2026-03-14 21:30 UTC");
    expect(formatDateTime(at, -180)).toBe("2026-03-14 18:30 (UTC−03:00)");
    expect(formatUtcOffset(330)).toBe("UTC+05:30");
  });

  it("returns after sign-in only to a path on this site", () => {
    expect(safeCallbackPath("/fleet?x=1")).toBe("/fleet?x=1");
    for (const bad of ["https://evil.test/", "//evil.test", "/\\evil.test", "/api/v1/me", "/sign-in", 5]) {
      expect(safeCallbackPath(bad)).toBeNull();
    }
  });
});
