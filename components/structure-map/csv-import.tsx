"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Cell, Table } from "@/components/ui/table";

type TPreview = {
  ok: boolean;
  fileErrors: string[];
  rows: { line: number; code: string; errors: { column: string; message: string }[] }[];
  created: number;
  error?: { message: string };
};

export function CsvImport({ vesselId }: { vesselId: string }) {
  const router = useRouter();
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<TPreview | null>(null);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  async function send(commit: boolean) {
    if (!file) return;
    setBusy(true);
    setProblem(null);
    try {
      const res = await fetch(`/api/v1/vessels/${vesselId}/tanks/import${commit ? "?commit=1" : ""}`, {
        method: "POST",
        headers: { "content-type": "text/csv" },
        body: file,
      });
      const body = (await res.json()) as TPreview;
      if (body.error) {
        setProblem(body.error.message);
        return;
      }
      setPreview(body);
      if (commit && body.ok) router.push(`/vessels/${vesselId}`);
    } catch {
      setProblem("The server could not be reached; nothing was imported. Try again when the connection is back.");
    } finally {
      setBusy(false);
    }
  }

  const bad = preview?.rows.filter((r) => r.errors.length) ?? [];
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3">
        <div>
          <label htmlFor="csv-file" className="block text-sm font-semibold">CSV file (UTF-8, comma-separated)</label>
          <input id="csv-file" type="file" accept=".csv,text/csv" onChange={(e) => { setFile(e.target.files?.[0] ?? null); setPreview(null); }} className="mt-1 block" />
        </div>
        <Button type="button" variant="secondary" disabled={!file || busy} onClick={() => send(false)}>Preview</Button>
        <Button type="button" disabled={!file || busy || !preview?.ok} onClick={() => send(true)}>
          Import {preview?.ok ? `${preview.rows.length} tanks` : ""}
        </Button>
      </div>
      {problem ? <Notice tone="error">{problem}</Notice> : null}
      {preview?.fileErrors.length ? (
        <Notice tone="error" title="The file cannot be read as a tank list; nothing was imported.">
          <ul className="list-disc pl-5">{preview.fileErrors.map((e) => <li key={e}>{e}</li>)}</ul>
        </Notice>
      ) : null}
      {preview && !preview.fileErrors.length ? (
        preview.ok ? (
          <Notice tone="success">Every row is valid: {preview.rows.length} tanks ready to import.</Notice>
        ) : (
          <Notice tone="error">{bad.length} of {preview.rows.length} rows need attention; nothing will be imported until every row is valid.</Notice>
        )
      ) : null}
      {preview?.rows.length ? (
        <Table head={["Line", "Code", "Result"]} caption="Preview">
          {preview.rows.map((r) => (
            <tr key={r.line} className={r.errors.length ? "bg-red-50" : ""}>
              <Cell>{r.line}</Cell>
              <Cell>{r.code || "—"}</Cell>
              <Cell>
                {r.errors.length ? (
                  <ul>{r.errors.map((e, i) => <li key={i}><span className="font-mono">{e.column}</span> {e.message}</li>)}</ul>
                ) : (
                  "valid"
                )}
              </Cell>
            </tr>
          ))}
        </Table>
      ) : null}
    </div>
  );
}
