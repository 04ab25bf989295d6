import type { Metadata } from "next";
import Link from "next/link";
import { DockingStatusActions } from "@/components/dockings/docking-status-actions";
import { WorkListEditor } from "@/components/dockings/work-list-editor";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { getDockingAs } from "@/lib/services/dockings";
import { DOCKING_STATUS_LABELS } from "@/lib/vocabulary";

export const metadata: Metadata = { title: "Work list" };

export default async function WorkListPage({ params }: { params: Promise<{ dockingId: string }> }) {
  const { dockingId } = await params;
  const actor = await pageActor();
  const { vessel, docking, workList, unpriced, sources } = await pageAuthorize(() => getDockingAs(actor, dockingId));
  const locked = docking.status === "completed" || docking.status === "cancelled";
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
        {locked ? <Notice tone="caution">This docking is {DOCKING_STATUS_LABELS[docking.status].toLowerCase()}: its work list can no longer be changed.</Notice> : null}
        <p className="text-sm text-slate-700">
          Gathered from {sources.length ? sources.map((s) => `${s.tankCode} (${s.inspectedOn})`).join(", ") : "no countersigned report yet"}. Rates: steel {docking.steelRatePerKg}/kg, coating {docking.coatingRatePerM2}/m², anodes {docking.anodeRatePerPiece}/piece, sediment {docking.sedimentRatePerM3}/m³.
        </p>
        <DockingStatusActions dockingId={docking.id} status={docking.status} />
        <WorkListEditor
          key={docking.status}
          dockingId={docking.id}
          locked={locked}
          inProgress={docking.status === "in_progress"}
          initial={{
            currency: workList.currency,
            minorUnits: workList.minorUnits,
            grandTotal: workList.grandTotal,
            totals: workList.totals,
            items: workList.items.map((i) => ({
              id: i.id, tankCode: i.tankCode, kind: i.kind, description: i.description, unit: i.unit, quantity: i.quantity, adjustedQuantity: i.adjustedQuantity,
              adjustmentReason: i.adjustmentReason, included: i.included, quantityPriced: i.quantityPriced, unitRate: i.unitRate, cost: i.cost, done: i.doneAt !== null,
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
