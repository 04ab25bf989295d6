// The inspection report as a PDF: cover with summary, tank diagrams with every
// finding at its frames, entry record, findings, coating, anodes, sediment,
// areas not inspected, remarks, signatures, then the photo pages. Every page
// carries vessel, tank, revision and "Page n of m"; a draft carries its mark.
// Data comes laid out from lib/report: nothing is computed here.
import type { ReactNode } from "react";
import { Document, Image, Page, StyleSheet, Text, View } from "@react-pdf/renderer";
import type { TKeyValue, TReportData, TReportPhoto, TReportSignature } from "@/lib/report/types";
import { PDF_FONT_FAMILY } from "./fonts";
import { RatingSwatchPdf } from "./parts/rating-swatch-pdf";
import { RichTextPdf } from "./parts/rich-text-pdf";
import { TankDiagramPdf } from "./parts/tank-diagram-pdf";

const NAVY = "#12253a";
const MUTED = "#475569";
const RULE = "#cbd5e1";
const CONTENT_WIDTH = 523;
const RATING_COLOURS = { GOOD: "#166534", FAIR: "#a16207", POOR: "#b91c1c" } as const;

const s = StyleSheet.create({
  // No lineHeight on the page: there it leaves the page-number text empty.
  page: { fontFamily: PDF_FONT_FAMILY, fontSize: 8.5, paddingTop: 40, paddingBottom: 40, paddingHorizontal: 36, color: "#1e293b" },
  header: { position: "absolute", top: 16, left: 36, right: 36, flexDirection: "row", justifyContent: "space-between", fontSize: 7.5, color: MUTED, borderBottomWidth: 0.5, borderBottomColor: RULE, paddingBottom: 3 },
  headerDraft: { color: "#b91c1c", fontWeight: 700 },
  footer: { position: "absolute", bottom: 16, left: 36, right: 36, flexDirection: "row", justifyContent: "space-between", fontSize: 7.5, color: MUTED, borderTopWidth: 0.5, borderTopColor: RULE, paddingTop: 3 },
  watermark: { position: "absolute", top: 390, left: -60, right: -60, textAlign: "center", fontSize: 40, fontWeight: 700, color: "#dc2626", opacity: 0.14, transform: "rotate(-32deg)" },
  title: { fontSize: 18, fontWeight: 700, color: NAVY },
  subtitle: { fontSize: 11, color: MUTED, marginBottom: 8 },
  draftBanner: { borderWidth: 1.5, borderColor: "#b91c1c", backgroundColor: "#fef2f2", color: "#b91c1c", padding: 6, marginBottom: 8, fontSize: 10, fontWeight: 700, textAlign: "center" },
  h2: { fontSize: 11, fontWeight: 700, color: NAVY, marginTop: 12, marginBottom: 5, borderBottomWidth: 0.75, borderBottomColor: "#94a3b8", paddingBottom: 2 },
  kv: { flexDirection: "row", marginBottom: 1.5 },
  key: { width: 118, color: MUTED },
  val: { flex: 1 },
  box: { borderWidth: 0.75, borderColor: RULE, padding: 6, marginBottom: 4 },
  note: { color: MUTED, marginTop: 2 },
  warning: { borderWidth: 1, borderColor: "#b45309", backgroundColor: "#fffbeb", padding: 5, marginTop: 4 },
  blockers: { borderWidth: 1, borderColor: "#b45309", backgroundColor: "#fffbeb", padding: 6, marginTop: 6 },
  table: { borderTopWidth: 0.75, borderTopColor: "#94a3b8" },
  th: { flexDirection: "row", backgroundColor: "#e2e8f0", fontWeight: 700, fontSize: 7.5 },
  tr: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: RULE },
  td: { paddingVertical: 2.5, paddingHorizontal: 3, fontSize: 7.5 },
  total: { flexDirection: "row", justifyContent: "flex-end", marginTop: 3, fontWeight: 700 },
  rating: { fontWeight: 700 },
  ratingCell: { flexDirection: "row", alignItems: "center", gap: 3 },
  diagrams: { flexDirection: "row", alignItems: "flex-start", marginTop: 4 },
  photoGrid: { flexDirection: "row", flexWrap: "wrap", justifyContent: "space-between" },
  photoCell: { marginBottom: 10 },
  photoFrame: { backgroundColor: "#f1f5f9", alignItems: "center", justifyContent: "center" },
  photoHeading: { fontWeight: 700, fontSize: 7.5, marginTop: 3 },
  photoCaption: { fontSize: 7.5 },
  signatures: { flexDirection: "row", justifyContent: "space-between", marginTop: 4 },
  signature: { width: 255, borderWidth: 0.75, borderColor: RULE, padding: 6, minHeight: 110 },
  signatureRole: { fontWeight: 700, color: NAVY, marginBottom: 4 },
  signatureMark: { height: 44, justifyContent: "flex-end", borderBottomWidth: 0.75, borderBottomColor: "#334155", marginBottom: 4 },
  typed: { fontSize: 16, fontStyle: "italic", fontFamily: "Noto Sans", color: NAVY },
});

/** The bytes as a Buffer without copying them; React-PDF reads a Buffer source as it is (no cache key made from it). */
const bytes = (b: Uint8Array) => (Buffer.isBuffer(b) ? b : Buffer.from(b.buffer, b.byteOffset, b.byteLength));

// `box`: the cell holds a View (a drawing beside its text), which a Text cannot hold.
type TColumn<T> = { title: string; width: number | "flex"; cell: (row: T) => ReactNode; box?: boolean };

// One Text per cell (a View where the column says `box`), styles made once per column: long tables are most of the layout work.
function Table<T>({ columns, rows, rowKey }: { columns: TColumn<T>[]; rows: T[]; rowKey: (row: T, i: number) => string }) {
  const styles = columns.map((c) => ({ ...s.td, ...(c.width === "flex" ? { flex: 1 } : { width: c.width }) }));
  return (
    <View style={s.table}>
      <View style={s.th}>
        {columns.map((c, j) => <Text key={c.title} style={styles[j]}>{c.title}</Text>)}
      </View>
      {rows.map((r, i) => (
        <View key={rowKey(r, i)} style={s.tr} wrap={false}>
          {columns.map((c, j) => (c.box ? <View key={c.title} style={styles[j]}>{c.cell(r)}</View> : <Text key={c.title} style={styles[j]}>{c.cell(r)}</Text>))}
        </View>
      ))}
    </View>
  );
}

function KeyValues({ rows, keyWidth }: { rows: TKeyValue[]; keyWidth?: number }) {
  return (
    <View>
      {rows.map(([k, v]) => (
        <View key={k} style={s.kv} wrap={false}>
          <Text style={keyWidth ? [s.key, { width: keyWidth }] : s.key}>{k}</Text>
          <Text style={s.val}>{v}</Text>
        </View>
      ))}
    </View>
  );
}

/** Header, footer and (on a draft) the mark: fixed, so on every page. */
function PageFrame({ data }: { data: TReportData }) {
  return (
    <>
      <View style={s.header} fixed>
        <Text>{data.running}</Text>
        <Text style={data.draftMark ? s.headerDraft : undefined}>{data.draftMark ?? data.statusLabel}</Text>
      </View>
      <View style={s.footer} fixed>
        <Text>{data.company} · {data.title} · IMO {data.vessel.imoNumber}</Text>
        <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
      </View>
      {data.draftMark ? <Text style={s.watermark} fixed>{data.draftMark}</Text> : null}
    </>
  );
}

function Section({ title, children, breakBefore }: { title: string; children: ReactNode; breakBefore?: boolean }) {
  return (
    <View break={breakBefore}>
      <Text style={s.h2} minPresenceAhead={40}>{title}</Text>
      {children}
    </View>
  );
}

function Signature({ sig }: { sig: TReportSignature }) {
  return (
    <View style={s.signature} wrap={false}>
      <Text style={s.signatureRole}>{sig.role}</Text>
      <View style={s.signatureMark}>
        {sig.drawnPng ? (
          <Image src={bytes(sig.drawnPng)} style={{ height: 42, objectFit: "contain", objectPosition: "left" }} />
        ) : sig.typedSignature ? (
          <Text style={s.typed}>{sig.typedSignature}</Text>
        ) : (
          <Text style={s.note}>{sig.signed ? "" : "Not signed yet"}</Text>
        )}
      </View>
      <KeyValues keyWidth={50} rows={[["Name", sig.name || "—"], ["Rank", sig.rank || "—"], ["Signed", sig.signedAt || "—"]]} />
    </View>
  );
}

function Photo({ photo, width, height }: { photo: TReportPhoto; width: number; height: number }) {
  return (
    <View style={[s.photoCell, { width }]} wrap={false}>
      <View style={[s.photoFrame, { width, height }]}>
        {photo.jpeg ? <Image src={bytes(photo.jpeg)} style={{ width, height, objectFit: "contain" }} /> : <Text style={s.note}>Image not available</Text>}
      </View>
      <Text style={s.photoHeading}>{photo.heading}</Text>
      {photo.caption ? <Text style={s.photoCaption}>{photo.caption}</Text> : null}
    </View>
  );
}

function PhotoPage({ data, indexes, first }: { data: TReportData; indexes: number[]; first: boolean }) {
  const large = indexes.length <= 2;
  const width = large ? CONTENT_WIDTH : 256;
  const height = large ? 320 : 200;
  return (
    <Page size="A4" style={s.page}>
      <PageFrame data={data} />
      <Text style={[s.h2, { marginTop: 0 }]}>{first ? "Photographs" : "Photographs (continued)"}</Text>
      <View style={s.photoGrid}>
        {indexes.map((i) => <Photo key={data.photos[i]!.id} photo={data.photos[i]!} width={width} height={height} />)}
      </View>
    </Page>
  );
}

export function ReportDocument({ data }: { data: TReportData }) {
  return (
    <Document title={`${data.title}: ${data.vessel.name} ${data.tank.code} rev. ${data.revision}`} author={data.company || "Tankwright"} subject={data.title} creator="Tankwright" producer="Tankwright">
      <Page size="A4" style={s.page} wrap>
        <PageFrame data={data} />
        <Text style={s.title}>{data.title}</Text>
        <Text style={s.subtitle}>{data.vessel.name} · {data.tank.label}</Text>
        {data.draftMark ? <Text style={s.draftBanner}>{data.draftMark}: this report may still change.</Text> : null}
        <View style={s.box}>
          <KeyValues rows={data.cover} />
        </View>

        <Section title="Summary">
          <KeyValues rows={data.summaryRows} />
          {data.blockers.length ? (
            <View style={s.blockers} wrap={false}>
              <Text style={{ fontWeight: 700 }}>Still missing before it can be signed ({data.blockers.length})</Text>
              {data.blockers.map((b) => <Text key={b}>• {b}</Text>)}
            </View>
          ) : null}
        </Section>

        <Section title="Tank diagram and findings">
          <TankDiagramPdf diagram={data.diagrams.profile} width={CONTENT_WIDTH} />
          <View style={s.diagrams}>
            <TankDiagramPdf diagram={data.diagrams.section} width={210} />
            <View style={{ flex: 1, marginLeft: 10, marginTop: 10 }}>
              <Text style={s.note}>{data.diagrams.profile.title}. Numbered markers are the findings at their frames.</Text>
              <Text style={s.note}>{data.diagrams.section.title}; plating regions with findings in bold.</Text>
            </View>
          </View>
        </Section>

      </Page>
      {/* Long documents lay out faster as several page runs: each page break re-lays out only its own run. */}
      <Page size="A4" style={s.page} wrap>
        <PageFrame data={data} />
        <Section title="Entry record">
          {data.entry ? (
            <>
              <KeyValues rows={data.entry.rows} />
              <Text style={[s.note, { marginTop: 3, marginBottom: 3 }]}>Limits: {data.entry.limits.map(([k, v]) => `${k} ${v}`).join("; ")}.</Text>
              <Table
                rows={data.readings}
                rowKey={(r, i) => `${r.testedAt}-${i}`}
                columns={[
                  { title: "Tested", width: 120, cell: (r) => r.testedAt },
                  { title: "O2", width: 38, cell: (r) => r.oxygen },
                  { title: "Flammable", width: 50, cell: (r) => r.flammable },
                  { title: "H2S", width: 38, cell: (r) => r.h2s },
                  { title: "CO", width: 38, cell: (r) => r.co },
                  { title: "CO2", width: 34, cell: (r) => r.co2 },
                  { title: "Measured by", width: 80, cell: (r) => r.measuredBy },
                  { title: "Verdict", width: "flex", cell: (r) => <Text style={r.enter ? undefined : { color: "#b91c1c", fontWeight: 700 }}>{r.verdict}</Text> },
                ]}
              />
            </>
          ) : (
            <Text style={s.note}>No entry record.</Text>
          )}
        </Section>

        <Section title="Findings">
          {data.findings.length ? (
            <>
              <Table
                rows={data.findings}
                rowKey={(f) => f.id}
                columns={[
                  { title: "No.", width: 22, cell: (f) => String(f.number) },
                  { title: "Frames", width: 50, cell: (f) => f.frames },
                  { title: "Member", width: 78, cell: (f) => f.member },
                  { title: "Defect and description", width: "flex", cell: (f) => <><Text style={{ fontWeight: 700 }}>{f.type}. </Text>{f.description}</> },
                  { title: "Dimensions", width: 78, cell: (f) => f.dimensions },
                  { title: "Repair", width: 92, cell: (f) => f.repair },
                  { title: "Weight", width: 44, cell: (f) => f.weight },
                ]}
              />
              <View style={s.total}><Text>{data.findingsTotal}</Text></View>
            </>
          ) : (
            <Text style={s.note}>{data.findingsNote}</Text>
          )}
        </Section>

      </Page>
      <Page size="A4" style={s.page} wrap>
        <PageFrame data={data} />
        <Section title="Coating">
          {data.coating.length ? (
            <Table
              rows={data.coating}
              rowKey={(c) => c.area}
              columns={[
                { title: "Area", width: 98, cell: (c) => c.area },
                { title: "Breakdown", width: 46, cell: (c) => c.breakdown },
                { title: "Rusted", width: 38, cell: (c) => c.rusted },
                { title: "Hard scale", width: 44, cell: (c) => c.hardScale },
                { title: "Edges", width: 36, cell: (c) => c.edges },
                { title: "Rust grade", width: 40, cell: (c) => c.rustGrade },
                { title: "Rating", width: 44, box: true, cell: (c) => <View style={s.ratingCell}><RatingSwatchPdf rating={c.rating} /><Text style={[s.rating, { color: RATING_COLOURS[c.rating] }]}>{c.rating}</Text></View> },
                { title: "Decided by", width: "flex", cell: (c) => c.decidedBy },
              ]}
            />
          ) : (
            <Text style={s.note}>No coating areas recorded.</Text>
          )}
          <Text style={s.note}>{data.coatingNote}</Text>
        </Section>

        <Section title="Anodes">
          {data.anodes ? (
            <>
              <KeyValues rows={data.anodes.rows} />
              {data.anodes.warning ? <Text style={s.warning}>{data.anodes.warning}</Text> : null}
            </>
          ) : (
            <Text style={s.note}>Anodes not recorded.</Text>
          )}
        </Section>

        <Section title="Sediment">
          {data.sediment.zones.length ? (
            <>
              <Table
                rows={data.sediment.zones}
                rowKey={(z, i) => `${z.label}-${i}`}
                columns={[
                  { title: "Zone", width: "flex", cell: (z) => z.label },
                  { title: "Frames", width: 70, cell: (z) => z.frames },
                  { title: "Depth", width: 60, cell: (z) => z.depth },
                  { title: "Area", width: 60, cell: (z) => z.area },
                  { title: "Volume", width: 60, cell: (z) => z.volume },
                ]}
              />
              <View style={s.total}><Text>Total {data.sediment.total}</Text></View>
              {data.sediment.cost ? <Text style={s.note}>{data.sediment.cost}</Text> : null}
            </>
          ) : (
            <Text style={s.note}>{data.sediment.note}</Text>
          )}
        </Section>

        <Section title="Areas not inspected">
          {data.notInspected.length ? (
            <Table
              rows={data.notInspected}
              rowKey={(a, i) => `${a.frames}-${i}`}
              columns={[
                { title: "Frames", width: 70, cell: (a) => a.frames },
                { title: "Member or region", width: 130, cell: (a) => a.member },
                { title: "Reason", width: 120, cell: (a) => a.reason },
                { title: "Suspected", width: "flex", cell: (a) => a.suspected },
              ]}
            />
          ) : (
            <Text style={s.note}>{data.notInspectedNote}</Text>
          )}
        </Section>

        <Section title="Remarks">
          {data.remarks ? <RichTextPdf doc={data.remarks} /> : <Text style={s.note}>No remarks.</Text>}
        </Section>

        <View wrap={false}>
          <Text style={s.h2}>Signatures</Text>
          <View style={s.signatures}>
            {data.signatures.map((sig) => <Signature key={sig.role} sig={sig} />)}
          </View>
          <Text style={[s.note, { marginTop: 6 }]}>
            Times in UTC. This report records the inspection; it does not replace the company&apos;s safety management system, the flag state&apos;s rules or the ship&apos;s own procedures.
          </Text>
        </View>
      </Page>
      {data.photoPages.map((indexes, p) => <PhotoPage key={p} data={data} indexes={indexes} first={p === 0} />)}
    </Document>
  );
}
