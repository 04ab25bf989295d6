// Remarks as the editor stores them (Tiptap JSON), as HTML for the preview.
import type { ReactNode } from "react";
import type { TRichDoc, TRichNode } from "@/lib/report/types";

function inline(nodes: TRichNode[] | undefined): ReactNode[] {
  return (nodes ?? []).map((n, i) => {
    if (n.type === "hardBreak") return <br key={i} />;
    if (n.type !== "text" || !n.text) return null;
    let out: ReactNode = n.text;
    for (const mark of n.marks ?? []) {
      if (mark.type === "bold") out = <strong>{out}</strong>;
      if (mark.type === "italic") out = <em>{out}</em>;
      if (mark.type === "underline") out = <u>{out}</u>;
      if (mark.type === "strike") out = <s>{out}</s>;
      if (mark.type === "code") out = <code>{out}</code>;
    }
    return <span key={i}>{out}</span>;
  });
}

function blocks(nodes: TRichNode[] | undefined): ReactNode[] {
  return (nodes ?? []).map((n, i) => {
    switch (n.type) {
      case "paragraph":
        return <p key={i}>{inline(n.content)}</p>;
      case "heading": {
        const level = Number(n.attrs?.level ?? 2);
        return level <= 2 ? <h3 key={i}>{inline(n.content)}</h3> : <h4 key={i}>{inline(n.content)}</h4>;
      }
      case "bulletList":
        return <ul key={i}>{(n.content ?? []).map((item, j) => <li key={j}>{blocks(item.content)}</li>)}</ul>;
      case "orderedList":
        return <ol key={i} start={typeof n.attrs?.start === "number" ? n.attrs.start : 1}>{(n.content ?? []).map((item, j) => <li key={j}>{blocks(item.content)}</li>)}</ol>;
      case "blockquote":
        return <blockquote key={i}>{blocks(n.content)}</blockquote>;
      case "codeBlock":
        return <pre key={i}>{inline(n.content)}</pre>;
      case "horizontalRule":
        return <hr key={i} />;
      default:
        return n.content ? <div key={i}>{blocks(n.content)}</div> : null;
    }
  });
}

export function RichTextHtml({ doc }: { doc: TRichDoc }) {
  return <div className="remarks">{blocks(doc.content)}</div>;
}
