import type { Metadata } from "next";
import { createTankAction } from "@/app/(app)/vessels/actions";
import { TankForm } from "@/components/structure-map/tank-form";
import { PageHeader } from "@/components/ui/page-header";
import { authorizeVessel } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { STRUCTURE_EDITORS } from "@/lib/services/tanks";

export const metadata: Metadata = { title: "New tank" };

export default async function NewTankPage({ params }: { params: Promise<{ vesselId: string }> }) {
  const { vesselId } = await params;
  const actor = await pageActor();
  const { vessel } = await pageAuthorize(() => authorizeVessel({ actor, vesselId, allow: STRUCTURE_EDITORS }));
  return (
    <>
      <PageHeader title="New tank" subtitle={`${vessel.name} · frames ${vessel.frameFirst}–${vessel.frameLast}`} />
      <div className="rounded-lg border border-slate-200 bg-white p-4">
        <TankForm action={createTankAction} vessel={{ id: vessel.id, frameFirst: vessel.frameFirst, frameLast: vessel.frameLast }} />
      </div>
    </>
  );
}
