import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { THistoryTable } from "@/lib/office/history-tables";
import { PDF_FONT_FAMILY } from "../fonts";

const s = StyleSheet.create({
  table: { marginTop: 4, fontFamily: PDF_FONT_FAMILY, fontSize: 7.5 },
  head: { flexDirection: "row", borderBottomWidth: 0.75, borderBottomColor: "#334155", paddingVertical: 1.5, fontWeight: 700 },
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: "#cbd5e1", paddingVertical: 1.5 },
  cell: { paddingRight: 6 },
  number: { textAlign: "right" },
});

/**
 * A plot's data table (lib/office/history-tables.ts) in the history PDF: the
 * first column names the row, the others are figures, right-aligned in
 * columns of `columnWidth` points (the first `firstWidth`).
 */
export function DataTablePdf({ table, firstWidth, columnWidth }: { table: THistoryTable; firstWidth: number; columnWidth: number }) {
  const cell = (text: string, j: number) => (
    <Text key={j} style={j === 0 ? [s.cell, { width: firstWidth }] : [s.cell, s.number, { width: columnWidth }]}>
      {text}
    </Text>
  );
  return (
    <View style={[s.table, { width: firstWidth + (table.head.length - 1) * columnWidth }]}>
      <View style={s.head} wrap={false}>{table.head.map(cell)}</View>
      {table.rows.map((r, i) => (
        <View key={i} style={s.row} wrap={false}>{r.map(cell)}</View>
      ))}
    </View>
  );
}
