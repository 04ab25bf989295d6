import type { Metadata } from "next";
import Link from "next/link";
import { RatingMark } from "@/components/ui/rating-mark";
import { HistoryPlot } from "@/components/history/history-plot";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { Cell, Table } from "@/components/ui/table";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { layoutHistoryPlots } from "@/lib/office/history-plots";
import { buildHistoryTables } from "@/lib/office/history-tables";
import { getTankHistoryAs } from "@/lib/services/history";
import { formatFrames } from "@/lib/structure/frames";
import { FINDING_TYPE_LABELS, INSPECTION_STATUS_LABELS, MEMBER_KIND_LABELS, PLATING_REGION_LABELS } from "@/lib/vocabulary";

export const metadata: Metadata = { title: "Tank history" };

const fmt = (n: number, digits = 1) => n.toFixed(digits);

export default async function TankHistoryPage({ params }: { params: Promise<{ vesselId: string; tankId: string }> }) {
  const { vesselId, tankId } = await params;
  const actor = await pageActor();
  const h = await pageAuthorize(() => getTankHistoryAs(actor, vesselId, tankId));
  const plots = layoutHistoryPlots(h);
  const tables = buildHistoryTables(h);
  const projection = h.anodes.projection;
  const recurring = h.findings.filter((f) => f.recurring);

  return (
    <>
      <PageHeader
        title={`${h.tank.code} history`}
        subtitle={
          <>
            {h.tank.name} · <Link href={`/vessels/${vesselId}/tanks/${tankId}`} className="text-hull-700 underline">Tank</Link> ·{" "}
            <Link href={`/vessels/${vesselId}`} className="text-hull-700 underline">{h.vessel.name}</Link>
          </>
        }
        actions={<a href={`/api/v1/vessels/${vesselId}/tanks/${tankId}/history.pdf`} className="rounded-md bg-hull-700 px-3 py-2 text-sm font-semibold text-white hover:bg-hull-800" download>Download history PDF</a>}
      />
      <div className="space-y-6">
        <section aria-labelledby="inspections">
          <h2 id="inspections" className="mb-2 text-lg font-semibold text-hull-900">Inspections</h2>
          {h.inspections.length ? (
            <Table head={["Date", "Revision", "Status", "Rating", "Report"]} caption="Inspections of the tank">
              {h.inspections.map((i) => (
                <tr key={i.id} data-inspection={i.id}>
                  <Cell>{i.inspectedOn}</Cell>
                  <Cell>{i.revision}</Cell>
                  <Cell>{INSPECTION_STATUS_LABELS[i.status]}{i.plotted ? "" : " (not plotted)"}</Cell>
                  <Cell>{i.rating ? <RatingMark kind={i.rating} /> : i.plotted ? <RatingMark kind="unrated" /> : "—"}</Cell>
                  <Cell>
                    <span className="flex flex-wrap gap-3">
                      <Link href={i.pageUrl} className="text-hull-700 underline">Open</Link>
                      {i.signedReportUrl ? <a href={i.signedReportUrl} className="text-hull-700 underline">Signed PDF</a> : null}
                    </span>
                  </Cell>
                </tr>
              ))}
            </Table>
          ) : (
            <Notice>This tank has not been inspected yet.</Notice>
          )}
          <p className="mt-2 text-sm text-slate-600">Only countersigned and superseded inspections are plotted: their measurements are signed.</p>
        </section>

        <HistoryPlot
          id="coating"
          title="Coating breakdown per area"
          chart={plots.coating}
          table={tables.coating}
        />
        <HistoryPlot
          id="anodes"
          title="Mean anode wastage"
          chart={plots.anodes}
          note={
            projection ? (
              <p data-projection={projection.date}>
                At {fmt(projection.ratePctPerYear)} % a year (least-squares line through the signed inspections), the mean wastage reaches the company&apos;s renewal threshold of {fmt(h.anodes.thresholdPct, 0)} % on <strong>{projection.date}</strong>.
              </p>
            ) : (
              <p>No projection: it needs two signed inspections on different dates with growing wastage.</p>
            )
          }
          table={tables.anodes}
        />
        <HistoryPlot
          id="sediment"
          title="Sediment volume"
          chart={plots.sediment}
          table={tables.sediment}
        />

        <section aria-labelledby="recurring" className="rounded-lg border border-slate-200 bg-white p-4">
          <h2 id="recurring" className="mb-2 text-lg font-semibold text-hull-900">Findings found again</h2>
          <p className="mb-2 text-sm text-slate-600">A finding is recurring when a later signed inspection finds the same type of defect on the same member (kind, number, plating region) at overlapping frames.</p>
          {recurring.length ? (
            <Table head={["Date", "No.", "Finding", "Where", "Found before"]} caption="Recurring findings">
              {recurring.map((f) => (
                <tr key={f.id} data-recurring={f.id}>
                  <Cell className="whitespace-nowrap">{f.inspectedOn}</Cell>
                  <Cell>{f.number}</Cell>
                  <Cell><span className="mr-1 rounded border border-slate-700 px-1 text-xs font-bold">RECURRING</span>{FINDING_TYPE_LABELS[f.type]}: {f.description}</Cell>
                  <Cell>{MEMBER_KIND_LABELS[f.memberKind]}{f.memberNumber != null ? ` ${f.memberNumber}` : ""}{f.platingRegion ? ` (${PLATING_REGION_LABELS[f.platingRegion]})` : ""}, {formatFrames(f.frameFrom, f.frameTo)}</Cell>
                  <Cell className="whitespace-nowrap">No. {f.recurring!.number} on {f.recurring!.inspectedOn}</Cell>
                </tr>
              ))}
            </Table>
          ) : (
            <p className="text-sm">None.</p>
          )}
        </section>
      </div>
    </>
  );
}
