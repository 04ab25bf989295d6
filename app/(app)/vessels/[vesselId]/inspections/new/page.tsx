import type { Metadata } from "next";
import { startInspectionAction } from "@/app/(app)/vessels/actions";
import { StartInspectionForm } from "@/components/inspections/start-inspection-form";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { listTanks } from "@/db/queries/tanks";
import { authorizeVessel } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { formatDate } from "@/lib/format";
import { ENTRY_CAUTION } from "@/lib/safety/entry";
import { INSPECTORS } from "@/lib/services/inspections";

export const metadata: Metadata = { title: "Start an inspection" };

export default async function StartInspectionPage({ params, searchParams }: { params: Promise<{ vesselId: string }>; searchParams: Promise<{ tank?: string }> }) {
  const [{ vesselId }, { tank }] = await Promise.all([params, searchParams]);
  const actor = await pageActor();
  const { vessel, orgId } = await pageAuthorize(() => authorizeVessel({ actor, vesselId, allow: INSPECTORS }));
  const tanks = await listTanks({ orgId, vesselId });
  return (
    <>
      <PageHeader title="Start an inspection" subtitle={vessel.name} />
      <div className="space-y-4">
        <Notice tone="caution" title="Enclosed space">{ENTRY_CAUTION}</Notice>
        <div className="rounded-lg border border-slate-200 bg-white p-4">
          <StartInspectionForm action={startInspectionAction} vesselId={vesselId} tanks={tanks.map((t) => ({ id: t.id, code: t.code, name: t.name }))} tankId={tank} today={formatDate(new Date(), vessel.utcOffsetMinutes ?? 0)} />
        </div>
      </div>
    </>
  );
}
