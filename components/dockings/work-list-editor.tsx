"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { AddWorkItemForm } from "@/components/dockings/add-work-item-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Cell, Table } from "@/components/ui/table";
import { formatMoney } from "@/lib/format";
import { isGatheredKind, WORK_KIND_LABELS, WORK_KINDS, WORK_UNITS, type TWorkKind } from "@/lib/office/work-list";

export type TWorkListItemView = {
  id: string;
  tankCode: string | null;
  kind: TWorkKind;
  description: string;
  unit: string;
  quantity: number;
  adjustedQuantity: number | null;
  adjustmentReason: string | null;
  included: boolean;
  quantityPriced: number;
  unitRate: number;
  cost: number;
  done: boolean;
  /** Hand-added ("other") items: why and by whom. */
  addedReason: string | null;
  addedByName: string | null;
};
export type TWorkListView = {
  currency: string;
  minorUnits: number;
  items: TWorkListItemView[];
  /** quantity is null for hand-added work (mixed units). */
  totals: Record<TWorkKind, { quantity: number | null; cost: number; included: number; excluded: number }>;
  grandTotal: number;
};
type TServerList = Omit<TWorkListView, "items"> & { items: (Omit<TWorkListItemView, "done"> & { doneAt: string | null })[] };
type TErrorBody = { error?: { message?: string; issues?: { path: string; message: string }[] } };
type TDraft = { included: boolean; adjustedQuantity: string; adjustmentReason: string };

const quantityText = (q: number) => new Intl.NumberFormat("en", { maximumFractionDigits: 3 }).format(q);
/** A column head over right-aligned numbers, aligned with them. */
const numberHead = (label: string) => <span className="block text-right">{label}</span>;

const toView = (l: TServerList): TWorkListView => ({ ...l, items: l.items.map(({ doneAt, ...i }) => ({ ...i, done: doneAt !== null })) });

/**
 * The priced work list; the office includes, excludes or adjusts items with a
 * reason, adds work by hand and removes it again. Costs come from the server.
 */
export function WorkListEditor({
  dockingId,
  viewQuery,
  itemsNote,
  locked,
  inProgress,
  tanks,
  initial,
}: {
  dockingId: string;
  viewQuery: string;
  itemsNote: string | null;
  locked: boolean;
  inProgress: boolean;
  /** The vessel's tanks, for work added by hand. */
  tanks: readonly { id: string; code: string }[];
  initial: TWorkListView;
}) {
  const router = useRouter();
  const [list, setList] = useState(initial);
  const [editing, setEditing] = useState<string | null>(null);
  const [removing, setRemoving] = useState<string | null>(null);
  const [draft, setDraft] = useState<TDraft>({ included: true, adjustedQuantity: "", adjustmentReason: "" });
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const money = (n: number) => formatMoney(n, list.currency);

  async function send(url: string, init: RequestInit, done: string) {
    setBusy(true);
    setMessage(null);
    try {
      // The answer carries the page of items being shown (the totals cover every item).
      const res = await fetch(viewQuery ? `${url}?${viewQuery}` : url, init);
      const body = (await res.json().catch(() => ({}))) as TErrorBody & { workList?: TServerList };
      if (!res.ok || !body.workList) {
        const issue = body.error?.issues?.[0];
        return setMessage({ tone: "error", text: `${body.error?.message ?? "Nothing was changed."}${issue && !body.error?.message?.includes(issue.message) ? ` (${issue.message})` : ""}` });
      }
      setList(toView(body.workList));
      setEditing(null);
      setRemoving(null);
      setMessage({ tone: "success", text: done });
    } catch {
      setMessage({ tone: "error", text: "The server could not be reached; nothing was changed. Try again." });
    } finally {
      setBusy(false);
    }
  }

  function edit(item: TWorkListItemView) {
    setEditing(item.id);
    setDraft({ included: item.included, adjustedQuantity: item.adjustedQuantity === null ? "" : String(item.adjustedQuantity), adjustmentReason: item.adjustmentReason ?? "" });
  }

  function save(item: TWorkListItemView) {
    const adjusted = draft.adjustedQuantity.trim();
    const decision = { id: item.id, included: draft.included, adjustedQuantity: adjusted === "" ? null : adjusted, adjustmentReason: draft.adjustmentReason };
    return send(`/api/v1/dockings/${dockingId}/items`, { method: "PUT", headers: { "content-type": "application/json" }, body: JSON.stringify({ items: [decision] }) }, "Saved; the totals are priced again.");
  }

  // Adding or removing changes how many items there are: the server's pager above is read again.
  async function remove(item: TWorkListItemView) {
    await send(`/api/v1/dockings/${dockingId}/items/${item.id}`, { method: "DELETE" }, "Removed; the totals are priced again.");
    router.refresh();
  }

  function added(body: { workList: TServerList }) {
    setList(toView(body.workList));
    setEditing(null);
    setRemoving(null);
    setMessage({ tone: "success", text: "Added; the totals are priced again." });
    router.refresh();
  }

  function markDone(item: TWorkListItemView, done: boolean) {
    return send(`/api/v1/dockings/${dockingId}/done`, { method: "PUT", headers: { "content-type": "application/json" }, body: JSON.stringify({ itemIds: [item.id], done }) }, done ? "Marked done; a finding closes when all its items are done." : "Marked not done.");
  }

  return (
    <div className="space-y-4">
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
      <div className="flex flex-wrap gap-2">
        <a href={`/api/v1/dockings/${dockingId}/work-list.csv`} download className="rounded-md border border-slate-300 bg-white px-3 py-2 text-sm font-semibold text-slate-800 hover:bg-slate-50">Export CSV</a>
        <a href={`/api/v1/dockings/${dockingId}/work-list.pdf`} download className="rounded-md border border-slate-300 bg-white px-3 py-2 text-sm font-semibold text-slate-800 hover:bg-slate-50">Export PDF</a>
        {locked ? null : (
          <Button variant="secondary" disabled={busy} onClick={() => send(`/api/v1/dockings/${dockingId}/rebuild`, { method: "POST" }, "Gathered again from the latest countersigned reports; decisions were kept.")}>
            Gather again
          </Button>
        )}
      </div>
      {itemsNote ? <p className="text-sm text-slate-700">{itemsNote}</p> : null}
      {list.items.length ? (
        <Table head={["Tank", "Work", numberHead("Qty"), numberHead("Unit rate"), numberHead("Cost"), ""]} caption="Work list items">
          {list.items.map((i) => (
            <tr key={i.id} data-testid="work-item" className={i.included ? "" : "text-slate-500 line-through"}>
              <Cell className="whitespace-nowrap">{i.tankCode ?? "—"}</Cell>
              <Cell>
                {i.description}
                {isGatheredKind(i.kind) ? null : (
                  <span className="block text-xs text-slate-600 no-underline">
                    Added by hand{i.addedByName ? ` by ${i.addedByName}` : ""}: {i.addedReason}
                  </span>
                )}
                {i.adjustmentReason ? <span className="block text-xs text-slate-600 no-underline">Reason: {i.adjustmentReason}</span> : null}
                {editing === i.id ? (
                  <div className="mt-2 grid gap-2 rounded-md border border-slate-200 p-2 no-underline sm:grid-cols-3">
                    <label className="flex items-center gap-2 text-sm">
                      <input type="checkbox" checked={draft.included} onChange={(e) => setDraft((d) => ({ ...d, included: e.target.checked }))} /> Included
                    </label>
                    <label className="text-sm">
                      Adjusted quantity ({i.unit})
                      <input name="adjustedQuantity" inputMode="decimal" className="mt-1 block w-full rounded-md border border-slate-300 px-2 py-1" value={draft.adjustedQuantity} onChange={(e) => setDraft((d) => ({ ...d, adjustedQuantity: e.target.value }))} />
                    </label>
                    <label className="text-sm">
                      Reason
                      <input name="adjustmentReason" className="mt-1 block w-full rounded-md border border-slate-300 px-2 py-1" value={draft.adjustmentReason} onChange={(e) => setDraft((d) => ({ ...d, adjustmentReason: e.target.value }))} />
                    </label>
                    <div className="flex gap-2 sm:col-span-3">
                      <Button disabled={busy} onClick={() => save(i)}>Save</Button>
                      <Button variant="secondary" onClick={() => setEditing(null)}>Cancel</Button>
                    </div>
                  </div>
                ) : null}
              </Cell>
              <Cell className="whitespace-nowrap text-right">
                {quantityText(i.quantityPriced)} {i.unit}
                {i.adjustedQuantity !== null ? <span className="block text-xs text-slate-600">gathered {quantityText(i.quantity)}</span> : null}
              </Cell>
              <Cell className="whitespace-nowrap text-right">{formatMoney(i.unitRate, list.currency, { rate: true })}</Cell>
              <Cell className="whitespace-nowrap text-right">{money(i.cost)}</Cell>
              <Cell>
                {inProgress && i.included ? (
                  <Button variant={i.done ? "secondary" : "primary"} disabled={busy} onClick={() => markDone(i, !i.done)} aria-label={`${i.done ? "Not done" : "Mark done"}: ${i.description}`}>
                    {i.done ? "Not done" : "Mark done"}
                  </Button>
                ) : null}
                {i.done ? <span className="block text-sm font-semibold text-green-800 no-underline">Done</span> : null}
                {locked || editing === i.id ? null : <Button variant="secondary" onClick={() => edit(i)} aria-label={`Change ${i.description}`}>Change</Button>}
                {locked || isGatheredKind(i.kind) ? null : removing === i.id ? (
                  <span className="mt-1 flex flex-wrap items-center gap-1 text-sm no-underline">
                    Remove this item?
                    <Button variant="danger" disabled={busy} onClick={() => remove(i)} aria-label={`Yes, remove ${i.description}`}>Remove</Button>
                    <Button variant="secondary" onClick={() => setRemoving(null)}>Keep</Button>
                  </span>
                ) : (
                  <Button variant="danger" className="mt-1" onClick={() => setRemoving(i.id)} aria-label={`Remove ${i.description}`}>Remove</Button>
                )}
              </Cell>
            </tr>
          ))}
        </Table>
      ) : (
        <Notice>No work gathered: the vessel has no countersigned report with open findings, anodes to renew or sediment.</Notice>
      )}
      {locked ? null : <AddWorkItemForm<{ workList: TServerList }> dockingId={dockingId} viewQuery={viewQuery} currency={list.currency} tanks={tanks} onAdded={added} />}
      <section aria-labelledby="totals-heading">
        <h2 id="totals-heading" className="mb-2 text-lg font-semibold text-hull-900">Totals ({list.currency})</h2>
        <Table head={["Kind", numberHead("Quantity"), "Items", numberHead("Cost")]} caption="Totals per kind">
          {WORK_KINDS.map((k) => (
            <tr key={k} data-testid={`total-${k}`}>
              <Cell>{WORK_KIND_LABELS[k]}</Cell>
              <Cell className="text-right">
                {k === "other" || list.totals[k].quantity === null ? <span title="Mixed units: not summed">—</span> : `${quantityText(list.totals[k].quantity)} ${WORK_UNITS[k]}`}
              </Cell>
              <Cell>{list.totals[k].included} included{list.totals[k].excluded ? `, ${list.totals[k].excluded} excluded` : ""}</Cell>
              <Cell className="text-right">{money(list.totals[k].cost)}</Cell>
            </tr>
          ))}
          <tr data-testid="grand-total" className="font-semibold">
            <Cell>Grand total</Cell>
            <Cell>{""}</Cell>
            <Cell>{""}</Cell>
            <Cell className="text-right">{money(list.grandTotal)}</Cell>
          </tr>
        </Table>
      </section>
    </div>
  );
}
