import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/ui/page-header";
import { authorizeOrg } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Administration" };

export default async function AdminPage() {
  const actor = await pageActor();
  await pageAuthorize(() => authorizeOrg({ actor, allow: ["admin"] }));
  const cards = [
    { href: "/admin/users", title: "Users and roles", text: "Create accounts; give officers and masters their vessel, and the office its company-wide roles." },
    { href: "/admin/vessels", title: "Vessels", text: "Add vessels with their IMO number and frames; keep their particulars up to date." },
  ];
  return (
    <>
      <PageHeader title="Administration" subtitle="Company administration" />
      <div className="grid gap-4 sm:grid-cols-2">
        {cards.map((c) => (
          <Link key={c.href} href={c.href} className="rounded-lg border border-slate-200 bg-white p-4 hover:border-hull-600">
            <h2 className="text-lg font-semibold text-hull-900">{c.title}</h2>
            <p className="mt-1 text-sm text-slate-600">{c.text}</p>
          </Link>
        ))}
      </div>
    </>
  );
}
