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
  /** When the item was marked done (ISO time), or null. */
  doneAt: string | null;
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
type TErrorBody = { error?: { message?: string; issues?: { path: string; message: string }[] } };
type TDraft = { included: boolean; adjustedQuantity: string; adjustmentReason: string };
type TDraftField = keyof TDraft;
const DRAFT_LABELS: Record<TDraftField, string> = { included: "Included", adjustedQuantity: "Adjusted quantity", adjustmentReason: "Reason" };

const quantityText = (q: number) => new Intl.NumberFormat("en", { maximumFractionDigits: 3 }).format(q);
/** A column head over right-aligned numbers, aligned with them. */
const numberHead = (label: string) => <span className="block text-right">{label}</span>;

/** "2026-12-02": the day an item was marked done, written as the product writes dates (UTC). */
const doneDay = (doneAt: string) => new Date(doneAt).toISOString().slice(0, 10);
/** A field's message next to it: "Adjusted quantity cannot be negative". */
const fieldMessage = (field: TDraftField, message: string) => (/^[a-z]/.test(message) ? `${DRAFT_LABELS[field]} ${message}` : message);

/**
 * The priced work list; the office includes, excludes or adjusts items with a
 * reason, adds work by hand and removes it again. Costs come from the server.
 * An excluded item says "Excluded" and shows no cost (as in the exports); its
 * reason stays readable. While the docking is in progress each included item
 * is marked done (and can be undone), with the progress over the whole list.
 */
export function WorkListEditor({
  dockingId,
  viewQuery,
  itemsNote,
  locked,
  inProgress,
  progress,
  tanks,
  initial,
}: {
  dockingId: string;
  viewQuery: string;
  itemsNote: string | null;
  locked: boolean;
  inProgress: boolean;
  /** Over the whole list (not only this page), read by the page while the docking is in progress. */
  progress: { done: number; included: number } | null;
  /** The vessel's tanks, for work added by hand. */
  tanks: readonly { id: string; code: string }[];
  initial: TWorkListView;
}) {
  const router = useRouter();
  const [list, setList] = useState(initial);
  const [editing, setEditing] = useState<string | null>(null);
  const [removing, setRemoving] = useState<string | null>(null);
  const [draft, setDraft] = useState<TDraft>({ included: true, adjustedQuantity: "", adjustmentReason: "" });
  const [fieldErrors, setFieldErrors] = useState<Partial<Record<TDraftField, string>>>({});
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const money = (n: number) => formatMoney(n, list.currency);

  async function send(url: string, init: RequestInit, done: string) {
    setBusy(true);
    setMessage(null);
    setFieldErrors({});
    try {
      // The answer carries the page of items being shown (the totals cover every item).
      const res = await fetch(viewQuery ? `${url}?${viewQuery}` : url, init);
      const body = (await res.json().catch(() => ({}))) as TErrorBody & { workList?: TWorkListView };
      if (!res.ok || !body.workList) {
        // A refused change of one item: each message beside its field, what was typed kept.
        const found: Partial<Record<TDraftField, string>> = {};
        for (const i of body.error?.issues ?? []) {
          const field = /^items\.0\.(\w+)$/.exec(i.path)?.[1];
          if (field && field in DRAFT_LABELS) found[field as TDraftField] ??= fieldMessage(field as TDraftField, i.message);
        }
        setFieldErrors(found);
        if (Object.keys(found).length) return setMessage({ tone: "error", text: "Check the marked fields; nothing was changed." });
        const issue = body.error?.issues?.[0];
        return setMessage({ tone: "error", text: `${body.error?.message ?? "Nothing was changed."}${issue && !body.error?.message?.includes(issue.message) ? ` (${issue.message})` : ""}` });
      }
      setList(body.workList);
      setEditing(null);
      setRemoving(null);
      setMessage({ tone: "success", text: done });
      // The progress line counts the whole list: the page reads it again.
      if (inProgress) router.refresh();
    } catch {
      setMessage({ tone: "error", text: "The server could not be reached; nothing was changed. Try again." });
    } finally {
      setBusy(false);
    }
  }

  function edit(item: TWorkListItemView) {
    setEditing(item.id);
    setFieldErrors({});
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

  function added(body: { workList: TWorkListView }) {
    setList(body.workList);
    setEditing(null);
    setRemoving(null);
    setMessage({ tone: "success", text: "Added; the totals are priced again." });
    router.refresh();
  }

  function markDone(item: TWorkListItemView, done: boolean) {
    return send(`/api/v1/dockings/${dockingId}/done`, { method: "PUT", headers: { "content-type": "application/json" }, body: JSON.stringify({ itemIds: [item.id], done }) }, done ? "Marked done; a finding closes when all its items are done." : "Marked not done again; its finding is open until all its items are done.");
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
      {inProgress && progress ? (
        <p className="text-sm font-semibold text-slate-800" data-testid="done-progress">
          {progress.done} of {progress.included} included items done
        </p>
      ) : null}
      {list.items.length ? (
        <Table head={["Tank", "Work", numberHead("Qty"), numberHead("Unit rate"), numberHead("Cost"), ""]} caption="Work list items">
          {list.items.map((i) => (
            <tr key={i.id} data-testid="work-item" className={i.included ? "" : "bg-slate-50 text-slate-600"}>
              <Cell className="whitespace-nowrap">{i.tankCode ?? "—"}</Cell>
              {editing === i.id ? (
                // The change panel takes the width of the work and figures columns, so it is usable on a tablet.
                <td colSpan={4} className="px-3 py-2 align-top">
                  <span className="block">{i.description}</span>
                  <span className="block text-xs text-slate-600">
                    Gathered {quantityText(i.quantity)} {i.unit}; priced {quantityText(i.quantityPriced)} {i.unit} at {formatMoney(i.unitRate, list.currency, { rate: true })}
                  </span>
                  <div className="mt-2 space-y-3 rounded-md border border-slate-300 bg-white p-3">
                    <label className="flex items-center gap-2 text-sm font-semibold text-slate-800">
                      <input type="checkbox" className="h-5 w-5" checked={draft.included} onChange={(e) => setDraft((d) => ({ ...d, included: e.target.checked }))} /> Included
                    </label>
                    {fieldErrors.included ? <p role="alert" className="text-sm text-red-700">{fieldErrors.included}</p> : null}
                    <div>
                      <label htmlFor={`adjusted-${i.id}`} className="block text-sm font-semibold text-slate-800">Adjusted quantity ({i.unit})</label>
                      <input
                        id={`adjusted-${i.id}`}
                        name="adjustedQuantity"
                        inputMode="decimal"
                        aria-invalid={fieldErrors.adjustedQuantity ? true : undefined}
                        aria-describedby={fieldErrors.adjustedQuantity ? `adjusted-${i.id}-error` : `adjusted-${i.id}-hint`}
                        className="mt-1 block w-full max-w-xs rounded-md border border-slate-300 px-3 py-2 aria-[invalid=true]:border-red-600"
                        value={draft.adjustedQuantity}
                        onChange={(e) => setDraft((d) => ({ ...d, adjustedQuantity: e.target.value }))}
                      />
                      {fieldErrors.adjustedQuantity ? (
                        <p id={`adjusted-${i.id}-error`} role="alert" className="mt-1 text-sm text-red-700">{fieldErrors.adjustedQuantity}</p>
                      ) : (
                        <p id={`adjusted-${i.id}-hint`} className="mt-1 text-xs text-slate-600">Empty to price the gathered {quantityText(i.quantity)} {i.unit}</p>
                      )}
                    </div>
                    <div>
                      <label htmlFor={`reason-${i.id}`} className="block text-sm font-semibold text-slate-800">Reason</label>
                      <textarea
                        id={`reason-${i.id}`}
                        name="adjustmentReason"
                        rows={2}
                        aria-invalid={fieldErrors.adjustmentReason ? true : undefined}
                        aria-describedby={fieldErrors.adjustmentReason ? `reason-${i.id}-error` : `reason-${i.id}-hint`}
                        className="mt-1 block w-full rounded-md border border-slate-300 px-3 py-2 aria-[invalid=true]:border-red-600"
                        value={draft.adjustmentReason}
                        onChange={(e) => setDraft((d) => ({ ...d, adjustmentReason: e.target.value }))}
                      />
                      {fieldErrors.adjustmentReason ? (
                        <p id={`reason-${i.id}-error`} role="alert" className="mt-1 text-sm text-red-700">{fieldErrors.adjustmentReason}</p>
                      ) : (
                        <p id={`reason-${i.id}-hint`} className="mt-1 text-xs text-slate-600">Required to exclude the item or change its quantity</p>
                      )}
                    </div>
                    <div className="flex flex-wrap gap-2">
                      <Button disabled={busy} onClick={() => save(i)}>Save</Button>
                      <Button variant="secondary" onClick={() => setEditing(null)}>Cancel</Button>
                    </div>
                  </div>
                </td>
              ) : (
                <>
                  <Cell>
                    {i.included ? null : <span className="inline-block rounded bg-slate-200 px-1.5 py-0.5 text-xs font-semibold text-slate-800">Excluded</span>}
                    {i.included ? null : " "}
                    <span className={i.included ? "" : "line-through"}>{i.description}</span>
                    {isGatheredKind(i.kind) ? null : (
                      <span className="block text-xs text-slate-600">
                        Added by hand{i.addedByName ? ` by ${i.addedByName}` : ""}: {i.addedReason}
                      </span>
                    )}
                    {i.adjustmentReason ? <span className="block text-xs text-slate-700">Reason: {i.adjustmentReason}</span> : null}
                  </Cell>
                  <Cell className="whitespace-nowrap text-right">
                    {quantityText(i.quantityPriced)} {i.unit}
                    {i.adjustedQuantity !== null ? <span className="block text-xs text-slate-600">gathered {quantityText(i.quantity)}</span> : null}
                  </Cell>
                  <Cell className="whitespace-nowrap text-right">{formatMoney(i.unitRate, list.currency, { rate: true })}</Cell>
                  <Cell className="whitespace-nowrap text-right">{i.included ? money(i.cost) : <span title="Excluded: not in the totals">—</span>}</Cell>
                </>
              )}
              <Cell>
                <div className="flex flex-col items-start gap-1">
                  {i.doneAt ? (
                    <span className="whitespace-nowrap text-sm font-semibold text-green-800" data-testid="item-done">Done {doneDay(i.doneAt)}</span>
                  ) : null}
                  {inProgress && i.included ? (
                    i.doneAt ? (
                      <Button variant="secondary" className="whitespace-nowrap" disabled={busy} onClick={() => markDone(i, false)} aria-label={`Undo done: ${i.description}`}>Undo</Button>
                    ) : (
                      <Button className="whitespace-nowrap" disabled={busy} onClick={() => markDone(i, true)} aria-label={`Mark done: ${i.description}`}>Mark done</Button>
                    )
                  ) : null}
                  {locked || editing === i.id ? null : <Button variant="secondary" onClick={() => edit(i)} aria-label={`Change ${i.description}`}>Change</Button>}
                  {locked || isGatheredKind(i.kind) ? null : removing === i.id ? (
                    <span className="flex flex-wrap items-center gap-1 text-sm">
                      Remove this item?
                      <Button variant="danger" disabled={busy} onClick={() => remove(i)} aria-label={`Yes, remove ${i.description}`}>Remove</Button>
                      <Button variant="secondary" onClick={() => setRemoving(null)}>Keep</Button>
                    </span>
                  ) : (
                    <Button variant="danger" onClick={() => setRemoving(i.id)} aria-label={`Remove ${i.description}`}>Remove</Button>
                  )}
                </div>
              </Cell>
            </tr>
          ))}
        </Table>
      ) : (
        <Notice>No work gathered: the vessel has no countersigned report with open findings, anodes to renew or sediment.</Notice>
      )}
      {locked ? null : <AddWorkItemForm<{ workList: TWorkListView }> dockingId={dockingId} viewQuery={viewQuery} currency={list.currency} tanks={tanks} onAdded={added} />}
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
