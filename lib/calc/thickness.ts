// Thickness diminution and "substantial corrosion": wastage in excess of 75 % of
// the allowable margin, but within acceptable limits. The margin comes from the
// vessel's class rules (a setting), never from here.

export type TThicknessVerdict = "within_margin" | "substantial_corrosion" | "beyond_allowable";

export function diminutionPct(asBuiltMm: number, measuredMm: number): number {
  return ((asBuiltMm - measuredMm) / asBuiltMm) * 100;
}

export function judgeThickness({
  asBuiltMm,
  measuredMm,
  allowableDiminutionMm,
  substantialFraction = 0.75,
}: {
  asBuiltMm: number;
  measuredMm: number;
  allowableDiminutionMm: number;
  substantialFraction?: number;
}): { wastageMm: number; diminutionPct: number; verdict: TThicknessVerdict; substantialAtMm: number } {
  const wastageMm = Math.round((asBuiltMm - measuredMm) * 1000) / 1000;
  const substantialAtMm = allowableDiminutionMm * substantialFraction;
  const verdict: TThicknessVerdict =
    wastageMm > allowableDiminutionMm ? "beyond_allowable" : wastageMm > substantialAtMm ? "substantial_corrosion" : "within_margin";
  return { wastageMm, diminutionPct: diminutionPct(asBuiltMm, measuredMm), verdict, substantialAtMm };
}

/** An allowable margin given as a percentage of the as-built thickness, in mm. */
export const marginFromPct = (asBuiltMm: number, pct: number) => (asBuiltMm * pct) / 100;
