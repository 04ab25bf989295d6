// Steel weight of repairs: volume × density of steel.

/** Density of structural steel, kg/m³ (EN 1993-1-1 §3.2.6). */
export const STEEL_DENSITY_KG_M3 = 7850;

const mm = (v: number) => v / 1000;

/** Mass of a rectangular plate (insert, doubler, rectangular bracket), kg. */
export function plateMassKg({ lengthMm, widthMm, thicknessMm }: { lengthMm: number; widthMm: number; thicknessMm: number }): number {
  return mm(lengthMm) * mm(widthMm) * mm(thicknessMm) * STEEL_DENSITY_KG_M3;
}

/** Area of a triangle from its three sides (Heron's formula), in the square of the input unit; NaN if the sides cannot close. */
export function triangleArea(a: number, b: number, c: number): number {
  const s = (a + b + c) / 2;
  const q = s * (s - a) * (s - b) * (s - c);
  return q < 0 ? Number.NaN : Math.sqrt(q);
}

export function isTriangle(a: number, b: number, c: number): boolean {
  return a > 0 && b > 0 && c > 0 && a + b > c && a + c > b && b + c > a;
}

/** Mass of a triangular bracket given its three sides and thickness, kg. */
export function triangularBracketMassKg({ sideAMm, sideBMm, sideCMm, thicknessMm }: { sideAMm: number; sideBMm: number; sideCMm: number; thicknessMm: number }): number {
  return triangleArea(mm(sideAMm), mm(sideBMm), mm(sideCMm)) * mm(thicknessMm) * STEEL_DENSITY_KG_M3;
}

/** Mass of a profile (longitudinal, stiffener) from its length and mass per metre, kg. */
export function profileMassKg({ lengthMm, kgPerM }: { lengthMm: number; kgPerM: number }): number {
  return mm(lengthMm) * kgPerM;
}

/** Mass per metre of a flat bar or an angle/T built from plates (web and flange), kg/m. */
export function builtProfileKgPerM({ webHeightMm, webThicknessMm, flangeWidthMm = 0, flangeThicknessMm = 0 }: { webHeightMm: number; webThicknessMm: number; flangeWidthMm?: number; flangeThicknessMm?: number }): number {
  const areaM2 = mm(webHeightMm) * mm(webThicknessMm) + mm(flangeWidthMm) * mm(flangeThicknessMm);
  return areaM2 * STEEL_DENSITY_KG_M3;
}

export const kgToTonnes = (kg: number) => kg / 1000;

/** Rounds a mass for display: 0.1 kg below 100 kg, whole kilograms above. */
export function roundKg(kg: number): number {
  return kg < 100 ? Math.round(kg * 10) / 10 : Math.round(kg);
}
