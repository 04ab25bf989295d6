// Pure rules of who may do what; no I/O, so they are unit-tested directly.
import type { TRole } from "@/lib/vocabulary";

export type TMembershipLike = { orgId: string; role: TRole; vesselId: string | null };

/** The roles that apply to one vessel: its own officer/master roles and company-wide roles. */
export function rolesOnVessel(memberships: readonly TMembershipLike[], vessel: { id: string; orgId: string }): TRole[] {
  const roles = new Set<TRole>();
  for (const m of memberships) {
    if (m.orgId !== vessel.orgId) continue;
    if ((m.role === "officer" || m.role === "master") && m.vesselId === vessel.id) roles.add(m.role);
    if (m.role === "superintendent" || m.role === "admin") roles.add(m.role);
  }
  return [...roles];
}

/** Company-wide roles a user holds in a company. */
export function rolesInOrg(memberships: readonly TMembershipLike[], orgId: string): TRole[] {
  return [...new Set(memberships.filter((m) => m.orgId === orgId).map((m) => m.role))];
}

/** Where each role lands after sign-in; a user with several roles lands on the first that applies. */
export function homePath(memberships: readonly TMembershipLike[]): string {
  const has = (role: TRole) => memberships.find((m) => m.role === role);
  if (has("superintendent")) return "/fleet";
  if (has("admin")) return "/admin";
  const shipRole = has("master") ?? has("officer");
  if (shipRole?.vesselId) return `/vessels/${shipRole.vesselId}`;
  if (has("surveyor")) return "/shared";
  return "/no-role";
}

/** The vessel ids a user may open, per company: null means every vessel of that company. */
export function visibleVesselScope(memberships: readonly TMembershipLike[]): Map<string, Set<string> | null> {
  const scope = new Map<string, Set<string> | null>();
  for (const m of memberships) {
    if (m.role === "superintendent" || m.role === "admin") scope.set(m.orgId, null);
  }
  for (const m of memberships) {
    if ((m.role === "officer" || m.role === "master") && m.vesselId && scope.get(m.orgId) !== null) {
      const set = scope.get(m.orgId) ?? new Set<string>();
      set.add(m.vesselId);
      scope.set(m.orgId, set);
    }
  }
  return scope;
}
