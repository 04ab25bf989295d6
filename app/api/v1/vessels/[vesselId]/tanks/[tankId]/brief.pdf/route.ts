import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { renderBriefPdf } from "@/lib/services/brief";

export const runtime = "nodejs";

/** The tank's pre-entry brief as a PDF to print before entering. */
export const GET = route<{ vesselId: string; tankId: string }>(async (_req, { vesselId, tankId }) => {
  const { pdf, fileName } = await renderBriefPdf(await requireActor(), vesselId, tankId);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${fileName}"`,
      "cache-control": "private, no-store",
    },
  });
});
