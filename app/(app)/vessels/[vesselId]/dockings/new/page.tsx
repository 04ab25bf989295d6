import type { Metadata } from "next";
import { NewDockingForm } from "@/components/dockings/new-docking-form";
import { PageHeader } from "@/components/ui/page-header";
import { authorizeVessel } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { DOCKING_PLANNERS, latestDockingRatesAs } from "@/lib/services/dockings";

export const metadata: Metadata = { title: "Plan a docking" };

export default async function NewDockingPage({ params }: { params: Promise<{ vesselId: string }> }) {
  const { vesselId } = await params;
  const actor = await pageActor();
  const { vessel } = await pageAuthorize(() => authorizeVessel({ actor, vesselId, allow: DOCKING_PLANNERS }));
  const latest = await latestDockingRatesAs(actor, vesselId);
  return (
    <>
      <PageHeader title="Plan a docking" subtitle={`${vessel.name}: the work list is gathered from each tank's latest countersigned report`} />
      <NewDockingForm vesselId={vesselId} ratesFrom={latest} />
    </>
  );
}
