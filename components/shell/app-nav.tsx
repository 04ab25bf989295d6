import Link from "next/link";
import { ROLE_LABELS, type TRole } from "@/lib/vocabulary";
import { SignOutButton } from "./sign-out-button";

export type TNavLink = { href: string; label: string };

export function AppNav({ links, name, roles }: { links: TNavLink[]; name: string; roles: TRole[] }) {
  return (
    <header className="bg-hull-900 text-white">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
        <Link href="/" className="text-lg font-bold tracking-wide">
          Tankwright
        </Link>
        <nav aria-label="Main" className="flex flex-1 flex-wrap gap-4 text-sm">
          {links.map((l) => (
            <Link key={l.href} href={l.href} className="hover:underline">
              {l.label}
            </Link>
          ))}
        </nav>
        <div className="flex items-center gap-3 text-sm">
          <span data-testid="signed-in-as">
            {name} <span className="text-white/70">· {roles.map((r) => ROLE_LABELS[r]).join(", ")}</span>
          </span>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
