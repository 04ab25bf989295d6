// Coating condition of an area and of a tank: GOOD / FAIR / POOR by the
// thresholds of the IMO/IACS definitions, with the rule that decided.
//   GOOD: breakdown or rusted area < 3 %, no hard scale, edges/welds rusted < 20 %
//   FAIR: 3–20 %, hard scale < 10 %, edges/welds 20–50 %
//   POOR: > 20 %, hard scale ≥ 10 %, edges/welds > 50 %
// At exactly 20 % breakdown the table gives FAIR and the older wording ("20 % or
// more") gives POOR: the company chooses with the setting `twentyPercentRule`.

export type TRating = "GOOD" | "FAIR" | "POOR";
export type TTwentyPercentRule = "table" | "wording";

const ORDER: Record<TRating, number> = { GOOD: 0, FAIR: 1, POOR: 2 };
export const worseOf = (a: TRating, b: TRating): TRating => (ORDER[a] >= ORDER[b] ? a : b);

export type TCoatingInput = { breakdownPct: number; rustedPct: number; hardScalePct: number; edgesRustedPct?: number | null };
export type TCoatingRating = { rating: TRating; decidedBy: string; reasons: { criterion: string; rating: TRating; text: string }[] };

const fmt = (v: number) => `${Number.isInteger(v) ? v : v.toFixed(1)} %`;

function rateBreakdown(pct: number, rule: TTwentyPercentRule): TRating {
  if (pct < 3) return "GOOD";
  if (pct > 20 || (rule === "wording" && pct >= 20)) return "POOR";
  return "FAIR";
}

export function rateCoatingArea(input: TCoatingInput, rule: TTwentyPercentRule = "table"): TCoatingRating {
  const area = Math.max(input.breakdownPct, input.rustedPct);
  const areaWhat = input.rustedPct > input.breakdownPct ? "rusted area" : "breakdown";
  const breakdown = rateBreakdown(area, rule);
  const poorBoundary = rule === "wording" ? "20 % or more" : "more than 20 %";
  const reasons: TCoatingRating["reasons"] = [
    {
      criterion: "breakdown",
      rating: breakdown,
      text:
        breakdown === "GOOD" ? `${areaWhat} ${fmt(area)} is below 3 %` : breakdown === "POOR" ? `${areaWhat} ${fmt(area)} is ${poorBoundary}` : `${areaWhat} ${fmt(area)} is between 3 % and 20 %`,
    },
    {
      criterion: "hard scale",
      rating: input.hardScalePct >= 10 ? "POOR" : input.hardScalePct > 0 ? "FAIR" : "GOOD",
      text: input.hardScalePct >= 10 ? `hard scale ${fmt(input.hardScalePct)} is 10 % or more` : input.hardScalePct > 0 ? `hard scale ${fmt(input.hardScalePct)} is present, below 10 %` : "no hard scale",
    },
  ];
  if (input.edgesRustedPct !== undefined && input.edgesRustedPct !== null) {
    const e = input.edgesRustedPct;
    reasons.push({
      criterion: "edges and welds",
      rating: e > 50 ? "POOR" : e >= 20 ? "FAIR" : "GOOD",
      text: e > 50 ? `edges and welds rusted ${fmt(e)} is more than 50 %` : e >= 20 ? `edges and welds rusted ${fmt(e)} is between 20 % and 50 %` : `edges and welds rusted ${fmt(e)} is below 20 %`,
    });
  }
  const rating = reasons.reduce<TRating>((r, x) => worseOf(r, x.rating), "GOOD");
  const deciding = reasons.filter((r) => r.rating === rating);
  return { rating, decidedBy: deciding.map((r) => r.text).join("; "), reasons };
}

/** A tank takes the rating of its worst area, never an average. */
export function rateTank<T extends { area: string; rating: TCoatingRating }>(areas: readonly T[]): { rating: TRating; worst: T } | null {
  if (!areas.length) return null;
  const worst = areas.reduce((w, a) => (ORDER[a.rating.rating] > ORDER[w.rating.rating] ? a : w));
  return { rating: worst.rating.rating, worst };
}
