import "server-only";
import { renderToBuffer } from "@react-pdf/renderer";
import { listDrawings } from "@/db/queries/drawings";
import { listOpenFindingsOfLastCountersigned } from "@/db/queries/inspections";
import { getOrganisation } from "@/db/queries/organisations";
import type { TActor } from "@/lib/auth/actor";
import { crossSectionDiagram, sideProfileDiagram } from "@/lib/diagram/tank-diagram";
import { serverEnv } from "@/lib/env";
import { formatDateTime } from "@/lib/format";
import { DRAWING_KIND_LABELS } from "@/lib/vocabulary";
import { buildBrief } from "@/lib/structure/brief";
import { BriefDocument } from "@/templates/brief";
import { registerPdfFonts } from "@/templates/fonts";
import { drawingFileUrl } from "./drawings";
import { readTank } from "./tanks";

/** The brief of a tank as data and diagrams, for the page and the PDF. */
export async function briefOf(actor: TActor, vesselId: string, tankId: string) {
  const { orgId, vessel, tank, catalogue } = await readTank(actor, vesselId, tankId);
  const [org, previous, drawingRows] = await Promise.all([getOrganisation({ orgId }), listOpenFindingsOfLastCountersigned({ orgId, tankId }), listDrawings({ orgId, vesselId })]);
  const drawings = drawingRows.map((d) => ({ title: d.title, kind: DRAWING_KIND_LABELS[d.kind], url: drawingFileUrl(vesselId, d.id) }));
  const brief = buildBrief({
    company: org?.name ?? "",
    vessel,
    tank,
    catalogue,
    previous: previous.inspection ? { inspectedOn: previous.inspection.inspectedOn, revision: previous.inspection.revision, findings: previous.findings } : null,
    preparedAt: formatDateTime(new Date(), vessel.utcOffsetMinutes),
  });
  const profile = sideProfileDiagram({
    vessel,
    tank,
    landmarks: brief.landmarks,
    marks: previous.findings.map((f) => ({ frameFrom: f.frameFrom, frameTo: f.frameTo, label: String(f.number) })),
  });
  const section = crossSectionDiagram({ kind: tank.kind, side: tank.side });
  return { vessel, tank, brief, profile, section, drawings };
}

export async function renderBriefPdf(actor: TActor, vesselId: string, tankId: string) {
  const { vessel, tank, brief, profile, section, drawings } = await briefOf(actor, vesselId, tankId);
  const appUrl = serverEnv().APP_URL.replace(/\/$/, "");
  registerPdfFonts();
  const pdf = await renderToBuffer(<BriefDocument brief={brief} vesselName={vessel.name} profile={profile} section={section} drawings={drawings.map((d) => ({ ...d, url: appUrl + d.url }))} />);
  return { pdf, fileName: `brief ${vessel.name} ${tank.code}.pdf`.replace(/[^\w. -]+/g, "").replace(/\s+/g, "-") };
}
