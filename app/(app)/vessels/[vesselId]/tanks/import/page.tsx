import type { Metadata } from "next";
import { CsvImport } from "@/components/structure-map/csv-import";
import { PageHeader } from "@/components/ui/page-header";
import { Cell, Table } from "@/components/ui/table";
import { authorizeVessel } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { STRUCTURE_EDITORS } from "@/lib/services/tanks";
import { TANK_CSV_COLUMNS, TANK_CSV_MAX_ROWS } from "@/lib/structure/tank-csv";

export const metadata: Metadata = { title: "Import tanks" };

export default async function ImportTanksPage({ params }: { params: Promise<{ vesselId: string }> }) {
  const { vesselId } = await params;
  const actor = await pageActor();
  const { vessel } = await pageAuthorize(() => authorizeVessel({ actor, vesselId, allow: STRUCTURE_EDITORS }));
  return (
    <>
      <PageHeader title="Import tanks from CSV" subtitle={`${vessel.name} · frames ${vessel.frameFirst}–${vessel.frameLast}`} />
      <div className="space-y-6">
        <section className="rounded-lg border border-slate-200 bg-white p-4">
          <CsvImport vesselId={vesselId} />
        </section>
        <section aria-labelledby="format">
          <h2 id="format" className="mb-2 text-lg font-semibold text-hull-900">File format</h2>
          <p className="mb-2 text-sm text-slate-700">
            UTF-8 text, comma-separated, one header line with these column names (any order), then one tank per line, at most {TANK_CSV_MAX_ROWS} lines.
            The preview checks every row with the same rules as the tank form; nothing is imported unless every row is valid.
          </p>
          <Table head={["Column", "Required", "Content"]} caption="CSV columns">
            {TANK_CSV_COLUMNS.map((c) => (
              <tr key={c.name}>
                <Cell className="font-mono">{c.name}</Cell>
                <Cell>{c.required ? "yes" : "no"}</Cell>
                <Cell>{c.help}</Cell>
              </tr>
            ))}
          </Table>
          <pre className="mt-3 overflow-x-auto rounded-md bg-slate-900 p-3 text-xs text-slate-100">{`code,name,side,kind,frame_from,frame_to,bottom_area_m2,at_waterline
No. 5 WBT P,No. 5 ballast tank port,port,double_bottom_side,60,84,180,yes
No. 5 WBT S,No. 5 ballast tank starboard,starboard,double_bottom_side,60,84,180,yes`}</pre>
        </section>
      </div>
    </>
  );
}
