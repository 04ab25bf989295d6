"use client";

import Link from "next/link";
import { useMemo, useState } from "react";
import { Cell, Table } from "@/components/ui/table";
import { TANK_KIND_LABELS, TANK_SIDE_LABELS, type TTankKind, type TTankSide } from "@/lib/vocabulary";

export type TTankRow = { id: string; code: string; name: string; side: TTankSide; kind: TTankKind; frameFrom: number; frameTo: number; bottomAreaM2: number | null };
type TSortKey = "frameFrom" | "code" | "side" | "kind";

export function TankList({ vesselId, tanks }: { vesselId: string; tanks: TTankRow[] }) {
  const [query, setQuery] = useState("");
  const [side, setSide] = useState<"" | TTankSide>("");
  const [sort, setSort] = useState<TSortKey>("frameFrom");
  const rows = useMemo(() => {
    const q = query.trim().toLowerCase();
    return tanks
      .filter((t) => (!side || t.side === side) && (!q || `${t.code} ${t.name} ${TANK_KIND_LABELS[t.kind]}`.toLowerCase().includes(q)))
      .sort((a, b) => (sort === "frameFrom" ? a.frameFrom - b.frameFrom || a.code.localeCompare(b.code) : String(a[sort]).localeCompare(String(b[sort]), "en", { numeric: true })));
  }, [tanks, query, side, sort]);
  const sortButton = (key: TSortKey, label: string) => (
    <button type="button" onClick={() => setSort(key)} aria-pressed={sort === key} className={`uppercase ${sort === key ? "text-hull-900 underline" : ""}`}>
      {label}
    </button>
  );
  return (
    <div className="space-y-2">
      <div className="flex flex-wrap gap-2">
        <label className="sr-only" htmlFor="tank-filter">Filter tanks</label>
        <input id="tank-filter" type="search" placeholder="Filter by code, name or kind" value={query} onChange={(e) => setQuery(e.target.value)} className="min-w-56 flex-1 rounded-md border border-slate-300 px-3 py-2" />
        <label className="sr-only" htmlFor="tank-side">Side</label>
        <select id="tank-side" value={side} onChange={(e) => setSide(e.target.value as "" | TTankSide)} className="rounded-md border border-slate-300 px-3 py-2">
          <option value="">All sides</option>
          {Object.entries(TANK_SIDE_LABELS).map(([v, l]) => (
            <option key={v} value={v}>{l}</option>
          ))}
        </select>
      </div>
      <Table head={[sortButton("code", "Code"), "Name", sortButton("side", "Side"), sortButton("kind", "Kind"), sortButton("frameFrom", "Frames"), "Bottom area"]} caption="Ballast tanks">
        {rows.map((t) => (
          <tr key={t.id}>
            <Cell>
              <Link href={`/vessels/${vesselId}/tanks/${t.id}`} className="font-semibold text-hull-700 hover:underline">{t.code}</Link>
            </Cell>
            <Cell>{t.name}</Cell>
            <Cell>{TANK_SIDE_LABELS[t.side]}</Cell>
            <Cell>{TANK_KIND_LABELS[t.kind]}</Cell>
            <Cell className="whitespace-nowrap">Fr. {t.frameFrom}–{t.frameTo}</Cell>
            <Cell>{t.bottomAreaM2 !== null ? `${t.bottomAreaM2} m²` : "—"}</Cell>
          </tr>
        ))}
      </Table>
      <p className="text-xs text-slate-600">{rows.length ? `${rows.length} of ${tanks.length} tanks shown` : "No tank matches this filter."}</p>
    </div>
  );
}
