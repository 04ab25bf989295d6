// The report's summary counts: what the office reads first.
import { removalCost, totalVolumeM3, type TRate } from "@/lib/calc/sediment";
import { FINDING_TYPE_LABELS, FINDING_TYPES, type TFindingType } from "@/lib/vocabulary";

export type TSummaryInput = {
  findings: readonly { type: TFindingType; steelWeightKg: number | null; coatingRepairM2: number | null }[];
  anodes: { toRenewCount: number } | null;
  sediment: { zones: readonly { depthMm: number; areaM2: number }[]; rate: TRate | null };
  notInspected: readonly unknown[];
};

export type TReportSummary = {
  findings: number;
  /** Types in the vocabulary's order, only those found. */
  findingsByType: { type: TFindingType; label: string; count: number }[];
  steelKg: number;
  coatingRepairM2: number;
  /** Null when anodes were not recorded. */
  anodesToRenew: number | null;
  sedimentM3: number;
  sedimentCost: { amount: number; currency: string } | null;
  notInspected: number;
};

export function summarizeReport(i: TSummaryInput): TReportSummary {
  const counts = new Map<TFindingType, number>();
  for (const f of i.findings) counts.set(f.type, (counts.get(f.type) ?? 0) + 1);
  const sedimentM3 = totalVolumeM3(i.sediment.zones);
  return {
    findings: i.findings.length,
    findingsByType: FINDING_TYPES.filter((t) => counts.has(t)).map((type) => ({ type, label: FINDING_TYPE_LABELS[type], count: counts.get(type)! })),
    steelKg: i.findings.reduce((sum, f) => sum + (f.steelWeightKg ?? 0), 0),
    coatingRepairM2: i.findings.reduce((sum, f) => sum + (f.coatingRepairM2 ?? 0), 0),
    anodesToRenew: i.anodes ? i.anodes.toRenewCount : null,
    sedimentM3,
    sedimentCost: i.sediment.rate ? removalCost(sedimentM3, i.sediment.rate) : null,
    notInspected: i.notInspected.length,
  };
}
