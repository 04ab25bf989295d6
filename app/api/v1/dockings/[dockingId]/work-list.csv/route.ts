import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { workListCsvAs } from "@/lib/services/dockings";

type P = { dockingId: string };

/** The priced work list as CSV: a header row, one row per item, totals per kind and the grand total. */
export const GET = route<P>(async (_req, { dockingId }) => {
  const { csv, fileName } = await workListCsvAs(await requireActor(), dockingId);
  return new Response(csv, {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${fileName}"`, "cache-control": "no-store" },
  });
});
