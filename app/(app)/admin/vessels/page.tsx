import type { Metadata } from "next";
import Link from "next/link";
import { VesselTable } from "@/components/fleet/vessel-table";
import { PageHeader } from "@/components/ui/page-header";
import { listVessels } from "@/db/queries/vessels";
import { authorizeOrg } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Vessels" };

export default async function AdminVesselsPage() {
  const actor = await pageActor();
  const { orgId } = await pageAuthorize(() => authorizeOrg({ actor, allow: ["admin"] }));
  const vessels = await listVessels({ orgId });
  return (
    <>
      <PageHeader
        title="Vessels"
        subtitle="The company's fleet"
        actions={
          <Link href="/admin/vessels/new" className="rounded-md bg-hull-700 px-4 py-2 text-sm font-semibold text-white hover:bg-hull-800">
            New vessel
          </Link>
        }
      />
      <VesselTable vessels={vessels} editHref={(id) => `/admin/vessels/${id}`} />
    </>
  );
}
