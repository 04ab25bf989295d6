import type { Metadata } from "next";
import { InspectionWizard } from "@/components/inspection-wizard/wizard";
import { CommentsPanel } from "@/components/signing/comments-panel";
import { SigningPanel } from "@/components/signing/signing-panel";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { STEPS, type TStep } from "@/lib/inspection/blockers";
import { formatFrames } from "@/lib/structure/frames";
import { FINDING_TYPE_LABELS } from "@/lib/vocabulary";
import { canInspect, readInspectionView } from "@/lib/services/inspections";
import { readSigningStateAs } from "@/lib/services/signing";

export const metadata: Metadata = { title: "Inspection" };

export default async function InspectionPage({ params, searchParams }: { params: Promise<{ inspectionId: string }>; searchParams: Promise<{ step?: string }> }) {
  const [{ inspectionId }, { step }] = await Promise.all([params, searchParams]);
  const actor = await pageActor();
  const [view, signing] = await pageAuthorize(() => Promise.all([readInspectionView(actor, inspectionId), readSigningStateAs(actor, inspectionId)]));
  const first: TStep = STEPS.some((s) => s.id === step) ? (step as TStep) : view.inspection.status === "draft" ? "entry" : "review";
  // Both cross to the browser as JSON, as the API sends them.
  return (
    <div className="space-y-4">
      <SigningPanel
        inspectionId={inspectionId} status={view.inspection.status} revision={view.inspection.revision}
        state={JSON.parse(JSON.stringify(signing))} actor={{ name: actor.name }}
      />
      <InspectionWizard key={`${view.inspection.status}-${view.inspection.revision}`} initial={JSON.parse(JSON.stringify(view))} step={first} signerName={canInspect(signing.roles) ? actor.name : undefined} />
      <CommentsPanel inspectionId={inspectionId} findings={view.findings.map((f) => ({ id: f.id, number: f.number, label: `${FINDING_TYPE_LABELS[f.type]}, ${formatFrames(f.frameFrom, f.frameTo)}` }))} />
    </div>
  );
}
