import { Cell, Table } from "@/components/ui/table";
import { Notice } from "@/components/ui/notice";
import { TANK_KIND_LABELS, TANK_SIDE_LABELS, type TTankKind, type TTankSide } from "@/lib/vocabulary";

type TTank = { id: string; code: string; name: string; side: TTankSide; kind: TTankKind; frameFrom: number; frameTo: number; bottomAreaM2: number | null };

export function TankTable({ tanks }: { tanks: TTank[] }) {
  if (!tanks.length) return <Notice>No tanks on this vessel's structure map yet.</Notice>;
  return (
    <Table head={["Code", "Name", "Side", "Kind", "Frames", "Bottom area"]} caption="Ballast tanks">
      {tanks.map((t) => (
        <tr key={t.id}>
          <Cell className="font-semibold">{t.code}</Cell>
          <Cell>{t.name}</Cell>
          <Cell>{TANK_SIDE_LABELS[t.side]}</Cell>
          <Cell>{TANK_KIND_LABELS[t.kind]}</Cell>
          <Cell className="whitespace-nowrap">
            Fr. {t.frameFrom} – {t.frameTo}
          </Cell>
          <Cell>{t.bottomAreaM2 !== null ? `${t.bottomAreaM2} m²` : "—"}</Cell>
        </tr>
      ))}
    </Table>
  );
}
