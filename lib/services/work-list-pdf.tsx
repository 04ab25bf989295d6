import "server-only";
import { renderToBuffer } from "@react-pdf/renderer";
import type { TActor } from "@/lib/auth/actor";
import { formatDateTime } from "@/lib/format";
import { DOCKING_STATUS_LABELS } from "@/lib/vocabulary";
import { registerPdfFonts } from "@/templates/fonts";
import { WorkListDocument } from "@/templates/work-list";
import { readWorkListAs } from "./dockings";

/** The docking's priced work list as a PDF (rendered in the request, like the brief: one page or a few). */
export async function renderWorkListPdf(actor: TActor, dockingId: string) {
  const { vessel, docking, workList } = await readWorkListAs(actor, dockingId);
  registerPdfFonts();
  const head = { vesselName: vessel.name, imoNumber: vessel.imoNumber, yard: docking.yard, place: docking.place, plannedOn: docking.plannedOn, status: DOCKING_STATUS_LABELS[docking.status], preparedAt: formatDateTime(new Date()) };
  const pdf = await renderToBuffer(<WorkListDocument list={workList} head={head} />);
  return { pdf, fileName: `work-list-${vessel.name}-${docking.plannedOn}.pdf`.replace(/[^A-Za-z0-9._-]+/g, "-") };
}
