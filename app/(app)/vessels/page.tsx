import type { Metadata } from "next";
import { VesselTable } from "@/components/fleet/vessel-table";
import { PageHeader } from "@/components/ui/page-header";
import { Notice } from "@/components/ui/notice";
import { pageActor } from "@/lib/auth/page";
import { listVisibleVessels } from "@/lib/services/vessels";

export const metadata: Metadata = { title: "Vessels" };

export default async function VesselsPage() {
  const actor = await pageActor();
  const vessels = await listVisibleVessels(actor);
  return (
    <>
      <PageHeader title="Vessels" subtitle="The vessels your roles give you access to" />
      {vessels.length ? <VesselTable vessels={vessels} /> : <Notice>{actor.memberships.every((m) => m.role === "surveyor") ? "As a class surveyor you see the reports shared with you, under Shared reports." : "No vessel is assigned to you yet. Ask the company administrator."}</Notice>}
    </>
  );
}
