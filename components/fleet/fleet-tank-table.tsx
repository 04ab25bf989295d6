import Link from "next/link";
import { Cell, Table } from "@/components/ui/table";
import type { TFleetTank } from "@/lib/services/fleet";
import { RatingMark } from "@/components/ui/rating-mark";

const pct = (v: number) => `${Number.isInteger(v) ? v : v.toFixed(1)}\u00a0%`;

function DueCell({ tank }: { tank: TFleetTank }) {
  const due = tank.due;
  if (!due) return <span className="text-slate-600">No interval set</span>;
  if (due.status === "never_inspected") return <span className="font-semibold">Due now (never inspected)</span>;
  const days = due.daysUntilDue ?? 0;
  return (
    <span>
      <span className="font-mono">{due.dueOn}</span>
      {due.overdue ? (
        <span className="ml-2 inline-flex items-center gap-1 rounded border-2 border-slate-900 px-1 text-xs font-bold uppercase" data-overdue="true">
          <span aria-hidden="true">!</span> Overdue {-days} d
        </span>
      ) : (
        <span className="ml-2 text-xs text-slate-600">{days === 0 ? "due today" : `in ${days} d`}</span>
      )}
      <span className="block text-xs text-slate-600">every {due.intervalMonths} months</span>
    </span>
  );
}

export function FleetTankTable({ tanks }: { tanks: TFleetTank[] }) {
  return (
    <Table head={["Vessel", "Tank", "Coating (worst area)", "Last countersigned", "Next due", "Why"]} caption="Tanks with their latest rating and due date">
      {tanks.map((t) => (
        <tr key={t.tankId} data-tank={t.code}>
          <Cell>{t.vesselName}</Cell>
          <Cell>
            <Link href={`/vessels/${t.vesselId}/tanks/${t.tankId}/history`} className="font-semibold text-hull-700 hover:underline" aria-label={`${t.code}: history`} data-link="history">
              {t.code}
            </Link>
            <span className="block text-xs text-slate-600">{t.name}</span>
            <Link href={`/vessels/${t.vesselId}/tanks/${t.tankId}`} className="text-xs text-hull-700 underline hover:no-underline" aria-label={`${t.code}: structure map`} data-link="tank">
              Structure map
            </Link>
          </Cell>
          <Cell>
            <RatingMark kind={t.rating ? t.rating.rating : t.lastInspection ? "unrated" : "never"} />
            {t.rating ? (
              <span className="block text-xs text-slate-600">
                {t.rating.worstAreaLabel}: breakdown {pct(t.rating.breakdownPct)}
                {t.rating.rustedPct > t.rating.breakdownPct ? `, rusted ${pct(t.rating.rustedPct)}` : ""}
              </span>
            ) : null}
          </Cell>
          <Cell>
            {t.lastInspection ? (
              <Link href={`/inspections/${t.lastInspection.id}`} className="font-mono text-hull-700 hover:underline">
                {t.lastInspection.inspectedOn}
              </Link>
            ) : (
              "—"
            )}
            {t.lastInspection && t.lastInspection.revision > 1 ? <span className="block text-xs text-slate-600">revision {t.lastInspection.revision}</span> : null}
          </Cell>
          <Cell>
            <DueCell tank={t} />
          </Cell>
          <Cell className="max-w-md text-xs text-slate-700">
            <ul className="list-disc space-y-1 pl-4">
              {t.reasons.map((r, i) => (
                <li key={i}>
                  {r.text}
                  {r.source ? <span className="text-slate-500"> ({r.source})</span> : null}
                </li>
              ))}
            </ul>
          </Cell>
        </tr>
      ))}
    </Table>
  );
}
