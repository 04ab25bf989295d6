// A tank's history as a PDF: every inspection with its signed PDF's link and
// fingerprint, the three plots drawn from the page's own layout
// (lib/office/history-plots.ts) with the page's data tables under them
// (lib/office/history-tables.ts), the anode projection and the recurring
// findings. Every figure comes from lib/services/history.ts; nothing is computed here.
import { Document, Link, Page, StyleSheet, Text, View } from "@react-pdf/renderer";
import type { THistoryPlots } from "@/lib/office/history-plots";
import type { THistoryTable, THistoryTables } from "@/lib/office/history-tables";
import type { TTankHistory } from "@/lib/services/history";
import { formatFrames } from "@/lib/structure/frames";
import { FINDING_TYPE_LABELS, INSPECTION_STATUS_LABELS, MEMBER_KIND_LABELS, PLATING_REGION_LABELS } from "@/lib/vocabulary";
import { PDF_FONT_FAMILY } from "./fonts";
import { DataTablePdf } from "./parts/data-table-pdf";
import { LineChartPdf } from "./parts/line-chart-pdf";

const NAVY = "#12253a";
const CHART_WIDTH = 523;
const s = StyleSheet.create({
  // No lineHeight on the page: there it leaves the page-number text empty.
  page: { fontFamily: PDF_FONT_FAMILY, fontSize: 8.5, paddingTop: 36, paddingBottom: 44, paddingHorizontal: 36, color: "#1e293b" },
  footerLeft: { position: "absolute", bottom: 18, left: 36, fontSize: 7.5, color: "#475569" },
  footerRight: { position: "absolute", bottom: 18, right: 36, width: 120, textAlign: "right", fontSize: 7.5, color: "#475569" },
  h1: { fontSize: 15, fontWeight: 700, color: NAVY, marginBottom: 4 },
  h2: { fontSize: 11, fontWeight: 700, color: NAVY, marginTop: 10, marginBottom: 4, borderBottomWidth: 0.75, borderBottomColor: "#94a3b8", paddingBottom: 2 },
  meta: { color: "#475569", marginBottom: 2 },
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: "#cbd5e1", paddingVertical: 2 },
  head: { flexDirection: "row", borderBottomWidth: 1, borderBottomColor: "#334155", paddingVertical: 2, fontWeight: 700 },
  date: { width: 58 },
  rev: { width: 30 },
  status: { width: 112 },
  rating: { width: 50 },
  report: { flex: 1 },
  no: { width: 24 },
  finding: { flex: 1, paddingRight: 4 },
  where: { width: 130, paddingRight: 4 },
  before: { width: 90 },
  sha: { fontSize: 6.5, color: "#475569" },
  link: { color: "#244560" },
  note: { marginTop: 2 },
  small: { color: "#475569" },
});

export function TankHistoryDocument({ history: h, plots, tables, preparedAt, appUrl }: { history: TTankHistory; plots: THistoryPlots; tables: THistoryTables; preparedAt: string; appUrl: string }) {
  const title = `Tank history: ${h.tank.code}`;
  const recurring = h.findings.filter((f) => f.recurring);
  const projection = h.anodes.projection;
  const plot = (heading: string, chart: THistoryPlots[keyof THistoryPlots], table: THistoryTable, widths: { first: number; column: number }, note?: string) => (
    <>
      <View wrap={false}>
        <Text style={s.h2}>{heading}</Text>
        {chart.empty ? <Text style={s.small}>No signed measurements yet.</Text> : <LineChartPdf chart={chart} width={CHART_WIDTH} />}
        {note ? <Text style={s.note}>{note}</Text> : null}
      </View>
      {table.rows.length ? <DataTablePdf table={table} firstWidth={widths.first} columnWidth={widths.column} /> : null}
    </>
  );
  // The coating table's date columns share what the area column leaves of the chart's width.
  const coatingDates = Math.max(1, tables.coating.head.length - 1);
  const coatingWidths = { first: 130, column: Math.min(80, (CHART_WIDTH - 130) / coatingDates) };
  const narrow = { first: 70, column: 80 };
  return (
    <Document title={`${title} ${h.vessel.name}`} author="Tankwright" subject="Tank history">
      <Page size="A4" style={s.page} wrap>
        <Text style={s.footerLeft} fixed>Tankwright · tank history · {h.vessel.name} · {h.tank.code}</Text>
        <Text style={s.footerRight} fixed render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        <Text style={s.h1}>{title} · {h.tank.name}</Text>
        <Text style={s.meta}>{h.vessel.name} · prepared {preparedAt}</Text>
        <Text style={s.meta}>Only countersigned and superseded inspections are plotted: their measurements are signed. A signed PDF&apos;s fingerprint (SHA-256) can be checked at {appUrl}/verify.</Text>

        <Text style={s.h2}>Inspections</Text>
        <View style={s.head}>
          <Text style={s.date}>Date</Text>
          <Text style={s.rev}>Rev.</Text>
          <Text style={s.status}>Status</Text>
          <Text style={s.rating}>Rating</Text>
          <Text style={s.report}>Signed PDF and its fingerprint</Text>
        </View>
        {h.inspections.map((i) => (
          <View key={i.id} style={s.row} wrap={false}>
            <Text style={s.date}>{i.inspectedOn}</Text>
            <Text style={s.rev}>{i.revision}</Text>
            <Text style={s.status}>{INSPECTION_STATUS_LABELS[i.status]}{i.plotted ? "" : " (not plotted)"}</Text>
            <Text style={s.rating}>{i.rating ?? (i.plotted ? "Not rated" : "—")}</Text>
            <View style={s.report}>
              {i.signedReportUrl ? <Link src={appUrl + i.signedReportUrl} style={s.link}>Signed PDF</Link> : <Text style={s.small}>None rendered</Text>}
              {i.reportSha256 ? <Text style={s.sha}>{i.reportSha256}</Text> : null}
            </View>
          </View>
        ))}
        {h.inspections.length ? null : <Text style={s.small}>This tank has not been inspected yet.</Text>}

        {plot("Coating breakdown per area", plots.coating, tables.coating, coatingWidths)}
        {plot(
          "Mean anode wastage",
          plots.anodes,
          tables.anodes,
          narrow,
          projection
            ? `At ${projection.ratePctPerYear.toFixed(1)} % a year (least-squares line through the signed inspections), the mean wastage reaches the company's renewal threshold of ${h.anodes.thresholdPct.toFixed(0)} % on ${projection.date}.`
            : "No projection: it needs two signed inspections on different dates with growing wastage.",
        )}
        {plot("Sediment volume", plots.sediment, tables.sediment, narrow)}

        {/* The heading, its explanation and the table's head stay with the first row. */}
        <Text style={s.h2} minPresenceAhead={80}>Findings found again</Text>
        <Text style={[s.small, { marginBottom: 3 }]} minPresenceAhead={50}>A finding is recurring when a later signed inspection finds the same type of defect on the same member (kind, number, plating region) at overlapping frames.</Text>
        {recurring.length ? (
          <>
            <View style={s.head} minPresenceAhead={30}>
              <Text style={s.date}>Date</Text>
              <Text style={s.no}>No.</Text>
              <Text style={s.finding}>Finding</Text>
              <Text style={s.where}>Where</Text>
              <Text style={s.before}>Found before</Text>
            </View>
            {recurring.map((f) => (
              <View key={f.id} style={s.row} wrap={false}>
                <Text style={s.date}>{f.inspectedOn}</Text>
                <Text style={s.no}>{f.number}</Text>
                <Text style={s.finding}>{FINDING_TYPE_LABELS[f.type]}: {f.description}</Text>
                <Text style={s.where}>
                  {MEMBER_KIND_LABELS[f.memberKind]}{f.memberNumber != null ? ` ${f.memberNumber}` : ""}{f.platingRegion ? ` (${PLATING_REGION_LABELS[f.platingRegion]})` : ""}, {formatFrames(f.frameFrom, f.frameTo)}
                </Text>
                <Text style={s.before}>No. {f.recurring!.number} on {f.recurring!.inspectedOn}</Text>
              </View>
            ))}
          </>
        ) : (
          <Text>None.</Text>
        )}
      </Page>
    </Document>
  );
}
