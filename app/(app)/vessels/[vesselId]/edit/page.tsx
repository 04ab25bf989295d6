import type { Metadata } from "next";
import { updateVesselAction } from "@/app/(app)/admin/actions";
import { VesselForm } from "@/components/admin/vessel-form";
import { PageHeader } from "@/components/ui/page-header";
import { authorizeVessel } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { VESSEL_EDITORS } from "@/lib/services/vessels";

export const metadata: Metadata = { title: "Vessel particulars" };

export default async function EditParticularsPage({ params }: { params: Promise<{ vesselId: string }> }) {
  const { vesselId } = await params;
  const actor = await pageActor();
  const { vessel } = await pageAuthorize(() => authorizeVessel({ actor, vesselId, allow: VESSEL_EDITORS }));
  const { createdAt: _c, updatedAt: _u, orgId: _o, ...values } = vessel;
  return (
    <>
      <PageHeader title={`${vessel.name}: particulars`} subtitle="Frames of the midship region, the engine-room forward bulkhead and the collision bulkhead decide each tank's areas of concern." />
      <div className="rounded-lg border border-slate-200 bg-white p-4">
        <VesselForm action={updateVesselAction} vessel={values} vesselId={vessel.id} />
      </div>
    </>
  );
}
