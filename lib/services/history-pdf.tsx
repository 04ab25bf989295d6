import "server-only";
import { renderToBuffer } from "@react-pdf/renderer";
import type { TActor } from "@/lib/auth/actor";
import { serverEnv } from "@/lib/env";
import { formatDateTime } from "@/lib/format";
import { layoutHistoryPlots } from "@/lib/office/history-plots";
import { buildHistoryTables } from "@/lib/office/history-tables";
import { registerPdfFonts } from "@/templates/fonts";
import { TankHistoryDocument } from "@/templates/tank-history";
import { getTankHistoryAs } from "./history";

/** A tank's history as a PDF, read through the history's own authorization (the vessel's readers); rendered in the request like the brief. */
export async function renderTankHistoryPdf(actor: TActor, vesselId: string, tankId: string) {
  const history = await getTankHistoryAs(actor, vesselId, tankId);
  const appUrl = serverEnv().APP_URL.replace(/\/$/, "");
  registerPdfFonts();
  const pdf = await renderToBuffer(<TankHistoryDocument history={history} plots={layoutHistoryPlots(history)} tables={buildHistoryTables(history)} preparedAt={formatDateTime(new Date())} appUrl={appUrl} />);
  return { pdf, fileName: `history-${history.vessel.name}-${history.tank.code}.pdf`.replace(/[^A-Za-z0-9._-]+/g, "-") };
}
