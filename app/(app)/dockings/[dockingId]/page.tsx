import type { Metadata } from "next";
import Link from "next/link";
import { DockingStatusActions } from "@/components/dockings/docking-status-actions";
import { EditDockingForm } from "@/components/dockings/edit-docking-form";
import { WorkListEditor } from "@/components/dockings/work-list-editor";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { Pager } from "@/components/ui/pager";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { formatMoney } from "@/lib/format";
import { workListQueryFromParams } from "@/lib/schemas/docking";
import { dockingIsFinal } from "@/lib/office/work-list";
import { getDockingPageAs } from "@/lib/services/dockings";
import { readVesselTanks } from "@/lib/services/tanks";
import { DOCKING_STATUS_LABELS } from "@/lib/vocabulary";

export const metadata: Metadata = { title: "Work list" };

type TSearch = Record<string, string | string[] | undefined>;

export default async function WorkListPage({ params, searchParams }: { params: Promise<{ dockingId: string }>; searchParams: Promise<TSearch> }) {
  const { dockingId } = await params;
  const actor = await pageActor();
  const asked = workListQueryFromParams(await searchParams);
  const view = asked.success ? asked.data : { page: 1, pageSize: 100 };
  const { vessel, docking, workList, paging, unpriced, sources, progress: allProgress } = await pageAuthorize(() => getDockingPageAs(actor, dockingId, view));
  // Any tank of the vessel may carry hand-added work, not only the tanks with a countersigned report.
  const { tanks } = await readVesselTanks(actor, vessel.id);
  const hrefFor = (page: number, tank = paging.tank) => {
    const q = new URLSearchParams();
    if (tank) q.set("tank", tank);
    if (page > 1) q.set("page", String(page));
    if (paging.pageSize !== 100) q.set("pageSize", String(paging.pageSize));
    const t = q.toString();
    return t ? `/dockings/${docking.id}?${t}` : `/dockings/${docking.id}`;
  };
  const viewQuery = hrefFor(paging.page).split("?")[1] ?? "";
  const rate = (n: number) => formatMoney(n, docking.currency, { rate: true });
  // The editor keeps the list it was given: new rates (saved above it) give it the list priced again.
  const ratesKey = [docking.currency, docking.steelRatePerKg, docking.coatingRatePerM2, docking.anodeRatePerPiece, docking.sedimentRatePerM3].join(":");
  const locked = dockingIsFinal(docking.status);
  const progress = docking.status === "in_progress" ? allProgress : null;
  return (
    <>
      <PageHeader
        title={`Work list: ${docking.yard}, ${docking.place}`}
        subtitle={
          <>
            <Link href={`/vessels/${vessel.id}/dockings`} className="underline">{vessel.name}</Link> · planned {docking.plannedOn} · {DOCKING_STATUS_LABELS[docking.status]} · rates in {docking.currency}
          </>
        }
      />
      <div className="space-y-4">
        {asked.success ? null : <Notice tone="error" title="This page of the work list cannot be shown">{asked.error.issues.map((i) => i.message).join("; ")}. Showing the first page.</Notice>}
        {locked ? <Notice tone="caution">This docking is {DOCKING_STATUS_LABELS[docking.status].toLowerCase()}: its work list can no longer be changed.</Notice> : null}
        <p className="text-sm text-slate-700">
          Gathered from {sources.length ? sources.map((s) => `${s.tankCode} (${s.inspectedOn})`).join(", ") : "no countersigned report yet"}. Rates: steel {rate(docking.steelRatePerKg)}/kg, coating {rate(docking.coatingRatePerM2)}/m², anodes {rate(docking.anodeRatePerPiece)}/piece, sediment {rate(docking.sedimentRatePerM3)}/m³.
        </p>
        <DockingStatusActions dockingId={docking.id} status={docking.status} />
        {locked ? null : (
          <details className="rounded-lg border border-slate-200 bg-white p-4 text-sm" data-testid="edit-docking">
            <summary className="cursor-pointer font-semibold text-slate-800">Edit the docking&apos;s details</summary>
            <EditDockingForm
              dockingId={docking.id}
              viewQuery={viewQuery}
              docking={{
                yard: docking.yard, place: docking.place, plannedOn: docking.plannedOn, currency: docking.currency,
                steelRatePerKg: docking.steelRatePerKg, coatingRatePerM2: docking.coatingRatePerM2, anodeRatePerPiece: docking.anodeRatePerPiece, sedimentRatePerM3: docking.sedimentRatePerM3,
              }}
            />
          </details>
        )}
        <form method="get" action={`/dockings/${docking.id}`} className="flex flex-wrap items-end gap-2 text-sm" aria-label="Show the items of one tank">
          <label className="text-sm">
            Tank
            <select name="tank" defaultValue={paging.tank ?? ""} className="mt-1 block rounded-md border border-slate-300 bg-white px-2 py-1">
              <option value="">All tanks</option>
              {sources.map((s) => (
                <option key={s.tankId} value={s.tankId}>{s.tankCode}</option>
              ))}
            </select>
          </label>
          <button type="submit" className="rounded-md border border-slate-300 bg-white px-3 py-1 font-semibold text-slate-800 hover:bg-slate-50">Show</button>
        </form>
        <Pager noun="Items" page={paging.page} totalPages={paging.totalPages} matching={paging.matching} pageSize={paging.pageSize} hrefFor={(page) => hrefFor(page)} />
        <WorkListEditor
          key={`${docking.status}:${viewQuery}:${ratesKey}`}
          dockingId={docking.id}
          viewQuery={viewQuery}
          itemsNote={paging.tank ? `Items of ${sources.find((s) => s.tankId === paging.tank)?.tankCode ?? "one tank"}; the totals below cover the whole list (${workList.counts.included + workList.counts.excluded} items).` : null}
          locked={locked}
          inProgress={docking.status === "in_progress"}
          progress={progress}
          tanks={tanks.map((t) => ({ id: t.id, code: t.code }))}
          initial={{
            currency: workList.currency,
            minorUnits: workList.minorUnits,
            grandTotal: workList.grandTotal,
            totals: workList.totals,
            items: workList.items.map((i) => ({
              id: i.id, tankCode: i.tankCode, kind: i.kind, description: i.description, unit: i.unit, quantity: i.quantity, adjustedQuantity: i.adjustedQuantity,
              adjustmentReason: i.adjustmentReason, included: i.included, quantityPriced: i.quantityPriced, unitRate: i.unitRate, cost: i.cost, doneAt: i.doneAt === null ? null : new Date(i.doneAt).toISOString(),
              addedReason: i.addedReason, addedByName: i.addedByName,
            })),
          }}
        />
        {unpriced.length ? (
          <Notice tone="caution" title="Open findings the yard cannot price">
            These open findings have no steel or coating quantity (monitor only, or not measured): {unpriced.map((u) => `${u.tankCode}: ${u.description}`).join("; ")}.
          </Notice>
        ) : null}
      </div>
    </>
  );
}
