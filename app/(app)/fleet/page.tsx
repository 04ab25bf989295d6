import type { Metadata } from "next";
import { VesselTable } from "@/components/fleet/vessel-table";
import { PageHeader } from "@/components/ui/page-header";
import { Notice } from "@/components/ui/notice";
import { authorizeOrg } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { listVessels } from "@/db/queries/vessels";

export const metadata: Metadata = { title: "Fleet" };

export default async function FleetPage() {
  const actor = await pageActor();
  const { orgId } = await pageAuthorize(() => authorizeOrg({ actor, allow: ["superintendent", "admin"] }));
  const vessels = await listVessels({ orgId });
  return (
    <>
      <PageHeader title="Fleet" subtitle={`${vessels.length} vessels · ${vessels.reduce((n, v) => n + v.tankCount, 0)} ballast tanks on the structure maps`} />
      <div className="space-y-4">
        <VesselTable vessels={vessels} />
        <Notice>Ratings, due dates and the docking work list appear here once inspections are countersigned.</Notice>
      </div>
    </>
  );
}
