import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { renderWorkListPdf } from "@/lib/services/work-list-pdf";

export const runtime = "nodejs";

/** The priced work list as a PDF: items, totals per kind and the grand total. */
export const GET = route<{ dockingId: string }>(async (_req, { dockingId }) => {
  const { pdf, fileName } = await renderWorkListPdf(await requireActor(), dockingId);
  return new Response(new Uint8Array(pdf), {
    headers: { "content-type": "application/pdf", "content-disposition": `attachment; filename="${fileName}"`, "cache-control": "private, no-store" },
  });
});
