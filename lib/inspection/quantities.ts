// What a finding's proposed repair means in steel and coating, for the wizard,
// the report and the docking work list.
import { builtProfileKgPerM, plateMassKg, profileMassKg, triangularBracketMassKg } from "@/lib/calc/steel";
import type { TRepair } from "@/lib/schemas/inspection";

export type TRepairQuantities = { steelWeightKg: number | null; coatingRepairM2: number | null };

/** Steel weight (all pieces) and coating repair area of a repair; null where it has none. */
export function repairQuantities(r: TRepair): TRepairQuantities {
  switch (r.kind) {
    case "insert_plate":
      return { steelWeightKg: plateMassKg(r) * r.pieces, coatingRepairM2: ((r.lengthMm / 1000) * (r.widthMm / 1000)) * r.pieces };
    case "bracket_renewal": {
      const one =
        r.shape === "triangular" && r.sideAMm && r.sideBMm && r.sideCMm
          ? triangularBracketMassKg({ sideAMm: r.sideAMm, sideBMm: r.sideBMm, sideCMm: r.sideCMm, thicknessMm: r.thicknessMm })
          : r.lengthMm && r.widthMm
            ? plateMassKg({ lengthMm: r.lengthMm, widthMm: r.widthMm, thicknessMm: r.thicknessMm })
            : null;
      return { steelWeightKg: one === null ? null : one * r.pieces, coatingRepairM2: null };
    }
    case "profile_renewal": {
      const kgPerM = r.kgPerM ?? (r.webHeightMm && r.webThicknessMm ? builtProfileKgPerM({ webHeightMm: r.webHeightMm, webThicknessMm: r.webThicknessMm, flangeWidthMm: r.flangeWidthMm, flangeThicknessMm: r.flangeThicknessMm }) : null);
      return { steelWeightKg: kgPerM === null ? null : profileMassKg({ lengthMm: r.lengthMm, kgPerM }) * r.pieces, coatingRepairM2: null };
    }
    case "fairing":
      return { steelWeightKg: null, coatingRepairM2: (r.lengthMm / 1000) * (r.widthMm / 1000) };
    case "coating_touch_up":
      return { steelWeightKg: null, coatingRepairM2: r.areaM2 };
    case "monitor_only":
      return { steelWeightKg: null, coatingRepairM2: null };
  }
}
