import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { renderTankHistoryPdf } from "@/lib/services/history-pdf";

export const runtime = "nodejs";

/** The tank's history as a PDF: inspections with their signed PDFs' fingerprints, the three plots, recurring findings. */
export const GET = route<{ vesselId: string; tankId: string }>(async (_req, { vesselId, tankId }) => {
  const { pdf, fileName } = await renderTankHistoryPdf(await requireActor(), vesselId, tankId);
  return new Response(new Uint8Array(pdf), {
    headers: { "content-type": "application/pdf", "content-disposition": `attachment; filename="${fileName}"`, "cache-control": "private, no-store" },
  });
});
