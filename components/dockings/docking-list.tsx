import Link from "next/link";
import { Cell, Table } from "@/components/ui/table";
import { DOCKING_STATUS_LABELS, type TDockingStatus } from "@/lib/vocabulary";

export type TDockingSummary = { id: string; yard: string; place: string; plannedOn: string; currency: string; status: TDockingStatus };

/** The vessel's dockings, latest planned first, each linking to its work list. */
export function DockingList({ dockings }: { dockings: TDockingSummary[] }) {
  return (
    <Table head={["Planned", "Yard", "Place", "Currency", "Status"]} caption="Dockings">
      {dockings.map((d) => (
        <tr key={d.id}>
          <Cell>
            <Link href={`/dockings/${d.id}`} className="font-semibold text-hull-700 underline">{d.plannedOn}</Link>
          </Cell>
          <Cell>{d.yard}</Cell>
          <Cell>{d.place}</Cell>
          <Cell>{d.currency}</Cell>
          <Cell>{DOCKING_STATUS_LABELS[d.status]}</Cell>
        </tr>
      ))}
    </Table>
  );
}
