// Rust grade of a rusted area on the ASTM D610 scale (10 = no rust … 0 = more than 50 %).

const D610: { grade: number; upToPct: number }[] = [
  { grade: 10, upToPct: 0.01 },
  { grade: 9, upToPct: 0.03 },
  { grade: 8, upToPct: 0.1 },
  { grade: 7, upToPct: 0.3 },
  { grade: 6, upToPct: 1 },
  { grade: 5, upToPct: 3 },
  { grade: 4, upToPct: 10 },
  { grade: 3, upToPct: 16 },
  { grade: 2, upToPct: 33 },
  { grade: 1, upToPct: 50 },
];

/** The D610 grade of a % of surface rusted: each grade covers "more than the previous bound, up to its own". */
export function astmD610Grade(rustedPct: number): number {
  if (rustedPct < 0 || rustedPct > 100 || Number.isNaN(rustedPct)) throw new RangeError("rusted area must be 0–100 %");
  return D610.find((g) => rustedPct <= g.upToPct)?.grade ?? 0;
}
