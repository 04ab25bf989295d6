import Link from "next/link";
import type { TFleetCounts } from "@/db/queries/fleet";
import type { TFleetRatingFilter } from "@/lib/schemas/fleet";
import { RatingSwatch } from "@/components/ui/rating-mark";

/** note: what else the count includes, part of the label. */
type TCount = { label: string; note?: string; value: number; href?: string; swatch?: "GOOD" | "FAIR" | "POOR" | "never" };

/**
 * The counts over every tank in view (the vessel filter narrows them, the other
 * filters do not). A count's link lists exactly the tanks it counts.
 */
export function FleetCounts({ counts, hrefFor, dueSoonDays }: { counts: TFleetCounts; hrefFor: (f: { rating?: TFleetRatingFilter; dueWithin?: number }) => string; dueSoonDays: number }) {
  const items: TCount[] = [
    { label: "Tanks", value: counts.tanks, href: hrefFor({}) },
    { label: "Overdue", value: counts.overdue },
    // The same definition as the dueWithin filter its link opens (db/queries/fleet.ts dueWithinWhere).
    { label: `Due within ${dueSoonDays} days`, note: "overdue, never inspected and no interval set included", value: counts.dueSoon, href: hrefFor({ dueWithin: dueSoonDays }) },
    { label: "POOR", value: counts.poor, href: hrefFor({ rating: "POOR" }), swatch: "POOR" },
    { label: "FAIR", value: counts.fair, href: hrefFor({ rating: "FAIR" }), swatch: "FAIR" },
    { label: "GOOD", value: counts.good, href: hrefFor({ rating: "GOOD" }), swatch: "GOOD" },
    { label: "Never inspected", value: counts.neverInspected, href: hrefFor({ rating: "never" }), swatch: "never" },
  ];
  return (
    <dl className="grid grid-cols-2 gap-2 sm:grid-cols-4 lg:grid-cols-7" aria-label="Counts">
      {items.map((c) => {
        const label = c.note ? `${c.label} (${c.note})` : c.label;
        return (
          <div key={c.label} className="flex flex-col justify-between rounded-lg border border-slate-200 bg-white px-3 py-2">
            <dt className="text-xs text-slate-600">
              <span className="flex items-center gap-1.5 font-semibold uppercase tracking-wide">
                {c.swatch ? <RatingSwatch kind={c.swatch} /> : null}
                {c.label}
              </span>
              {c.note ? <span className="block leading-tight">({c.note})</span> : null}
            </dt>
            <dd className="text-2xl font-bold text-hull-900">
              {c.href ? (
                <Link href={c.href} className="hover:underline" aria-label={`${label}: ${c.value}, show them`}>
                  {c.value}
                </Link>
              ) : (
                c.value
              )}
            </dd>
          </div>
        );
      })}
    </dl>
  );
}
