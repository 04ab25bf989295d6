// The docking work list as a PDF: docking particulars and rates, one row per
// item (tank, work, quantity, unit rate, cost; each in its own cell, the tank
// code wrapping within its column; an excluded item's work struck through,
// its reason not, and "excluded" in place of its cost, so the Cost column adds
// up to the totals; work added by hand with its own rate and why it was
// added), totals per kind (hand-added work: no quantity, mixed units) and the
// grand total. Every figure comes priced from lib/office/work-list.ts; nothing
// is computed here.
import { Document, Page, StyleSheet, Text, View } from "@react-pdf/renderer";
import { WORK_KIND_LABELS, WORK_KINDS, WORK_UNITS, type TPricedWorkList, type TWorkKind } from "@/lib/office/work-list";
import { PDF_FONT_FAMILY } from "./fonts";

const NAVY = "#12253a";
const s = StyleSheet.create({
  page: { fontFamily: PDF_FONT_FAMILY, fontSize: 8.5, paddingTop: 36, paddingBottom: 44, paddingHorizontal: 32, color: "#1e293b" },
  footerLeft: { position: "absolute", bottom: 18, left: 32, fontSize: 7.5, color: "#475569" },
  footerRight: { position: "absolute", bottom: 18, right: 32, width: 120, textAlign: "right", fontSize: 7.5, color: "#475569" },
  h1: { fontSize: 15, fontWeight: 700, color: NAVY, marginBottom: 4 },
  h2: { fontSize: 11, fontWeight: 700, color: NAVY, marginTop: 10, marginBottom: 4, borderBottomWidth: 0.75, borderBottomColor: "#94a3b8", paddingBottom: 2 },
  meta: { color: "#475569", marginBottom: 2 },
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: "#cbd5e1", paddingVertical: 2 },
  head: { flexDirection: "row", borderBottomWidth: 1, borderBottomColor: "#334155", paddingVertical: 2, fontWeight: 700 },
  tank: { width: 84, paddingRight: 10 },
  work: { flex: 1, paddingRight: 10 },
  num: { width: 68, textAlign: "right" },
  excluded: { color: "#64748b", textDecoration: "line-through" },
  excludedCost: { width: 68, textAlign: "right", color: "#475569" },
  reason: { fontSize: 7.5, color: "#475569" },
  grand: { flexDirection: "row", paddingVertical: 3, fontWeight: 700, fontSize: 10 },
});

export type TWorkListPdfItem = { tankCode: string | null; kind: TWorkKind; description: string; unit: string; quantity: number; addedReason?: string | null; addedByName?: string | null };

export function WorkListDocument<T extends TWorkListPdfItem>({ list, head }: { list: TPricedWorkList<T>; head: { vesselName: string; imoNumber: string; yard: string; place: string; plannedOn: string; status: string; preparedAt: string } }) {
  const money = (n: number) => `${n.toFixed(list.minorUnits)} ${list.currency}`;
  const qty = (q: number, unit: string) => `${Number(q.toFixed(3))} ${unit}`;
  return (
    <Document title={`Work list ${head.vesselName} ${head.plannedOn}`} author="Tankwright">
      <Page size="A4" style={s.page}>
        <Text style={s.h1}>Docking work list: {head.vesselName}</Text>
        <Text style={s.meta}>IMO {head.imoNumber} · {head.yard}, {head.place} · planned {head.plannedOn} · {head.status}</Text>
        <Text style={s.meta}>Gathered from each tank&apos;s latest countersigned report. Prepared {head.preparedAt}.</Text>
        <Text style={s.h2}>Items</Text>
        <View style={s.head} fixed>
          <Text style={s.tank}>Tank</Text>
          <Text style={s.work}>Work</Text>
          <Text style={s.num}>Quantity</Text>
          <Text style={s.num}>Unit rate</Text>
          <Text style={s.num}>Cost</Text>
        </View>
        {list.items.map((i, n) => (
          <View key={n} style={s.row} wrap={false}>
            <Text style={s.tank}>{i.tankCode ?? "—"}</Text>
            <View style={s.work}>
              <Text style={i.included ? {} : s.excluded}>{i.description}</Text>
              {i.kind === "other" ? <Text style={s.reason}>Added by hand{i.addedByName ? ` by ${i.addedByName}` : ""}: {i.addedReason ?? ""}</Text> : null}
              {i.adjustmentReason ? <Text style={s.reason}>Reason: {i.adjustmentReason}{i.adjustedQuantity !== null ? ` (gathered ${qty(i.quantity, i.unit)})` : ""}</Text> : null}
            </View>
            <Text style={s.num}>{qty(i.quantityPriced, i.unit)}</Text>
            <Text style={s.num}>{money(i.unitRate)}</Text>
            {i.included ? <Text style={s.num}>{money(i.cost)}</Text> : <Text style={s.excludedCost}>excluded</Text>}
          </View>
        ))}
        <Text style={s.h2}>Totals ({list.currency})</Text>
        {WORK_KINDS.map((k) => (
          <View key={k} style={s.row} wrap={false}>
            <Text style={s.work}>{WORK_KIND_LABELS[k]}: {list.totals[k].included} included, {list.totals[k].excluded} excluded</Text>
            <Text style={s.num}>{k === "other" || list.totals[k].quantity === null ? "—" : qty(list.totals[k].quantity, WORK_UNITS[k])}</Text>
            <Text style={s.num}>{money(list.totals[k].cost)}</Text>
          </View>
        ))}
        <View style={s.grand} wrap={false}>
          <Text style={s.work}>Grand total</Text>
          <Text style={s.num}>{money(list.grandTotal)}</Text>
        </View>
        <Text style={s.footerLeft} fixed>Tankwright · work list · {head.vesselName}</Text>
        <Text style={s.footerRight} fixed render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
      </Page>
    </Document>
  );
}
