import Link from "next/link";
import { Cell, Table } from "@/components/ui/table";
import { formatMoney } from "@/lib/format";
import { DOCKING_STATUS_LABELS, type TDockingStatus } from "@/lib/vocabulary";

export type TDockingSummary = {
  id: string;
  yard: string;
  place: string;
  plannedOn: string;
  currency: string;
  status: TDockingStatus;
  /** Over every included item, in the docking's currency (priced by the server). */
  grandTotal: number;
  counts: { included: number; excluded: number };
};

/** A column head over right-aligned numbers, aligned with them. */
const numberHead = (label: string) => <span className="block text-right">{label}</span>;

/** The vessel's dockings, latest planned first, each linking to its work list, with its grand total and item counts. */
export function DockingList({ dockings }: { dockings: TDockingSummary[] }) {
  return (
    <Table head={["Planned", "Yard", "Place", "Status", numberHead("Items"), numberHead("Grand total")]} caption="Dockings">
      {dockings.map((d) => (
        <tr key={d.id} data-testid="docking-row">
          <Cell>
            <Link href={`/dockings/${d.id}`} className="font-semibold text-hull-700 underline">{d.plannedOn}</Link>
          </Cell>
          <Cell>{d.yard}</Cell>
          <Cell>{d.place}</Cell>
          <Cell>{DOCKING_STATUS_LABELS[d.status]}</Cell>
          <Cell className="text-right tabular-nums">
            {d.counts.included} included{d.counts.excluded ? <span className="block text-xs text-slate-600">{d.counts.excluded} excluded</span> : null}
          </Cell>
          <Cell className="whitespace-nowrap text-right font-semibold tabular-nums">{formatMoney(d.grandTotal, d.currency)}</Cell>
        </tr>
      ))}
    </Table>
  );
}
