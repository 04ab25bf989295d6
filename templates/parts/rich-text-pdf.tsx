// Remarks as the editor stores them (Tiptap JSON), set as PDF text: headings,
// paragraphs, bullet and ordered lists, quotes, bold and italic.
import type { ReactNode } from "react";
import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { TRichDoc, TRichNode } from "@/lib/report/types";

const s = StyleSheet.create({
  p: { marginBottom: 4 },
  h1: { fontSize: 12, fontWeight: 700, marginTop: 6, marginBottom: 3 },
  h2: { fontSize: 10.5, fontWeight: 700, marginTop: 5, marginBottom: 3 },
  h3: { fontSize: 9.5, fontWeight: 700, marginTop: 4, marginBottom: 2 },
  item: { flexDirection: "row", marginBottom: 1.5 },
  itemP: {},
  marker: { width: 16, textAlign: "right", paddingRight: 4 },
  itemBody: { flex: 1 },
  quote: { borderLeftWidth: 2, borderLeftColor: "#94a3b8", paddingLeft: 6, marginBottom: 4, color: "#334155" },
  rule: { borderBottomWidth: 0.5, borderBottomColor: "#94a3b8", marginVertical: 4 },
  code: { backgroundColor: "#f1f5f9", padding: 4, marginBottom: 4 },
});

// Only the Latin file of the shipped font has an italic face: text outside it stays upright.
const ITALIC_SAFE = /^[\u0000-\u00ff\u2000-\u206f\u20ac\u2122\u2212]*$/;

function inline(nodes: TRichNode[] | undefined): ReactNode[] {
  return (nodes ?? []).map((n, i) => {
    if (n.type === "hardBreak") return "\n";
    if (n.type !== "text" || !n.text) return null;
    const marks = new Set((n.marks ?? []).map((m) => m.type));
    const italic = marks.has("italic") && ITALIC_SAFE.test(n.text);
    const style = {
      ...(marks.has("bold") ? { fontWeight: 700 } : {}),
      ...(italic ? { fontStyle: "italic" as const, fontFamily: "Noto Sans" } : {}),
      ...(marks.has("underline") ? { textDecoration: "underline" as const } : {}),
      ...(marks.has("strike") ? { textDecoration: "line-through" as const } : {}),
    };
    return Object.keys(style).length ? <Text key={i} style={style}>{n.text}</Text> : n.text;
  });
}

function blocks(nodes: TRichNode[] | undefined, inItem = false): ReactNode[] {
  return (nodes ?? []).map((n, i) => (inItem && n.type === "paragraph" ? <Text key={i} style={s.itemP}>{inline(n.content)}</Text> : block(n, i)));
}

function list(n: TRichNode, key: number, ordered: boolean): ReactNode {
  const start = ordered && typeof n.attrs?.start === "number" ? n.attrs.start : 1;
  return (
    <View key={key} style={{ marginBottom: 4 }}>
      {(n.content ?? []).map((item, i) => (
        <View key={i} style={s.item} wrap={false}>
          <Text style={s.marker}>{ordered ? `${start + i}.` : "•"}</Text>
          <View style={s.itemBody}>{blocks(item.content, true)}</View>
        </View>
      ))}
    </View>
  );
}

function block(n: TRichNode, key: number): ReactNode {
  switch (n.type) {
    case "paragraph":
      return <Text key={key} style={s.p}>{inline(n.content)}</Text>;
    case "heading": {
      const level = Number(n.attrs?.level ?? 2);
      return <Text key={key} style={level <= 1 ? s.h1 : level === 2 ? s.h2 : s.h3}>{inline(n.content)}</Text>;
    }
    case "bulletList":
      return list(n, key, false);
    case "orderedList":
      return list(n, key, true);
    case "blockquote":
      return <View key={key} style={s.quote}>{blocks(n.content)}</View>;
    case "codeBlock":
      return <Text key={key} style={[s.p, s.code]}>{inline(n.content)}</Text>;
    case "horizontalRule":
      return <View key={key} style={s.rule} />;
    case "text":
      return <Text key={key}>{inline([n])}</Text>;
    default:
      return n.content ? <View key={key}>{blocks(n.content)}</View> : null;
  }
}

export function RichTextPdf({ doc }: { doc: TRichDoc }) {
  return <View>{blocks(doc.content)}</View>;
}
