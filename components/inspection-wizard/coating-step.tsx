"use client";

import { RatingMark } from "@/components/ui/rating-mark";
import { Cell, Table } from "@/components/ui/table";
import { rateCoatingArea, rateTank } from "@/lib/calc/coating";
import { astmD610Grade } from "@/lib/calc/rust-grade";
import { ZCoatingAreaInput, ZCoatingInput } from "@/lib/schemas/inspection";
import { COATING_AREA_LABELS, COATING_AREAS, type TCoatingArea } from "@/lib/vocabulary";
import { PartStatus } from "./inputs";
import { partUrl, type TView } from "./types";
import { usePart } from "./use-part";

type TRow = { breakdownPct: string; rustedPct: string; hardScalePct: string; edgesRustedPct: string; location: string };
type TRows = Record<TCoatingArea, TRow>;
const EMPTY: TRow = { breakdownPct: "", rustedPct: "", hardScalePct: "", edgesRustedPct: "", location: "" };
const filled = (r: TRow) => Object.values(r).some((v) => v.trim() !== "");

export function CoatingStep({ view }: { view: TView }) {
  const initial = Object.fromEntries(
    COATING_AREAS.map((a) => {
      const c = view.coating.find((x) => x.area === a);
      return [a, c ? { breakdownPct: String(c.breakdownPct), rustedPct: String(c.rustedPct), hardScalePct: String(c.hardScalePct), edgesRustedPct: c.edgesRustedPct === null ? "" : String(c.edgesRustedPct), location: c.location ?? "" } : EMPTY];
    }),
  ) as TRows;
  const part = usePart<TRows>({
    part: "coating",
    url: partUrl(view.inspection.id, "coating"),
    initial,
    schema: ZCoatingInput,
    toBody: (rows) => ({
      areas: COATING_AREAS.filter((a) => filled(rows[a])).map((a) => {
        const r = rows[a];
        return { area: a, breakdownPct: r.breakdownPct, rustedPct: r.rustedPct, hardScalePct: r.hardScalePct, ...(r.edgesRustedPct ? { edgesRustedPct: r.edgesRustedPct } : {}), ...(r.location ? { location: r.location } : {}) };
      }),
    }),
  });
  const rows = part.value;
  const rated = COATING_AREAS.flatMap((a) => {
    const p = ZCoatingAreaInput.safeParse({ area: a, ...rows[a], edgesRustedPct: rows[a].edgesRustedPct || undefined, location: rows[a].location || undefined });
    return p.success ? [{ area: a, rating: rateCoatingArea(p.data, view.twentyPercentRule), rusted: p.data.rustedPct }] : [];
  });
  const tank = rateTank(rated);
  const indexOf = (a: TCoatingArea) => COATING_AREAS.filter((x) => filled(rows[x])).indexOf(a);
  const err = (a: TCoatingArea, k: keyof TRow) => part.errors[`areas.${indexOf(a)}.${k}`];
  const input = (a: TCoatingArea, k: keyof TRow, label: string, wide = false) => (
    <div>
      <label className="sr-only" htmlFor={`${a}-${k}`}>{COATING_AREA_LABELS[a]}: {label}</label>
      <input
        id={`${a}-${k}`}
        inputMode={wide ? "text" : "decimal"}
        value={rows[a][k]}
        onChange={(e) => part.update({ ...rows, [a]: { ...rows[a], [k]: e.target.value } })}
        aria-invalid={err(a, k) ? true : undefined}
        className={`${wide ? "w-full min-w-40" : "w-20"} rounded border border-slate-300 px-2 py-1 aria-[invalid=true]:border-red-600`}
      />
      {err(a, k) ? <p className="text-xs text-red-700">{err(a, k)}</p> : null}
    </div>
  );
  return (
    <div className="space-y-3">
      <p className="text-sm text-slate-700">
        Give each area as percentages, never as a word. Rated by breakdown (or rusted area), hard scale and, where given, edges and welds rusted; the tank takes its worst area.
        At exactly 20 % breakdown this company rates {view.twentyPercentRule === "table" ? "FAIR (table of definitions)" : "POOR (\"20 % or more\")"}.
      </p>
      {tank ? <p className="text-base">Tank: <RatingMark kind={tank.rating} /> — worst area {COATING_AREA_LABELS[tank.worst.area]}: {tank.worst.rating.decidedBy}.</p> : null}
      <Table head={["Area", "Breakdown %", "Rusted %", "Hard scale %", "Edges/welds rusted %", "Where", "Rating", "Rust grade"]} caption="Coating condition per area">
        {COATING_AREAS.map((a) => {
          const r = rated.find((x) => x.area === a);
          return (
            <tr key={a}>
              <Cell className="font-semibold">{COATING_AREA_LABELS[a]}</Cell>
              <Cell>{input(a, "breakdownPct", "breakdown %")}</Cell>
              <Cell>{input(a, "rustedPct", "rusted area %")}</Cell>
              <Cell>{input(a, "hardScalePct", "hard scale %")}</Cell>
              <Cell>{input(a, "edgesRustedPct", "edges and welds rusted %")}</Cell>
              <Cell>{input(a, "location", "where", true)}</Cell>
              <Cell>{r ? <><RatingMark kind={r.rating.rating} /><span className="block text-xs text-slate-600">{r.rating.decidedBy}</span></> : <span className="text-xs text-slate-500">no percentage yet</span>}</Cell>
              <Cell>{r ? `ASTM D610 grade ${astmD610Grade(r.rusted)}` : "—"}</Cell>
            </tr>
          );
        })}
      </Table>
      <PartStatus refused={part.refused} errors={part.errors} dirty={part.dirty} />
    </div>
  );
}
