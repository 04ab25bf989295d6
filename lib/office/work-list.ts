// The docking work list: what each tank's latest countersigned inspection asks
// the yard to do (steel renewal, coating repair, anodes, sediment removal), and
// what it costs at the docking's unit rates; plus the work the superintendent
// adds by hand ("other": staging, gas-freeing, cleaning, attendance, lump sums),
// each item priced at its own unit rate.
//
// "Other" items come in mixed units (days, m², lump sum), so their quantities
// are never summed: the kind's total carries its cost and item counts, and its
// quantity is null (shown as a dash).
//
// Rounding: every quantity and cost is carried unrounded; each cost shown (per
// item, per kind, grand total) is rounded on its own, once, at the end, to the
// currency's minor unit (cents for USD or EUR, whole yen for JPY), half away
// from zero. The grand total is therefore the rounded sum of the exact costs,
// and may differ by a cent from the sum of the rounded item costs.
import { AppError } from "@/lib/errors";
import { totalVolumeM3 } from "@/lib/calc/sediment";
import { FINDING_TYPE_LABELS, MEMBER_KIND_LABELS, PLATING_REGION_LABELS, REPAIR_KIND_LABELS, type FINDING_STATUSES, type TDockingStatus, type TFindingType, type TMemberKind, type TPlatingRegion, type TRepairKind } from "@/lib/vocabulary";

/** The kinds gathered from countersigned reports and priced at the docking's rates. */
export const GATHERED_KINDS = ["steel", "coating", "anodes", "sediment"] as const;
export type TGatheredKind = (typeof GATHERED_KINDS)[number];
/** Every kind of a work list, in its order: the gathered kinds, then the work added by hand. */
export const WORK_KINDS = [...GATHERED_KINDS, "other"] as const;
export type TWorkKind = (typeof WORK_KINDS)[number];
export const WORK_UNITS: Record<TGatheredKind, string> = { steel: "kg", coating: "m²", anodes: "pcs", sediment: "m³" };
export const WORK_KIND_LABELS: Record<TWorkKind, string> = {
  steel: "Steel renewal",
  coating: "Coating repair",
  anodes: "Anode renewal",
  sediment: "Sediment removal",
  other: "Other work (added by hand)",
};
export const isGatheredKind = (kind: string): kind is TGatheredKind => (GATHERED_KINDS as readonly string[]).includes(kind);
export const isWorkKind = (kind: string): kind is TWorkKind => (WORK_KINDS as readonly string[]).includes(kind);

/** A completed or cancelled docking is final: its details and its work list can no longer be changed. */
export const dockingIsFinal = (status: TDockingStatus) => status === "completed" || status === "cancelled";

// ---------------------------------------------------------------- gathering

export type TWorkSourceFinding = {
  id: string;
  number: number;
  status: (typeof FINDING_STATUSES)[number];
  type: TFindingType;
  frameFrom: number;
  frameTo: number;
  memberKind: TMemberKind;
  memberNumber?: number | null;
  platingRegion?: TPlatingRegion | null;
  repairKind?: TRepairKind | null;
  /** Stored with the finding, computed by lib/inspection/quantities.ts. */
  steelWeightKg: number | null;
  coatingRepairM2: number | null;
};

/** One tank's latest countersigned inspection, as far as the work list needs it. */
export type TWorkSource = {
  tankId: string;
  tankCode: string;
  inspectionId: string;
  inspectedOn: string;
  findings: readonly TWorkSourceFinding[];
  anodes: { toRenewCount: number } | null;
  /** Each zone with what the surveyor called it ("Bottom between the floors, aft end"), to tell the yard where. */
  sedimentZones: readonly { label: string; depthMm: number; areaM2: number }[];
};

export type TWorkItem = {
  /** Stable across rebuilds of the list: finding id and kind, or tank id and kind. */
  key: string;
  kind: TGatheredKind;
  tankId: string;
  tankCode: string;
  inspectionId: string;
  findingId: string | null;
  description: string;
  unit: string;
  quantity: number;
};

/** An open finding with neither steel nor coating quantity: the yard cannot price it (monitor only, or not measured). */
export type TUnpricedFinding = { tankId: string; tankCode: string; findingId: string; description: string };

function describeFinding(f: TWorkSourceFinding): string {
  const member = f.memberKind === "plating" && f.platingRegion ? `${PLATING_REGION_LABELS[f.platingRegion]} plating` : MEMBER_KIND_LABELS[f.memberKind];
  const number = f.memberNumber === null || f.memberNumber === undefined ? "" : ` ${f.memberNumber}`;
  const frames = f.frameFrom === f.frameTo ? `Fr. ${f.frameFrom}` : `Fr. ${f.frameFrom}–${f.frameTo}`;
  return `Finding ${f.number}: ${FINDING_TYPE_LABELS[f.type]}, ${frames}, ${member}${number}`;
}

/**
 * Where the sediment is to be removed: the zones that hold any, by their
 * labels, separated by semicolons (a label may hold a comma):
 * "Sediment removal, 2 zones: Bottom between the floors, aft end; Stringer 2, forward".
 */
function describeSediment(zones: TWorkSource["sedimentZones"]): string {
  const labels = zones.filter((z) => totalVolumeM3([z]) > 0).map((z) => z.label.trim() || "zone without a label");
  return `Sediment removal, ${labels.length} zone${labels.length === 1 ? "" : "s"}: ${labels.join("; ")}`;
}

/**
 * The work items of the given inspections, one per tank (its latest
 * countersigned inspection): per open finding a steel item (kg) and a coating
 * item (m²) where it has them, per tank an anode item (pieces to renew) and a
 * sediment item (m³, all zones, named by their labels). Findings under monitoring or closed are left
 * out; open findings without quantities come back as `unpriced`. Never
 * produces "other": that work is added by hand.
 */
export function gatherWorkItems(sources: readonly TWorkSource[]): { items: TWorkItem[]; unpriced: TUnpricedFinding[] } {
  const items: TWorkItem[] = [];
  const unpriced: TUnpricedFinding[] = [];
  const seen = new Set<string>();
  for (const s of sources) {
    if (seen.has(s.tankId)) throw new Error(`tank ${s.tankCode} is given twice: pass only its latest countersigned inspection`);
    seen.add(s.tankId);
    const base = { tankId: s.tankId, tankCode: s.tankCode, inspectionId: s.inspectionId };
    const findings = s.findings.filter((f) => f.status === "open").sort((a, b) => a.number - b.number);
    for (const f of findings) {
      const where = describeFinding(f);
      const repair = f.repairKind ? ` (${REPAIR_KIND_LABELS[f.repairKind].toLowerCase()})` : "";
      const steel = f.steelWeightKg ?? 0;
      const coating = f.coatingRepairM2 ?? 0;
      if (steel > 0) items.push({ ...base, key: `${f.id}:steel`, kind: "steel", findingId: f.id, description: `${where}: steel renewal${repair}`, unit: WORK_UNITS.steel, quantity: steel });
      if (coating > 0) items.push({ ...base, key: `${f.id}:coating`, kind: "coating", findingId: f.id, description: `${where}: coating repair${repair}`, unit: WORK_UNITS.coating, quantity: coating });
      if (steel <= 0 && coating <= 0) unpriced.push({ tankId: s.tankId, tankCode: s.tankCode, findingId: f.id, description: where });
    }
    if (s.anodes && s.anodes.toRenewCount > 0) {
      items.push({ ...base, key: `${s.tankId}:anodes`, kind: "anodes", findingId: null, description: "Anodes to renew", unit: WORK_UNITS.anodes, quantity: s.anodes.toRenewCount });
    }
    const volume = totalVolumeM3(s.sedimentZones);
    if (volume > 0) items.push({ ...base, key: `${s.tankId}:sediment`, kind: "sediment", findingId: null, description: describeSediment(s.sedimentZones), unit: WORK_UNITS.sediment, quantity: volume });
  }
  return { items, unpriced };
}

// ---------------------------------------------------------------- pricing

/** The docking's unit rates, in one currency (the names of the dockings table). */
export type TDockingRates = { currency: string; steelRatePerKg: number; coatingRatePerM2: number; anodeRatePerPiece: number; sedimentRatePerM3: number };

/** The superintendent's decision on an item: excluded, or its quantity replaced (with a reason). Defaults: included, not adjusted. */
export type TWorkItemDecision = { included?: boolean; adjustedQuantity?: number | null; adjustmentReason?: string | null };

export type TPricedWorkItem<T> = T & {
  included: boolean;
  adjusted: boolean;
  adjustedQuantity: number | null;
  adjustmentReason: string | null;
  /** The quantity priced: the adjusted one where there is one. */
  quantityPriced: number;
  /** The docking's rate for the kind, or a hand-added item's own rate. */
  unitRate: number;
  /** quantityPriced × unitRate, rounded to the minor unit; shown for excluded items too, never added to the totals. */
  cost: number;
};

export type TKindTotal = { quantity: number; cost: number; included: number; excluded: number };
/** Hand-added work: mixed units, so no total quantity (null), only the cost and the counts. */
export type TOtherTotal = { quantity: null; cost: number; included: number; excluded: number };
export type TKindTotals = Record<TGatheredKind, TKindTotal> & { other: TOtherTotal };
export type TPricedWorkList<T> = {
  currency: string;
  minorUnits: number;
  items: TPricedWorkItem<T>[];
  /** Per kind, over included items: quantity priced (unrounded; null for "other"), cost (rounded), item counts. */
  totals: TKindTotals;
  grandTotal: number;
  counts: { included: number; excluded: number; adjusted: number };
};

const RATE_OF: Record<TGatheredKind, keyof Omit<TDockingRates, "currency">> = {
  steel: "steelRatePerKg",
  coating: "coatingRatePerM2",
  anodes: "anodeRatePerPiece",
  sediment: "sedimentRatePerM3",
};

/** Digits after the decimal point of a currency (2 for USD, 0 for JPY, 3 for KWD). */
export function currencyMinorUnits(currency: string): number {
  return new Intl.NumberFormat("en", { style: "currency", currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/**
 * Rounds a money amount to `digits` decimals, half away from zero. The scaled
 * value is first read to 12 significant digits so that binary noise does not
 * decide the half (1.005 × 100 is 100.49999999999999 in floating point).
 */
export function roundMoney(amount: number, digits: number): number {
  const scaled = Number((Math.abs(amount) * 10 ** digits).toPrecision(12));
  const rounded = (Math.sign(amount) * Math.round(scaled)) / 10 ** digits;
  return rounded === 0 ? 0 : rounded;
}

/** Over the included items of one kind: the quantity priced, summed; and how many items are included and excluded. */
export type TKindSum = { quantity: number; included: number; excluded: number };
/** Over the included "other" items: the exact cost, Σ quantity priced × the item's own rate (unrounded); and the counts. */
export type TOtherSum = { cost: number; included: number; excluded: number };
export type TKindSums = Record<TGatheredKind, TKindSum> & { other: TOtherSum };

/** Sums with nothing in them, to add to. */
export function emptyKindSums(): TKindSums {
  const gathered = Object.fromEntries(GATHERED_KINDS.map((k) => [k, { quantity: 0, included: 0, excluded: 0 }])) as Record<TGatheredKind, TKindSum>;
  return { ...gathered, other: { cost: 0, included: 0, excluded: 0 } };
}

function checkRates(rates: TDockingRates): { path: string; message: string }[] {
  return GATHERED_KINDS.flatMap((kind) => {
    const rate = rates[RATE_OF[kind]];
    return !Number.isFinite(rate) || rate < 0 ? [{ path: RATE_OF[kind], message: "must be a number, 0 or more" }] : [];
  });
}

/**
 * The totals of a work list from each kind's sum: cost per kind and grand
 * total, each rounded once from the exact amount (a gathered kind's summed
 * quantity × the docking's rate; for "other", the summed exact cost of its
 * items, each at its own rate). priceWorkList uses it over its items; a server
 * reading a long list sums in the database and prices only the page it shows.
 */
export function priceKindSums(sums: TKindSums, rates: TDockingRates, adjusted: number): Omit<TPricedWorkList<never>, "items"> {
  const issues = checkRates(rates);
  if (!Number.isFinite(sums.other.cost) || sums.other.cost < 0) issues.push({ path: "other.cost", message: "must be a number, 0 or more" });
  if (issues.length) throw new AppError("unprocessable", "The work list cannot be priced as it is.", issues);
  const minorUnits = currencyMinorUnits(rates.currency);
  const exact = { ...(Object.fromEntries(GATHERED_KINDS.map((k) => [k, sums[k].quantity * rates[RATE_OF[k]]])) as Record<TGatheredKind, number>), other: sums.other.cost };
  const gathered = Object.fromEntries(GATHERED_KINDS.map((k) => [k, { ...sums[k], cost: roundMoney(exact[k], minorUnits) }])) as Record<TGatheredKind, TKindTotal>;
  const totals: TKindTotals = { ...gathered, other: { quantity: null, cost: roundMoney(exact.other, minorUnits), included: sums.other.included, excluded: sums.other.excluded } };
  const grandTotal = roundMoney(WORK_KINDS.reduce((sum, k) => sum + exact[k], 0), minorUnits);
  const counts = { included: WORK_KINDS.reduce((n, k) => n + sums[k].included, 0), excluded: WORK_KINDS.reduce((n, k) => n + sums[k].excluded, 0), adjusted };
  return { currency: rates.currency, minorUnits, totals, grandTotal, counts };
}

/**
 * Prices work items: gathered kinds at the docking's rates, "other" items at
 * their own `unitRate`. Each item may carry the superintendent's decision; an
 * adjusted quantity replaces the gathered one and needs a reason. Refuses (422)
 * a negative or non-numeric rate or quantity, an "other" item without its own
 * rate, or an adjustment without a reason; the docking schemas refuse them first.
 */
export function priceWorkList<T extends { key: string; kind: TWorkKind; quantity: number; unitRate?: number | null } & TWorkItemDecision>(items: readonly T[], rates: TDockingRates): TPricedWorkList<T> {
  const issues = checkRates(rates);
  const minorUnits = currencyMinorUnits(rates.currency);
  const sums = emptyKindSums();
  let adjustedCount = 0;
  const priced = items.map((item) => {
    const included = item.included ?? true;
    const adjustedQuantity = item.adjustedQuantity ?? null;
    const adjustmentReason = item.adjustmentReason?.trim() || null;
    if (!Number.isFinite(item.quantity) || item.quantity < 0) issues.push({ path: `${item.key}.quantity`, message: "must be a number, 0 or more" });
    if (adjustedQuantity !== null) {
      if (!Number.isFinite(adjustedQuantity) || adjustedQuantity < 0) issues.push({ path: `${item.key}.adjustedQuantity`, message: "must be a number, 0 or more" });
      if (!adjustmentReason) issues.push({ path: `${item.key}.adjustmentReason`, message: "is required: say why the quantity was changed" });
      adjustedCount += 1;
    }
    const quantityPriced = adjustedQuantity ?? item.quantity;
    const own = item.unitRate ?? null;
    if (item.kind === "other" && (own === null || !Number.isFinite(own) || own < 0)) issues.push({ path: `${item.key}.unitRate`, message: "must be a number, 0 or more: work added by hand carries its own rate" });
    const unitRate = item.kind === "other" ? (own ?? 0) : rates[RATE_OF[item.kind]];
    if (item.kind === "other") {
      const sum = sums.other;
      if (included) {
        sum.cost += quantityPriced * unitRate;
        sum.included += 1;
      } else {
        sum.excluded += 1;
      }
    } else {
      const sum = sums[item.kind];
      if (included) {
        sum.quantity += quantityPriced;
        sum.included += 1;
      } else {
        sum.excluded += 1;
      }
    }
    return { ...item, included, adjusted: adjustedQuantity !== null, adjustedQuantity, adjustmentReason, quantityPriced, unitRate, cost: roundMoney(quantityPriced * unitRate, minorUnits) };
  });
  if (issues.length) throw new AppError("unprocessable", "The work list cannot be priced as it is.", issues);
  return { ...priceKindSums(sums, rates, adjustedCount), items: priced };
}
