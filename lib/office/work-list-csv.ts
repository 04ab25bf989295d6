// The docking work list as CSV (RFC 4180: comma, CRLF, fields quoted when
// they hold a comma, a quote or a line break, quotes doubled). A text cell that
// a spreadsheet would run as a formula (=, +, -, @ first) gets a leading
// apostrophe. Costs carry the currency's minor unit; quantities up to 3 decimals.
// Work added by hand ("other") has its own unit rate on its row and its reason
// for being added in the Reason column; its total row has no quantity or unit
// (mixed units), only the counts and the cost. An excluded item's Cost cell is
// empty (Included says "no"), so the Cost column of the items adds up to the
// grand total, as a yard checks it.
import { WORK_KIND_LABELS, WORK_KINDS, WORK_UNITS, type TPricedWorkList, type TWorkKind } from "./work-list";

export const WORK_LIST_CSV_HEADER = ["Tank", "Kind", "Description", "Included", "Quantity gathered", "Adjusted quantity", "Quantity priced", "Unit", "Unit rate", "Currency", "Cost", "Reason"] as const;

export type TCsvItem = {
  tankCode: string | null;
  kind: TWorkKind;
  description: string;
  unit: string;
  quantity: number;
  /** Hand-added items: why the work was added. */
  addedReason?: string | null;
};

/** The Reason cell: why a hand-added item was added, then the reason of an exclusion or adjustment. */
function reasonText(i: TCsvItem & { adjustmentReason: string | null }): string {
  return [i.addedReason ? `Added: ${i.addedReason}` : null, i.adjustmentReason].filter(Boolean).join("; ");
}

export function csvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replaceAll('"', '""')}"` : value;
}

/** Text typed by a person: a leading apostrophe keeps a spreadsheet from running it as a formula. */
export function defuseFormula(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

export const csvQuantity = (q: number) => String(Number(q.toFixed(3)));
export const csvMoney = (amount: number, minorUnits: number) => amount.toFixed(minorUnits);

export function workListCsv<T extends TCsvItem>(list: TPricedWorkList<T>, head: { vesselName: string; yard: string; place: string; plannedOn: string }): string {
  const money = (n: number) => csvMoney(n, list.minorUnits);
  const rows: string[][] = [[...WORK_LIST_CSV_HEADER]];
  for (const i of list.items) {
    rows.push([
      defuseFormula(i.tankCode ?? ""),
      WORK_KIND_LABELS[i.kind],
      defuseFormula(i.description),
      i.included ? "yes" : "no",
      csvQuantity(i.quantity),
      i.adjustedQuantity === null ? "" : csvQuantity(i.adjustedQuantity),
      csvQuantity(i.quantityPriced),
      i.unit,
      String(i.unitRate),
      list.currency,
      i.included ? money(i.cost) : "",
      defuseFormula(reasonText(i)),
    ]);
  }
  for (const k of WORK_KINDS) {
    const t = list.totals[k];
    const [quantity, unit] = t.quantity === null || k === "other" ? ["", ""] : [csvQuantity(t.quantity), WORK_UNITS[k]];
    rows.push(["Total", WORK_KIND_LABELS[k], `${t.included} included, ${t.excluded} excluded`, "", "", "", quantity, unit, "", list.currency, money(t.cost), ""]);
  }
  rows.push(["Grand total", "", defuseFormula(`${head.vesselName}, ${head.yard}, ${head.place}, planned ${head.plannedOn}`), "", "", "", "", "", "", list.currency, money(list.grandTotal), ""]);
  return rows.map((r) => r.map(csvField).join(",")).join("\r\n") + "\r\n";
}
