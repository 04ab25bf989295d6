import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { loadReportDataAs } from "@/lib/report/load";
import { renderReportPdf } from "@/lib/report/render";

export const runtime = "nodejs";

/**
 * The report as it stands now, rendered on request, for reading before it is
 * countersigned (it carries the draft mark until then). The stored signed PDF
 * is served by …/signed-report.
 */
export const GET = route<{ inspectionId: string }>(async (_req, { inspectionId }) => {
  const data = await loadReportDataAs(await requireActor(), inspectionId);
  const pdf = await renderReportPdf(data);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `inline; filename="${data.fileName}"`,
      "content-length": String(pdf.length),
      "cache-control": "private, no-store",
    },
  });
});
