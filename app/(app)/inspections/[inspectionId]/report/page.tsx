import type { Metadata } from "next";
import { PrintButton } from "@/components/report/print-button";
import { ReportView } from "@/components/report/report-view";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { loadReportDataAs } from "@/lib/report/load";

export const metadata: Metadata = { title: "Report" };

/** The report as it stands, to read on screen or print: the same content as the PDF. */
export default async function ReportPage({ params }: { params: Promise<{ inspectionId: string }> }) {
  const { inspectionId } = await params;
  const actor = await pageActor();
  const data = await pageAuthorize(() => loadReportDataAs(actor, inspectionId, { photoBytes: false }));
  return (
    <ReportView
      data={data}
      toolbar={
        <div className="tw-report-toolbar">
          <a href={`/inspections/${inspectionId}`}>Back to the inspection</a>
          <a href={`/api/v1/inspections/${inspectionId}/report`} target="_blank" rel="noreferrer">Open the PDF</a>
          <PrintButton />
        </div>
      }
    />
  );
}
