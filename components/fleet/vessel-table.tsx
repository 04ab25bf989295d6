import Link from "next/link";
import { Cell, Table } from "@/components/ui/table";
import { VESSEL_TYPE_LABELS, type TVesselType } from "@/lib/vocabulary";

export type TVesselRow = {
  id: string;
  name: string;
  imoNumber: string;
  vesselType: TVesselType;
  flag: string | null;
  classSociety: string | null;
  tankCount: number;
};

export function VesselTable({ vessels, editHref }: { vessels: TVesselRow[]; editHref?: (id: string) => string }) {
  return (
    <Table head={["Vessel", "IMO number", "Type", "Flag", "Class", "Tanks", ...(editHref ? [""] : [])]} caption="Vessels">
      {vessels.map((v) => (
        <tr key={v.id}>
          <Cell>
            <Link href={`/vessels/${v.id}`} className="font-semibold text-hull-700 hover:underline">
              {v.name}
            </Link>
          </Cell>
          <Cell className="font-mono">{v.imoNumber}</Cell>
          <Cell>{VESSEL_TYPE_LABELS[v.vesselType]}</Cell>
          <Cell>{v.flag ?? "—"}</Cell>
          <Cell>{v.classSociety ?? "—"}</Cell>
          <Cell>{v.tankCount}</Cell>
          {editHref ? (
            <Cell>
              <Link href={editHref(v.id)} className="text-hull-700 hover:underline">
                Edit
              </Link>
            </Cell>
          ) : null}
        </tr>
      ))}
    </Table>
  );
}
