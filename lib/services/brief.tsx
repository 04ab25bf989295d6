import "server-only";
import { renderToBuffer } from "@react-pdf/renderer";
import { listOpenFindingsOfLastCountersigned } from "@/db/queries/inspections";
import { getOrganisation } from "@/db/queries/organisations";
import type { TActor } from "@/lib/auth/actor";
import { crossSectionDiagram, sideProfileDiagram } from "@/lib/diagram/tank-diagram";
import { formatDateTime } from "@/lib/format";
import { buildBrief } from "@/lib/structure/brief";
import { BriefDocument } from "@/templates/brief";
import { registerPdfFonts } from "@/templates/fonts";
import { readTank } from "./tanks";

/** The brief of a tank as data and diagrams, for the page and the PDF. */
export async function briefOf(actor: TActor, vesselId: string, tankId: string) {
  const { orgId, vessel, tank, catalogue } = await readTank(actor, vesselId, tankId);
  const [org, previous] = await Promise.all([getOrganisation({ orgId }), listOpenFindingsOfLastCountersigned({ orgId, tankId })]);
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
  return { vessel, tank, brief, profile, section };
}

export async function renderBriefPdf(actor: TActor, vesselId: string, tankId: string) {
  const { vessel, tank, brief, profile, section } = await briefOf(actor, vesselId, tankId);
  registerPdfFonts();
  const pdf = await renderToBuffer(<BriefDocument brief={brief} vesselName={vessel.name} profile={profile} section={section} />);
  return { pdf, fileName: `brief ${vessel.name} ${tank.code}.pdf`.replace(/[^\w. -]+/g, "").replace(/\s+/g, "-") };
}
