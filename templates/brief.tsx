// The pre-entry brief as a PDF: particulars and diagrams, member catalogue,
// areas of concern with what to look for and why, findings to look at again,
// and the entry precautions with the caution that the ship's procedure rules.
import { Document, Link, Page, StyleSheet, Text, View } from "@react-pdf/renderer";
import type { TDiagram } from "@/lib/diagram/tank-diagram";
import type { TBrief } from "@/lib/structure/brief";
import { PDF_FONT_FAMILY } from "./fonts";
import { TankDiagramPdf } from "./parts/tank-diagram-pdf";

const NAVY = "#12253a";
const s = StyleSheet.create({
  // No lineHeight on the page: there it leaves the page-number text empty.
  page: { fontFamily: PDF_FONT_FAMILY, fontSize: 9, paddingTop: 36, paddingBottom: 44, paddingHorizontal: 36, color: "#1e293b" },
  header: { position: "absolute", top: 14, left: 36, right: 36, flexDirection: "row", justifyContent: "space-between", fontSize: 7.5, color: "#475569" },
  footerLeft: { position: "absolute", bottom: 18, left: 36, fontSize: 7.5, color: "#475569" },
  footerRight: { position: "absolute", bottom: 18, right: 36, width: 120, textAlign: "right", fontSize: 7.5, color: "#475569" },
  h1: { fontSize: 16, fontWeight: 700, color: NAVY, marginBottom: 6 },
  h2: { fontSize: 11, fontWeight: 700, color: NAVY, marginTop: 10, marginBottom: 4, borderBottomWidth: 0.75, borderBottomColor: "#94a3b8", paddingBottom: 2 },
  row: { flexDirection: "row" },
  key: { width: 90, color: "#475569" },
  val: { flex: 1 },
  caution: { borderWidth: 1.5, borderColor: "#b45309", backgroundColor: "#fffbeb", padding: 6, marginVertical: 6 },
  cautionTitle: { fontWeight: 700, color: "#78350f" },
  concern: { marginBottom: 5 },
  concernTitle: { fontWeight: 700 },
  small: { fontSize: 8, color: "#475569" },
  bullet: { flexDirection: "row", marginBottom: 2 },
  box: { width: 9, height: 9, borderWidth: 0.75, borderColor: "#334155", marginRight: 5, marginTop: 1 },
});

function KeyValues({ rows }: { rows: [string, string][] }) {
  return (
    <View>
      {rows.map(([k, v]) => (
        <View key={k} style={s.row}>
          <Text style={s.key}>{k}</Text>
          <Text style={s.val}>{v}</Text>
        </View>
      ))}
    </View>
  );
}

export type TBriefDrawing = { title: string; kind: string; url: string };

export function BriefDocument({ brief, vesselName, profile, section, drawings = [] }: { brief: TBrief; vesselName: string; profile: TDiagram; section: TDiagram; drawings?: TBriefDrawing[] }) {
  const position: [string, string][] = [
    ["Midship region", `${brief.position.midship.applies ? "Yes" : "No"} — ${brief.position.midship.why}`],
    ["Engine room", `${brief.position.nearEngineRoom.applies ? "Next to it" : "No"} — ${brief.position.nearEngineRoom.why}`],
    ["Forward region", `${brief.position.forwardRegion.applies ? "Yes" : "No"} — ${brief.position.forwardRegion.why}`],
    ["Fwd of coll. bhd", `${brief.position.forwardOfCollisionBulkhead.applies ? "Yes" : "No"} — ${brief.position.forwardOfCollisionBulkhead.why}`],
  ];
  return (
    <Document title={brief.title} author="Tankwright" subject="Pre-entry brief">
      <Page size="A4" style={s.page} wrap>
        <View style={s.header} fixed>
          <Text>{vesselName}</Text>
          <Text>{brief.title}</Text>
        </View>
        <Text style={s.footerLeft} fixed>Tankwright · pre-entry brief · the ship&apos;s own enclosed-space procedure rules</Text>
        <Text style={s.footerRight} fixed render={({ pageNumber, totalPages }) => `page ${pageNumber} of ${totalPages}`} />
        <Text style={s.h1}>{brief.title}</Text>
        <View style={s.caution}>
          <Text style={s.cautionTitle}>Enclosed space</Text>
          <Text>{brief.caution}</Text>
        </View>
        <KeyValues rows={brief.particulars} />
        <Text style={s.h2}>Position along the ship</Text>
        <KeyValues rows={position} />
        <View style={{ marginTop: 6 }}>
          <TankDiagramPdf diagram={profile} width={523} />
        </View>
        <View style={{ flexDirection: "row", marginTop: 4 }}>
          <TankDiagramPdf diagram={section} width={230} />
          <View style={{ flex: 1, marginLeft: 12 }}>
            <Text style={s.h2}>Member catalogue</Text>
            {brief.members.length ? brief.members.map((m) => <Text key={m}>• {m}</Text>) : <Text style={s.small}>No members catalogued yet.</Text>}
            {brief.specialFrames.length ? (
              <>
                <Text style={[s.concernTitle, { marginTop: 4 }]}>Special frames</Text>
                {brief.specialFrames.map((f) => <Text key={f}>• {f}</Text>)}
              </>
            ) : null}
          </View>
        </View>

        <Text style={s.h2}>Areas of concern</Text>
        {brief.concerns.map((c) => (
          <View key={c.id} style={s.concern} wrap={false}>
            <Text style={s.concernTitle}>{c.title}</Text>
            <Text>Look for: {c.lookFor}</Text>
            <Text style={s.small}>Why: {c.why} Here: {c.because}</Text>
          </View>
        ))}

        <Text style={s.h2}>Look again</Text>
        <Text style={s.small}>{brief.previousLabel}</Text>
        {brief.lookAgain.map((f) => (
          <View key={f.number} style={s.concern} wrap={false}>
            <Text style={s.concernTitle}>
              #{f.number} {f.where}
            </Text>
            <Text>{f.what}</Text>
            <Text>{f.lookAt}</Text>
          </View>
        ))}

        {drawings.length ? (
          <>
            <Text style={s.h2}>Drawings of the vessel</Text>
            {drawings.map((d) => (
              <Text key={d.url} style={s.small}>
                {d.kind}: {d.title} — <Link src={d.url}>{d.url}</Link>
              </Text>
            ))}
          </>
        ) : null}

        <Text style={s.h2}>Before entry</Text>
        {brief.precautions.map((p) => (
          <View key={p} style={s.bullet} wrap={false}>
            <View style={s.box} />
            <Text style={s.val}>{p}</Text>
          </View>
        ))}
        <Text style={[s.small, { marginTop: 4 }]}>{brief.caution}</Text>

      </Page>
    </Document>
  );
}
