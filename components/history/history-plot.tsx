import type { ReactNode } from "react";
import { Cell, Table } from "@/components/ui/table";
import type { TChartLayout } from "@/lib/office/history-chart";
import type { THistoryTable } from "@/lib/office/history-tables";
import { HistoryChart } from "./history-chart";
import { LineChartSvg } from "./line-chart-svg";

/** A plot (recharts in the browser over the static SVG) with its data as a table underneath, for those who would rather read the numbers. */
export function HistoryPlot({ id, title, chart, note, table }: { id: string; title: string; chart: TChartLayout; note?: ReactNode; table: THistoryTable }) {
  return (
    <section aria-labelledby={id} className="rounded-lg border border-slate-200 bg-white p-4" data-plot={id}>
      <h2 id={id} className="mb-2 text-lg font-semibold text-hull-900">{title}</h2>
      {chart.empty ? <p className="text-sm text-slate-600">No signed measurements yet.</p> : <HistoryChart chart={chart}><LineChartSvg chart={chart} /></HistoryChart>}
      {note ? <div className="mt-2 text-sm">{note}</div> : null}
      {table.rows.length ? (
        <details className="mt-3" open>
          <summary className="cursor-pointer text-sm font-semibold text-hull-800">Data table</summary>
          <div className="mt-2">
            <Table head={table.head} caption={`${title}: data`}>
              {table.rows.map((r, i) => (
                <tr key={i}>{r.map((c, j) => <Cell key={j}>{c}</Cell>)}</tr>
              ))}
            </Table>
          </div>
        </details>
      ) : null}
    </section>
  );
}
