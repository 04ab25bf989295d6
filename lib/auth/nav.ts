import type { TMembershipLike } from "./roles";

/** The sections a user's roles open; pages check access again themselves. */
export function navLinks(memberships: readonly TMembershipLike[]) {
  const roles = new Set(memberships.map((m) => m.role));
  const links: { href: string; label: string }[] = [];
  if (roles.has("superintendent") || roles.has("admin")) links.push({ href: "/fleet", label: "Fleet" });
  // The ship sees its own tanks' ratings and due dates on the same page.
  else if (roles.has("officer") || roles.has("master")) links.push({ href: "/fleet", label: "Tanks due" });
  if (roles.has("officer") || roles.has("master") || roles.has("superintendent") || roles.has("admin")) {
    links.push({ href: "/vessels", label: "Vessels" });
  }
  if (roles.has("surveyor")) links.push({ href: "/shared", label: "Shared reports" });
  if (roles.has("admin")) links.push({ href: "/admin", label: "Administration" });
  if (roles.has("superintendent") || roles.has("admin")) links.push({ href: "/account", label: "API tokens" });
  return links;
}
