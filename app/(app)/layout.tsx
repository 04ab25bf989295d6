import { AppNav } from "@/components/shell/app-nav";
import { navLinks } from "@/lib/auth/nav";
import { pageActor } from "@/lib/auth/page";

export const dynamic = "force-dynamic";

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const actor = await pageActor();
  const roles = [...new Set(actor.memberships.map((m) => m.role))];
  return (
    <>
      <AppNav links={navLinks(actor.memberships)} name={actor.name} roles={roles} />
      <main className="mx-auto max-w-6xl px-4 py-6">{children}</main>
    </>
  );
}
