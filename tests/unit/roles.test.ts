import { describe, expect, it } from "vitest";
import { homePath, rolesInOrg, rolesOnVessel, visibleVesselScope } from "@/lib/auth/roles";
import { navLinks } from "@/lib/auth/nav";

const A = "org-a";
const B = "org-b";
const v1 = { id: "v1", orgId: A };
const v2 = { id: "v2", orgId: A };
const v3 = { id: "v3", orgId: B };

describe("roles on a vessel", () => {
  it("an officer holds their role on their vessel only", () => {
    const m = [{ orgId: A, role: "officer" as const, vesselId: "v1" }];
    expect(rolesOnVessel(m, v1)).toEqual(["officer"]);
    expect(rolesOnVessel(m, v2)).toEqual([]);
    expect(rolesOnVessel(m, v3)).toEqual([]);
  });

  it("a superintendent or admin holds their role on every vessel of their company and none other", () => {
    const m = [{ orgId: A, role: "superintendent" as const, vesselId: null }];
    expect(rolesOnVessel(m, v2)).toEqual(["superintendent"]);
    expect(rolesOnVessel(m, v3)).toEqual([]);
  });

  it("a surveyor has no role on vessel records", () => {
    expect(rolesOnVessel([{ orgId: A, role: "surveyor", vesselId: null }], v1)).toEqual([]);
  });

  it("a vessel id of another company never matches, even if a membership names it", () => {
    expect(rolesOnVessel([{ orgId: B, role: "master", vesselId: "v1" }], v1)).toEqual([]);
  });

  it("company roles", () => {
    expect(rolesInOrg([{ orgId: A, role: "admin", vesselId: null }, { orgId: B, role: "surveyor", vesselId: null }], A)).toEqual(["admin"]);
  });
});

describe("home page per role", () => {
  it.each([
    [[{ orgId: A, role: "officer" as const, vesselId: "v1" }], "/vessels/v1"],
    [[{ orgId: A, role: "master" as const, vesselId: "v2" }], "/vessels/v2"],
    [[{ orgId: A, role: "superintendent" as const, vesselId: null }], "/fleet"],
    [[{ orgId: A, role: "admin" as const, vesselId: null }], "/admin"],
    [[{ orgId: A, role: "surveyor" as const, vesselId: null }], "/shared"],
    [[], "/no-role"],
  ])("%j → %s", (m, path) => {
    expect(homePath(m)).toBe(path);
  });
});

describe("visible vessels", () => {
  it("officer roles list their vessels; an office role opens the whole company", () => {
    const scope = visibleVesselScope([
      { orgId: A, role: "officer", vesselId: "v1" },
      { orgId: A, role: "master", vesselId: "v2" },
      { orgId: B, role: "admin", vesselId: null },
      { orgId: B, role: "officer", vesselId: "v3" },
    ]);
    expect([...(scope.get(A) ?? [])].sort()).toEqual(["v1", "v2"]);
    expect(scope.get(B)).toBeNull();
  });

  it("navigation follows the roles", () => {
    expect(navLinks([{ orgId: A, role: "surveyor", vesselId: null }]).map((l) => l.href)).toEqual(["/shared"]);
    expect(navLinks([{ orgId: A, role: "admin", vesselId: null }]).map((l) => l.href)).toEqual(["/fleet", "/vessels", "/admin", "/account"]);
    expect(navLinks([{ orgId: A, role: "officer", vesselId: "v1" }]).map((l) => l.label)).toEqual(["Tanks due", "Vessels"]);
  });
});
