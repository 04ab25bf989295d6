import type { Metadata } from "next";
import { VesselForm } from "@/components/admin/vessel-form";
import { PageHeader } from "@/components/ui/page-header";
import { authorizeVessel } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { updateVesselAction } from "../../actions";

export const metadata: Metadata = { title: "Edit vessel" };

export default async function EditVesselPage({ params }: { params: Promise<{ vesselId: string }> }) {
  const { vesselId } = await params;
  const actor = await pageActor();
  const { vessel } = await pageAuthorize(() => authorizeVessel({ actor, vesselId, allow: ["admin"] }));
  const { createdAt: _c, updatedAt: _u, orgId: _o, ...values } = vessel;
  return (
    <>
      <PageHeader title={`Edit ${vessel.name}`} subtitle={`IMO ${vessel.imoNumber}`} />
      <div className="rounded-lg border border-slate-200 bg-white p-4">
        <VesselForm action={updateVesselAction} vessel={values} vesselId={vessel.id} />
      </div>
    </>
  );
}
