"use client";

import { EditorContent, useEditor, type JSONContent } from "@tiptap/react";
import StarterKit from "@tiptap/starter-kit";
import { ZRemarksInput } from "@/lib/schemas/inspection";
import { PartStatus } from "./inputs";
import { partUrl, type TView } from "./types";
import { usePart } from "./use-part";

type TDoc = JSONContent & { type: "doc" };
const EMPTY: TDoc = { type: "doc", content: [{ type: "paragraph" }] };

export function RemarksStep({ view }: { view: TView }) {
  const part = usePart<TDoc>({ part: "remarks", url: partUrl(view.inspection.id, "remarks"), initial: (view.inspection.remarks as TDoc | null) ?? EMPTY, schema: ZRemarksInput, toBody: (doc) => ({ doc }), delayMs: 1200 });
  const editor = useEditor({
    extensions: [StarterKit.configure({ heading: { levels: [2, 3] }, codeBlock: false, code: false, blockquote: false, horizontalRule: false })],
    content: part.value,
    immediatelyRender: false,
    editorProps: { attributes: { class: "prose-remarks min-h-48 rounded-b-md border border-slate-300 bg-white p-3 focus:outline-none", "aria-label": "Remarks", role: "textbox", "aria-multiline": "true" } },
    onUpdate: ({ editor: e }) => part.update(e.getJSON() as TDoc),
  });
  const button = (label: string, active: boolean, run: () => void, title: string) => (
    <button type="button" title={title} aria-pressed={active} onClick={run} className={`rounded px-2 py-1 text-sm font-semibold ${active ? "bg-hull-700 text-white" : "bg-white text-slate-800 hover:bg-slate-100"}`}>
      {label}
    </button>
  );
  return (
    <div className="space-y-2">
      <p className="text-sm text-slate-700">Anything the structured steps cannot hold: the sequence of the inspection, conditions inside, recommendations. Headings, bold, italic and lists are kept in the report.</p>
      {editor ? (
        <div role="toolbar" aria-label="Formatting" className="flex flex-wrap gap-1 rounded-t-md border border-b-0 border-slate-300 bg-slate-50 p-1">
          {button("H2", editor.isActive("heading", { level: 2 }), () => editor.chain().focus().toggleHeading({ level: 2 }).run(), "Heading")}
          {button("H3", editor.isActive("heading", { level: 3 }), () => editor.chain().focus().toggleHeading({ level: 3 }).run(), "Sub-heading")}
          {button("B", editor.isActive("bold"), () => editor.chain().focus().toggleBold().run(), "Bold")}
          {button("I", editor.isActive("italic"), () => editor.chain().focus().toggleItalic().run(), "Italic")}
          {button("• List", editor.isActive("bulletList"), () => editor.chain().focus().toggleBulletList().run(), "Bulleted list")}
          {button("1. List", editor.isActive("orderedList"), () => editor.chain().focus().toggleOrderedList().run(), "Numbered list")}
        </div>
      ) : null}
      <EditorContent editor={editor} />
      <PartStatus refused={part.refused} errors={part.errors} dirty={part.dirty} />
    </div>
  );
}
