import type { Metadata } from "next";
import Link from "next/link";
import { TankList } from "@/components/structure-map/tank-list";
import { VesselParticulars } from "@/components/vessels/vessel-particulars";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { InspectionList } from "@/components/inspections/inspection-list";
import { DrawingList } from "@/components/vessels/drawing-list";
import { RecipientList } from "@/components/vessels/recipient-list";
import { listRecipientsAs } from "@/lib/services/recipients";
import { listDrawingsAs } from "@/lib/services/drawings";
import { canPlanDockings } from "@/lib/services/dockings";
import { canInspect, listInspectionsAs } from "@/lib/services/inspections";
import { canEditStructure, readVesselTanks } from "@/lib/services/tanks";
import { VESSEL_TYPE_LABELS } from "@/lib/vocabulary";

export const metadata: Metadata = { title: "Vessel" };

const linkButton = "rounded-md border border-slate-300 bg-white px-3 py-2 text-sm font-semibold text-slate-800 hover:bg-slate-50";

export default async function VesselPage({ params }: { params: Promise<{ vesselId: string }> }) {
  const { vesselId } = await params;
  const actor = await pageActor();
  const { vessel, tanks, roles } = await pageAuthorize(() => readVesselTanks(actor, vesselId));
  const canEdit = canEditStructure(roles);
  const mayInspect = canInspect(roles);
  const [inspections, drawings] = await Promise.all([listInspectionsAs(actor, vesselId), listDrawingsAs(actor, vesselId)]);
  return (
    <>
      <PageHeader
        title={vessel.name}
        subtitle={`IMO ${vessel.imoNumber} · ${VESSEL_TYPE_LABELS[vessel.vesselType]}`}
        actions={
          canEdit ? (
            <>
              {mayInspect ? <Link href={`/vessels/${vesselId}/inspections/new`} className="rounded-md bg-hull-700 px-3 py-2 text-sm font-semibold text-white hover:bg-hull-800">Start an inspection</Link> : null}
              {canPlanDockings(roles) ? <Link href={`/vessels/${vesselId}/dockings`} className={linkButton}>Dockings</Link> : null}
              <Link href={`/vessels/${vesselId}/edit`} className={linkButton}>Edit particulars</Link>
              <Link href={`/vessels/${vesselId}/tanks/import`} className={linkButton}>Import tanks (CSV)</Link>
              <Link href={`/vessels/${vesselId}/tanks/new`} className="rounded-md bg-hull-700 px-3 py-2 text-sm font-semibold text-white hover:bg-hull-800">New tank</Link>
            </>
          ) : null
        }
      />
      <div className="grid gap-6 lg:grid-cols-[1fr_2fr]">
        <VesselParticulars vessel={vessel} />
        <section aria-labelledby="tanks-heading">
          <h2 id="tanks-heading" className="mb-2 text-lg font-semibold text-hull-900">Structure map: ballast tanks ({tanks.length})</h2>
          {tanks.length ? <TankList vesselId={vesselId} tanks={tanks} /> : <Notice>No tanks on this vessel&apos;s structure map yet.</Notice>}
        </section>
      </div>
      <section aria-labelledby="inspections-heading" className="mt-6">
        <h2 id="inspections-heading" className="mb-2 text-lg font-semibold text-hull-900">Inspections ({inspections.length})</h2>
        {inspections.length ? <InspectionList inspections={inspections} /> : <Notice>No inspection recorded yet.</Notice>}
      </section>
      <section aria-labelledby="drawings-heading" className="mt-6">
        <h2 id="drawings-heading" className="mb-2 text-lg font-semibold text-hull-900">Drawings ({drawings.length})</h2>
        <DrawingList vesselId={vesselId} canEdit={canEdit} drawings={drawings.map((d) => ({ ...d, createdAt: d.createdAt.toISOString() }))} />
      </section>
      <RecipientList vesselId={vesselId} {...await listRecipientsAs(actor, vesselId)} />
    </>
  );
}
