import Link from "next/link";
import { FLEET_DUE_WITHIN_MAX, FLEET_RATING_FILTER_LABELS, FLEET_RATING_FILTERS, FLEET_SORT_LABELS, FLEET_SORTS } from "@/lib/schemas/fleet";

/** A plain GET form: the filters live in the URL, so a filtered view can be bookmarked and works without script. */
export function FleetFilters({ vessels, values }: { vessels: { id: string; name: string }[]; values: { vessel?: string; rating?: string; dueWithin?: string; sort?: string } }) {
  const box = "mt-1 block w-full rounded-md border border-slate-300 bg-white px-2 py-1.5 text-sm";
  return (
    <form method="get" action="/fleet" aria-label="Filter the tanks" className="flex flex-wrap items-end gap-3 rounded-lg border border-slate-200 bg-white p-3">
      <label className="text-sm font-medium text-slate-700">
        Vessel
        <select name="vessel" defaultValue={values.vessel ?? ""} className={box}>
          <option value="">All vessels</option>
          {vessels.map((v) => (
            <option key={v.id} value={v.id}>
              {v.name}
            </option>
          ))}
        </select>
      </label>
      <label className="text-sm font-medium text-slate-700">
        Rating
        <select name="rating" defaultValue={values.rating ?? ""} className={box}>
          <option value="">Any rating</option>
          {FLEET_RATING_FILTERS.map((r) => (
            <option key={r} value={r}>
              {FLEET_RATING_FILTER_LABELS[r]}
            </option>
          ))}
        </select>
      </label>
      <label className="text-sm font-medium text-slate-700">
        Due within (days)
        <input name="dueWithin" type="number" min={0} max={FLEET_DUE_WITHIN_MAX} step={1} defaultValue={values.dueWithin ?? ""} placeholder="any" className={`${box} w-32`} />
      </label>
      <label className="text-sm font-medium text-slate-700">
        Sort
        <select name="sort" defaultValue={values.sort ?? "vessel"} className={box}>
          {FLEET_SORTS.map((o) => (
            <option key={o} value={o}>
              {FLEET_SORT_LABELS[o]}
            </option>
          ))}
        </select>
      </label>
      <button type="submit" className="rounded-md bg-hull-700 px-3 py-1.5 text-sm font-semibold text-white hover:bg-hull-800">
        Show
      </button>
      <Link href="/fleet" className="py-1.5 text-sm text-hull-700 hover:underline">
        Clear filters
      </Link>
    </form>
  );
}
