import type { Metadata } from "next";
import { TankTable } from "@/components/vessels/tank-table";
import { VesselParticulars } from "@/components/vessels/vessel-particulars";
import { PageHeader } from "@/components/ui/page-header";
import { listTanks } from "@/db/queries/tanks";
import { authorizeVessel } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { VESSEL_READERS } from "@/lib/services/vessels";
import { VESSEL_TYPE_LABELS } from "@/lib/vocabulary";

export const metadata: Metadata = { title: "Vessel" };

export default async function VesselPage({ params }: { params: Promise<{ vesselId: string }> }) {
  const { vesselId } = await params;
  const actor = await pageActor();
  const { vessel, orgId } = await pageAuthorize(() => authorizeVessel({ actor, vesselId, allow: VESSEL_READERS }));
  const tanks = await listTanks({ orgId, vesselId });
  return (
    <>
      <PageHeader title={vessel.name} subtitle={`IMO ${vessel.imoNumber} · ${VESSEL_TYPE_LABELS[vessel.vesselType]}`} />
      <div className="grid gap-6 lg:grid-cols-[1fr_2fr]">
        <VesselParticulars vessel={vessel} />
        <section aria-labelledby="tanks-heading">
          <h2 id="tanks-heading" className="mb-2 text-lg font-semibold text-hull-900">
            Ballast tanks ({tanks.length})
          </h2>
          <TankTable tanks={tanks} />
        </section>
      </div>
    </>
  );
}
