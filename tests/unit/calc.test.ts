// Each expected value names its source.
import { describe, expect, it } from "vitest";
import { anodeLifeYears, anodeNetMassKg, designCurrentA, projectThresholdDate, unusedAnodeWarning } from "@/lib/calc/anodes";
import { rateCoatingArea, rateTank } from "@/lib/calc/coating";
import { astmD610Grade } from "@/lib/calc/rust-grade";
import { removalCost, sedimentVolumeM3, totalVolumeM3, zoneAreaM2 } from "@/lib/calc/sediment";
import { isTriangle, plateMassKg, profileMassKg, STEEL_DENSITY_KG_M3, triangleArea, triangularBracketMassKg } from "@/lib/calc/steel";
import { diminutionPct, judgeThickness } from "@/lib/calc/thickness";

describe("steel weight (density 7 850 kg/m³: EN 1993-1-1:2005 §3.2.6)", () => {
  it("the density is 7 850 kg/m³, i.e. 7.85 kg per m² per mm", () => {
    expect(STEEL_DENSITY_KG_M3).toBe(7850);
    expect(plateMassKg({ lengthMm: 1000, widthMm: 1000, thicknessMm: 1 })).toBeCloseTo(7.85, 10);
  });
  it("plate 2.5 m × 1.8 m × 14 mm → 494.55 kg (worked check, reference values)", () => {
    expect(plateMassKg({ lengthMm: 2500, widthMm: 1800, thicknessMm: 14 })).toBeCloseTo(494.55, 6);
  });
  it("insert 400 × 800 × 8 mm → 20.1 kg (worked check of the wizard issue)", () => {
    expect(plateMassKg({ lengthMm: 400, widthMm: 800, thicknessMm: 8 })).toBeCloseTo(20.1, 1);
  });
  it("triangular bracket 150/150/150 mm in 8 mm plate → 0.61 kg, eight of them 4.9 kg (Heron's formula; worked check)", () => {
    const one = triangularBracketMassKg({ sideAMm: 150, sideBMm: 150, sideCMm: 150, thicknessMm: 8 });
    expect(one).toBeCloseTo(0.61, 2);
    expect(one * 8).toBeCloseTo(4.9, 1);
  });
  it("Heron's formula: the 3-4-5 right triangle has area 6 (textbook)", () => {
    expect(triangleArea(3, 4, 5)).toBeCloseTo(6, 12);
    expect(isTriangle(1, 2, 3)).toBe(false);
    expect(Number.isNaN(triangleArea(1, 2, 5))).toBe(true);
  });
  it("profile: length × mass per metre", () => {
    expect(profileMassKg({ lengthMm: 2400, kgPerM: 18.5 })).toBeCloseTo(44.4, 10);
  });
});

describe("sediment (volume = depth × area: common practice)", () => {
  it("0.10 m over a 15 m × 30 m bottom → 45 m³ (worked check)", () => {
    expect(sedimentVolumeM3({ depthMm: 100, areaM2: zoneAreaM2({ lengthM: 15, breadthM: 30 }) })).toBeCloseTo(45, 10);
  });
  it("totals zones and prices the removal at the office's rate", () => {
    const v = totalVolumeM3([{ depthMm: 100, areaM2: 450 }, { depthMm: 50, areaM2: 20 }]);
    expect(v).toBeCloseTo(46, 10);
    expect(removalCost(v, { amount: 60, currency: "USD" })).toEqual({ amount: 2760, currency: "USD" });
  });
});

describe("coating rating (IMO MSC.1/Circ.1330 Table 1; IMO Res. A.744(18) / A.1049(27) wording)", () => {
  const rate = (breakdownPct: number, over: object = {}, rule: "table" | "wording" = "table") =>
    rateCoatingArea({ breakdownPct, rustedPct: 0, hardScalePct: 0, ...over }, rule).rating;
  it("breakdown: < 3 % GOOD; 3 % FAIR; 2.9 % GOOD", () => {
    expect(rate(0)).toBe("GOOD");
    expect(rate(2.9)).toBe("GOOD");
    expect(rate(3)).toBe("FAIR");
    expect(rate(3.1)).toBe("FAIR");
  });
  it("breakdown at 20 %: FAIR by the table, POOR by the wording ('20 % or more'); 20.1 % POOR both ways; 19.9 % FAIR both ways", () => {
    expect(rate(20, {}, "table")).toBe("FAIR");
    expect(rate(20, {}, "wording")).toBe("POOR");
    expect(rate(20.1, {}, "table")).toBe("POOR");
    expect(rate(20.1, {}, "wording")).toBe("POOR");
    expect(rate(19.9, {}, "table")).toBe("FAIR");
    expect(rate(19.9, {}, "wording")).toBe("FAIR");
  });
  it("the rusted area counts like breakdown, whichever is larger", () => {
    expect(rate(1, { rustedPct: 25 })).toBe("POOR");
  });
  it("hard scale: none GOOD, below 10 % FAIR, 10 % or more POOR", () => {
    expect(rate(1, { hardScalePct: 0.5 })).toBe("FAIR");
    expect(rate(1, { hardScalePct: 9.9 })).toBe("FAIR");
    expect(rate(1, { hardScalePct: 10 })).toBe("POOR");
  });
  it("edges and welds rusted: < 20 % GOOD, 20–50 % FAIR, > 50 % POOR", () => {
    expect(rate(1, { edgesRustedPct: 19.9 })).toBe("GOOD");
    expect(rate(1, { edgesRustedPct: 20 })).toBe("FAIR");
    expect(rate(1, { edgesRustedPct: 50 })).toBe("FAIR");
    expect(rate(1, { edgesRustedPct: 50.1 })).toBe("POOR");
  });
  it("says which rule decided", () => {
    const r = rateCoatingArea({ breakdownPct: 25, rustedPct: 4, hardScalePct: 2 });
    expect(r.decidedBy).toBe("breakdown 25 % is more than 20 %");
  });
  it("the tank takes its worst area, never an average (Circ.1330 §4.2.1)", () => {
    const areas = [
      { area: "shell_plating", rating: rateCoatingArea({ breakdownPct: 1, rustedPct: 0, hardScalePct: 0 }) },
      { area: "edges_welds", rating: rateCoatingArea({ breakdownPct: 25, rustedPct: 0, hardScalePct: 0 }) },
      { area: "stringers", rating: rateCoatingArea({ breakdownPct: 1, rustedPct: 0, hardScalePct: 0 }) },
    ];
    expect(rateTank(areas)).toMatchObject({ rating: "POOR", worst: { area: "edges_welds" } });
  });
});

describe("rust grade (ASTM D610 scale)", () => {
  it.each([
    [0, 10], [0.01, 10], [0.02, 9], [0.03, 9], [0.1, 8], [0.3, 7], [1, 6], [2, 5], [3, 5], [3.1, 4], [10, 4], [16, 3], [33, 2], [50, 1], [50.1, 0], [100, 0],
  ])("%s %% rusted → grade %s", (pct, grade) => {
    expect(astmD610Grade(pct)).toBe(grade);
  });
});

describe("thickness and substantial corrosion (2011 ESP Code §1.2.8: wastage beyond 75 % of the allowable margin)", () => {
  it("as-built 15.0 mm, allowable 3.0 mm, gauged 12.6 mm → wastage 2.4 mm > 2.25 mm → substantial (worked check)", () => {
    expect(judgeThickness({ asBuiltMm: 15, measuredMm: 12.6, allowableDiminutionMm: 3 })).toMatchObject({ wastageMm: 2.4, verdict: "substantial_corrosion", substantialAtMm: 2.25 });
  });
  it("gauged 12.9 mm → not substantial; below 12.0 mm → beyond the allowable margin (worked check)", () => {
    expect(judgeThickness({ asBuiltMm: 15, measuredMm: 12.9, allowableDiminutionMm: 3 }).verdict).toBe("within_margin");
    expect(judgeThickness({ asBuiltMm: 15, measuredMm: 11.9, allowableDiminutionMm: 3 }).verdict).toBe("beyond_allowable");
  });
  it("diminution in % of as-built", () => {
    expect(diminutionPct(15, 12.6)).toBeCloseTo(16, 10);
  });
});

describe("anodes (DNV-RP-B401; LR Rules for Offshore Units Pt 8 Ch 4 Sec 2)", () => {
  it("I = 1 A for 20 years, u = 0.85, ε = 2 000 Ah/kg → 103.06 kg, and back (worked check)", () => {
    const m = anodeNetMassKg({ currentA: 1, lifeYears: 20, utilisation: 0.85, capacityAhPerKg: 2000 });
    expect(m).toBeCloseTo(103.06, 2);
    expect(anodeLifeYears({ massKg: m, currentA: 1, utilisation: 0.85, capacityAhPerKg: 2000 })).toBeCloseTo(20, 10);
  });
  it("design current 110 mA/m², 130 mA/m² next to hot oil: 1 000 m² → 110 A or 130 A", () => {
    expect(designCurrentA(1000, 110)).toBeCloseTo(110, 10);
    expect(designCurrentA(1000, 130)).toBeCloseTo(130, 10);
  });
  it("projects the threshold date along the wastage trend (hand-worked: +10 % over the 366 days of 2024; 30 % more takes 1 098 days from 2025-01-01)", () => {
    const p = projectThresholdDate([{ date: "2024-01-01", meanWastagePct: 10 }, { date: "2025-01-01", meanWastagePct: 20 }], 50);
    expect(p!.ratePctPerYear).toBeCloseTo(10 * (365.25 / 366), 6);
    expect(p!.date).toBe("2028-01-04");
    expect(projectThresholdDate([{ date: "2025-01-01", meanWastagePct: 20 }], 50)).toBeNull();
    expect(projectThresholdDate([{ date: "2024-01-01", meanWastagePct: 20 }, { date: "2025-01-01", meanWastagePct: 20 }], 50)).toBeNull();
  });
  it("warns when anodes look unused while the tank corrodes (cathodic protection works only in ballast)", () => {
    expect(unusedAnodeWarning({ meanWastagePct: 2, appearUnused: false, tankCorrodes: true })).toMatch(/look unused/);
    expect(unusedAnodeWarning({ meanWastagePct: 30, appearUnused: false, tankCorrodes: true })).toBeNull();
    expect(unusedAnodeWarning({ meanWastagePct: 2, appearUnused: true, tankCorrodes: false })).toBeNull();
  });
});
