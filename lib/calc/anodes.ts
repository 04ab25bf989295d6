// Sacrificial anodes: life from mass, current and capacity, the design current
// of a ballast tank, and the date the renewal threshold will be reached.

/** Net anode mass for a current over a life: M = I × t × 8 760 / (u × ε), kg (DNV-RP-B401). */
export function anodeNetMassKg({ currentA, lifeYears, utilisation, capacityAhPerKg }: { currentA: number; lifeYears: number; utilisation: number; capacityAhPerKg: number }): number {
  return (currentA * lifeYears * 8760) / (utilisation * capacityAhPerKg);
}

/** Life of an anode mass at a current: t = M × u × ε / (I × 8 760), years. */
export function anodeLifeYears({ massKg, currentA, utilisation, capacityAhPerKg }: { massKg: number; currentA: number; utilisation: number; capacityAhPerKg: number }): number {
  return (massKg * utilisation * capacityAhPerKg) / (currentA * 8760);
}

/** Design current of a ballast tank's surface, A (current density in mA/m²). */
export const designCurrentA = (areaM2: number, densityMaPerM2: number) => (areaM2 * densityMaPerM2) / 1000;

export type TWastagePoint = { date: string; meanWastagePct: number };

const DAY_MS = 86_400_000;
const toDays = (iso: string) => Date.parse(`${iso}T00:00:00Z`) / DAY_MS;

/**
 * The date the mean wastage reaches the threshold, by a least-squares line
 * through the tank's records; null when there are fewer than two dates or the
 * wastage is not growing.
 */
export function projectThresholdDate(points: readonly TWastagePoint[], thresholdPct: number): { date: string; ratePctPerYear: number } | null {
  const pts = points.map((p) => ({ x: toDays(p.date), y: p.meanWastagePct })).sort((a, b) => a.x - b.x);
  if (new Set(pts.map((p) => p.x)).size < 2) return null;
  const n = pts.length;
  const mx = pts.reduce((s, p) => s + p.x, 0) / n;
  const my = pts.reduce((s, p) => s + p.y, 0) / n;
  const slope = pts.reduce((s, p) => s + (p.x - mx) * (p.y - my), 0) / pts.reduce((s, p) => s + (p.x - mx) ** 2, 0);
  if (!(slope > 0)) return null;
  const last = pts[pts.length - 1]!;
  const lineAtLast = my + slope * (last.x - mx);
  const days = last.y >= thresholdPct ? 0 : (thresholdPct - lineAtLast) / slope;
  const at = new Date((last.x + Math.max(0, days)) * DAY_MS);
  return { date: at.toISOString().slice(0, 10), ratePctPerYear: slope * 365.25 };
}

/** Pieces to renew: those at or beyond the company's threshold (the officer counts them; this checks the count). */
export const piecesToRenewValid = (toRenew: number, inspected: number) => toRenew >= 0 && toRenew <= inspected;

/**
 * Anodes that look unused while the tank corrodes suggest a fault: no electrical
 * contact, painted over, or a tank that is rarely ballasted (cathodic protection
 * works only in ballast). Returns the warning, or null.
 */
export function unusedAnodeWarning({ meanWastagePct, appearUnused, tankCorrodes }: { meanWastagePct: number; appearUnused: boolean; tankCorrodes: boolean }): string | null {
  if (!tankCorrodes) return null;
  if (!appearUnused && meanWastagePct >= UNUSED_WASTAGE_PCT) return null;
  return "The anodes look unused while the tank shows corrosion: check their electrical contact, whether they are painted over, and whether the tank is kept in ballast (cathodic protection works only while it is).";
}
/** Below this mean wastage anodes count as "looking unused" (our setting). */
export const UNUSED_WASTAGE_PCT = 5;
