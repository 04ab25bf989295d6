import type { Metadata } from "next";
import { updateTankAction } from "@/app/(app)/vessels/actions";
import { TankForm } from "@/components/structure-map/tank-form";
import { PageHeader } from "@/components/ui/page-header";
import { authorizeVessel } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { readTank, STRUCTURE_EDITORS } from "@/lib/services/tanks";

export const metadata: Metadata = { title: "Edit tank" };

export default async function EditTankPage({ params }: { params: Promise<{ vesselId: string; tankId: string }> }) {
  const { vesselId, tankId } = await params;
  const actor = await pageActor();
  await pageAuthorize(() => authorizeVessel({ actor, vesselId, allow: STRUCTURE_EDITORS }));
  const { vessel, tank } = await pageAuthorize(() => readTank(actor, vesselId, tankId));
  const { createdAt: _c, updatedAt: _u, orgId: _o, ...values } = tank;
  return (
    <>
      <PageHeader title={`Edit ${tank.code}`} subtitle={vessel.name} />
      <div className="rounded-lg border border-slate-200 bg-white p-4">
        <TankForm action={updateTankAction} vessel={{ id: vessel.id, frameFirst: vessel.frameFirst, frameLast: vessel.frameLast }} tank={values} tankId={tank.id} />
      </div>
    </>
  );
}
