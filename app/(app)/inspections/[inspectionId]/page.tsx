import type { Metadata } from "next";
import { InspectionWizard } from "@/components/inspection-wizard/wizard";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { STEPS, type TStep } from "@/lib/inspection/blockers";
import { readInspectionView } from "@/lib/services/inspections";

export const metadata: Metadata = { title: "Inspection" };

export default async function InspectionPage({ params, searchParams }: { params: Promise<{ inspectionId: string }>; searchParams: Promise<{ step?: string }> }) {
  const [{ inspectionId }, { step }] = await Promise.all([params, searchParams]);
  const actor = await pageActor();
  const view = await pageAuthorize(() => readInspectionView(actor, inspectionId));
  const first: TStep = STEPS.some((s) => s.id === step) ? (step as TStep) : "entry";
  // The view crosses to the browser as JSON, as the API sends it.
  return <InspectionWizard initial={JSON.parse(JSON.stringify(view))} step={first} />;
}
