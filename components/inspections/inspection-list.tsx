import Link from "next/link";
import { Cell, Table } from "@/components/ui/table";
import { INSPECTION_STATUS_LABELS, type TInspectionStatus } from "@/lib/vocabulary";

type TRow = { id: string; status: TInspectionStatus; inspectedOn: string; revision: number; place: string; tankCode: string };

export function InspectionList({ inspections }: { inspections: TRow[] }) {
  return (
    <Table head={["Date", "Tank", "Place", "Status", "Revision"]} caption="Inspections">
      {inspections.map((i) => (
        <tr key={i.id}>
          <Cell><Link href={`/inspections/${i.id}`} className="font-semibold text-hull-700 hover:underline">{i.inspectedOn}</Link></Cell>
          <Cell>{i.tankCode}</Cell>
          <Cell>{i.place}</Cell>
          <Cell>{INSPECTION_STATUS_LABELS[i.status]}</Cell>
          <Cell>{i.revision}</Cell>
        </tr>
      ))}
    </Table>
  );
}
