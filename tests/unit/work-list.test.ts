// The docking work list: quantities gathered from countersigned inspections and
// priced at the docking's rates. Each expected value is worked by hand beside it;
// the rates are this test's own, not market prices.
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/errors";
import { repairQuantities } from "@/lib/inspection/quantities";
import { currencyMinorUnits, gatherWorkItems, priceKindSums, priceWorkList, roundMoney, type TWorkSource, type TWorkSourceFinding } from "@/lib/office/work-list";
import { ZDockingInput, ZDockingItemDecisionInput, ZDockingOtherItemInput } from "@/lib/schemas/docking";

const insert = repairQuantities({ kind: "insert_plate", lengthMm: 2500, widthMm: 1800, thicknessMm: 14, pieces: 1 });
const profile = repairQuantities({ kind: "profile_renewal", lengthMm: 2400, kgPerM: 18.5, pieces: 1 });

const finding = (over: Partial<TWorkSourceFinding> & Pick<TWorkSourceFinding, "id" | "number">): TWorkSourceFinding => ({
  status: "open",
  type: "contact_damage",
  frameFrom: 120,
  frameTo: 124,
  memberKind: "plating",
  platingRegion: "side_shell",
  steelWeightKg: null,
  coatingRepairM2: null,
  ...over,
});

const tankA: TWorkSource = {
  tankId: "tank-a",
  tankCode: "1P",
  inspectionId: "insp-a",
  inspectedOn: "2025-11-20",
  findings: [
    finding({ id: "f1", number: 1, repairKind: "insert_plate", ...insert }),
    finding({ id: "f2", number: 2, type: "coating_breakdown", memberKind: "web_frame", memberNumber: 3, frameFrom: 130, frameTo: 130, repairKind: "coating_touch_up", coatingRepairM2: 12.4 }),
    finding({ id: "f3", number: 3, status: "monitoring", steelWeightKg: 30 }),
    finding({ id: "f4", number: 4, status: "closed", steelWeightKg: 80, coatingRepairM2: 2 }),
    finding({ id: "f5", number: 5, type: "crack", memberKind: "bracket", repairKind: "monitor_only" }),
  ],
  anodes: { toRenewCount: 6 },
  sedimentZones: [
    { label: "Bottom between the floors, aft end", depthMm: 100, areaM2: 450 },
    { label: "Stringer 2, forward", depthMm: 50, areaM2: 20 },
    { label: "Bilge well, aft", depthMm: 0, areaM2: 2 },
  ],
};
const tankB: TWorkSource = {
  tankId: "tank-b",
  tankCode: "2S",
  inspectionId: "insp-b",
  inspectedOn: "2025-12-02",
  findings: [finding({ id: "g1", number: 1, type: "thickness_diminution", memberKind: "longitudinal", platingRegion: null, memberNumber: 14, repairKind: "profile_renewal", ...profile })],
  anodes: { toRenewCount: 0 },
  sedimentZones: [],
};
const usd = { currency: "USD", steelRatePerKg: 4.5, coatingRatePerM2: 85, anodeRatePerPiece: 120, sedimentRatePerM3: 60 };
/** Work added by hand, each at its own rate (this test's own, not market prices). */
const OTHER = [
  { key: "o-staging", kind: "other" as const, quantity: 3, unitRate: 1250 }, // staging in 1P: 3 days × 1 250.00 USD/day
  { key: "o-surveyor", kind: "other" as const, quantity: 2.5, unitRate: 65.45 }, // surveyor's attendance: 2.5 h × 65.45 USD/h
];

describe("gathering the work items", () => {
  const { items, unpriced } = gatherWorkItems([tankA, tankB]);

  it("the quantities come from the repairs (density 7 850 kg/m³: EN 1993-1-1:2005 §3.2.6)", () => {
    expect(insert.steelWeightKg).toBeCloseTo(494.55, 6); // 2.5 m × 1.8 m × 0.014 m × 7 850 kg/m³ (reference worked check)
    expect(insert.coatingRepairM2).toBeCloseTo(4.5, 10); // 2.5 m × 1.8 m
    expect(profile.steelWeightKg).toBeCloseTo(44.4, 10); // 2.4 m × 18.5 kg/m
  });

  it("one item per open finding and kind, one anode and one sediment item per tank", () => {
    expect(items.map((i) => [i.key, i.unit])).toEqual([
      ["f1:steel", "kg"],
      ["f1:coating", "m²"],
      ["f2:coating", "m²"],
      ["tank-a:anodes", "pcs"],
      ["tank-a:sediment", "m³"],
      ["g1:steel", "kg"],
    ]);
    // sediment: 0.100 m × 450 m² + 0.050 m × 20 m² = 45 + 1 = 46 m³ (volume = depth × area: common practice)
    expect(items.find((i) => i.kind === "sediment")?.quantity).toBeCloseTo(46, 10);
    expect(items.find((i) => i.kind === "anodes")?.quantity).toBe(6);
  });

  it("findings under monitoring or closed are left out; an open finding with nothing to price is listed as unpriced", () => {
    expect(items.some((i) => i.findingId === "f3" || i.findingId === "f4")).toBe(false);
    expect(unpriced.map((u) => u.findingId)).toEqual(["f5"]);
  });

  it("describes each item so a yard can find it", () => {
    expect(items[0]?.description).toBe("Finding 1: Contact damage, Fr. 120–124, Side shell plating: steel renewal (insert plate)");
    expect(items[2]?.description).toBe("Finding 2: Local coating breakdown, Fr. 130, Web frame 3: coating repair (coating touch-up)");
    // the zones that hold sediment, by their labels (the empty bilge well, 0 mm, is not work for the yard)
    expect(items[4]?.description).toBe("Sediment removal, 2 zones: Bottom between the floors, aft end; Stringer 2, forward");
    expect(items[0]).toMatchObject({ tankCode: "1P", inspectionId: "insp-a" });
  });

  it("names the one zone of a tank where the sediment is", () => {
    const one = gatherWorkItems([{ ...tankB, sedimentZones: [{ label: "Bottom between the floors, aft end", depthMm: 50, areaM2: 20 }] }]).items;
    expect(one.find((i) => i.kind === "sediment")?.description).toBe("Sediment removal, 1 zone: Bottom between the floors, aft end");
  });

  it("never gathers work of the kind added by hand", () => {
    expect(new Set(items.map((i) => i.kind))).toEqual(new Set(["steel", "coating", "anodes", "sediment"]));
  });

  it("refuses two inspections of the same tank", () => {
    expect(() => gatherWorkItems([tankA, tankA])).toThrow(/1P is given twice/);
  });
});

describe("pricing (rates of this test: steel 4.50 USD/kg, coating 85 USD/m², anode 120 USD/piece, sediment 60 USD/m³)", () => {
  const { items } = gatherWorkItems([tankA, tankB]);

  it("costs per item, per kind and in total", () => {
    const list = priceWorkList(items, usd);
    expect(list.items.map((i) => i.cost)).toEqual([
      2225.48, // 494.55 kg × 4.50 = 2 225.475 → 2 225.48 (half away from zero)
      382.5, // 4.5 m² × 85 = 382.50
      1054, // 12.4 m² × 85 = 1 054.00
      720, // 6 × 120 = 720.00
      2760, // 46 m³ × 60 = 2 760.00
      199.8, // 44.4 kg × 4.50 = 199.80
    ]);
    expect(list.totals.steel.quantity).toBeCloseTo(538.95, 6); // 494.55 + 44.4 kg
    expect(list.totals.steel.cost).toBe(2425.28); // 2 225.475 + 199.80 = 2 425.275 → 2 425.28
    expect(list.totals.coating.quantity).toBeCloseTo(16.9, 10); // 4.5 + 12.4 m²
    expect(list.totals.coating.cost).toBe(1436.5); // 382.50 + 1 054.00
    expect(list.totals.anodes).toEqual({ quantity: 6, cost: 720, included: 1, excluded: 0 });
    expect(list.totals.sediment.cost).toBe(2760);
    expect(list.grandTotal).toBe(7341.78); // 2 425.275 + 1 436.50 + 720 + 2 760 = 7 341.775 → 7 341.78
    expect(list.counts).toEqual({ included: 6, excluded: 0, adjusted: 0 });
    expect(list).toMatchObject({ currency: "USD", minorUnits: 2 });
  });

  it("totals from per-kind sums (as the database sums a long list) equal the totals of the items", () => {
    // The same list as above plus the two items added by hand (OTHER), summed by kind: steel 494.55 + 44.4 = 538.95 kg,
    // coating 4.5 + 12.4 = 16.9 m², 6 anodes, 46 m³; other by cost (mixed units): 3 days × 1 250.00 + 2.5 h × 65.45
    // = 3 750.00 + 163.625 = 3 913.625.
    const sums = {
      steel: { quantity: 538.95, included: 2, excluded: 0 },
      coating: { quantity: 16.9, included: 2, excluded: 0 },
      anodes: { quantity: 6, included: 1, excluded: 0 },
      sediment: { quantity: 46, included: 1, excluded: 0 },
      other: { cost: 3913.625, included: 2, excluded: 0 },
    };
    const fromSums = priceKindSums(sums, usd, 0);
    expect(fromSums.totals.steel.cost).toBe(2425.28); // 538.95 × 4.50 = 2 425.275 → 2 425.28
    expect(fromSums.totals.other).toEqual({ quantity: null, cost: 3913.63, included: 2, excluded: 0 }); // 3 913.625 → 3 913.63
    // 2 425.275 + 1 436.50 + 720 + 2 760 + 3 913.625 = 11 255.40 (the rounded kind totals would add up to 11 255.41)
    expect(fromSums.grandTotal).toBe(11255.4);
    const { items: _items, ...fromItems } = priceWorkList([...items, ...OTHER], usd);
    const quantityOf = (k: string) => (k === "other" ? null : sums[k as Exclude<keyof typeof sums, "other">].quantity);
    expect(fromSums).toEqual({ ...fromItems, totals: Object.fromEntries(Object.entries(fromItems.totals).map(([k, t]) => [k, { ...t, quantity: quantityOf(k) }])) });
    expect(() => priceKindSums(sums, { ...usd, coatingRatePerM2: -5 }, 0)).toThrow(AppError);
    expect(() => priceKindSums({ ...sums, other: { ...sums.other, cost: Number.NaN } }, usd, 0)).toThrow(AppError);
  });

  it("work added by hand is priced at its own rate; its total counts items and cost, never a quantity (mixed units)", () => {
    const list = priceWorkList([...items, ...OTHER], usd);
    const [staging, surveyor] = list.items.slice(-2);
    expect(staging).toMatchObject({ unitRate: 1250, cost: 3750 }); // 3 days × 1 250.00 = 3 750.00
    expect(surveyor).toMatchObject({ unitRate: 65.45, cost: 163.63 }); // 2.5 h × 65.45 = 163.625 → 163.63
    expect(list.totals.other).toEqual({ quantity: null, cost: 3913.63, included: 2, excluded: 0 }); // 3 750 + 163.625 = 3 913.625 → 3 913.63
    expect(list.totals.steel.cost).toBe(2425.28); // the gathered kinds are untouched by the items' own rates
    expect(list.grandTotal).toBe(11255.4); // 7 341.775 + 3 913.625 = 11 255.40
    expect(list.counts).toEqual({ included: 8, excluded: 0, adjusted: 0 });
  });

  it("an item added by hand may be adjusted or excluded like any other", () => {
    const decided = OTHER.map((o) =>
      o.key === "o-staging" ? { ...o, adjustedQuantity: 4, adjustmentReason: "Yard needs a fourth day for the brackets" } : { ...o, included: false, adjustmentReason: "Class attends free of charge" },
    );
    const list = priceWorkList(decided, usd);
    expect(list.items[0]).toMatchObject({ quantity: 3, quantityPriced: 4, cost: 5000 }); // 4 days × 1 250.00 = 5 000.00
    expect(list.items[1]).toMatchObject({ included: false, cost: 163.63 });
    expect(list.totals.other).toEqual({ quantity: null, cost: 5000, included: 1, excluded: 1 });
    expect(list.grandTotal).toBe(5000);
    expect(list.counts).toEqual({ included: 1, excluded: 1, adjusted: 1 });
  });

  it("refuses an item added by hand without its own rate, or with a negative one (422)", () => {
    const noRate = { key: "o-x", kind: "other" as const, quantity: 1, unitRate: null };
    expect(() => priceWorkList([noRate], usd)).toThrow(AppError);
    expect(() => priceWorkList([{ ...noRate, unitRate: -1 }], usd)).toThrow(AppError);
    expect(() => priceWorkList([{ ...noRate, unitRate: Number.NaN }], usd)).toThrow(AppError);
    expect(priceWorkList([{ ...noRate, unitRate: 0 }], usd).grandTotal).toBe(0);
  });

  it("an excluded item keeps its cost on its line but leaves the totals; an adjusted quantity replaces the gathered one", () => {
    const decided = items.map((i) =>
      i.key === "f2:coating" ? { ...i, adjustedQuantity: 15, adjustmentReason: "Yard measured 15 m² on the web frame" } : i.key === "tank-a:sediment" ? { ...i, included: false } : i,
    );
    const list = priceWorkList(decided, usd);
    const f2 = list.items.find((i) => i.key === "f2:coating");
    expect(f2).toMatchObject({ adjusted: true, quantity: 12.4, quantityPriced: 15, cost: 1275, adjustmentReason: "Yard measured 15 m² on the web frame" }); // 15 m² × 85 = 1 275.00
    expect(list.items.find((i) => i.key === "tank-a:sediment")).toMatchObject({ included: false, cost: 2760 });
    expect(list.totals.coating.quantity).toBeCloseTo(19.5, 10); // 4.5 + 15 m²
    expect(list.totals.coating.cost).toBe(1657.5); // 382.50 + 1 275.00
    expect(list.totals.sediment).toEqual({ quantity: 0, cost: 0, included: 0, excluded: 1 });
    expect(list.grandTotal).toBe(4802.78); // 2 425.275 + 1 657.50 + 720 = 4 802.775 → 4 802.78
    expect(list.counts).toEqual({ included: 5, excluded: 1, adjusted: 1 });
  });

  it("rounds once, at the end: two items of 12.625 make 25.25, not 12.63 + 12.63 = 25.26", () => {
    const two = [
      { key: "a", kind: "steel" as const, quantity: 10.1 },
      { key: "b", kind: "steel" as const, quantity: 10.1 },
    ];
    const list = priceWorkList(two, { ...usd, steelRatePerKg: 1.25 });
    expect(list.items.map((i) => i.cost)).toEqual([12.63, 12.63]); // 10.1 kg × 1.25 = 12.625 → 12.63 each
    expect(list.totals.steel.cost).toBe(25.25); // 12.625 + 12.625 = 25.25 exactly
    expect(list.grandTotal).toBe(25.25);
  });

  it("rounds to the currency's minor unit: yen have none, dinars three (ISO 4217)", () => {
    expect(currencyMinorUnits("USD")).toBe(2);
    expect(currencyMinorUnits("JPY")).toBe(0);
    expect(currencyMinorUnits("KWD")).toBe(3);
    const yen = priceWorkList([{ key: "s", kind: "steel", quantity: 494.55 }], { ...usd, currency: "JPY", steelRatePerKg: 650 });
    expect(yen.grandTotal).toBe(321458); // 494.55 × 650 = 321 457.5 → 321 458
    expect(roundMoney(1.005, 2)).toBe(1.01); // 1.005 is 1.00499999999999989… in binary; read as decimal it rounds up
    expect(roundMoney(0.0004, 3)).toBe(0);
  });

  it("refuses an adjustment without a reason, and negative or missing rates, with the item or rate named (422)", () => {
    const noReason = items.map((i) => (i.key === "f1:steel" ? { ...i, adjustedQuantity: 400 } : i));
    const err = (() => {
      try {
        priceWorkList(noReason, usd);
      } catch (e) {
        return e;
      }
    })();
    expect(err).toBeInstanceOf(AppError);
    expect((err as AppError).status).toBe(422);
    expect((err as AppError).issues).toEqual([{ path: "f1:steel.adjustmentReason", message: "is required: say why the quantity was changed" }]);
    expect(() => priceWorkList(items, { ...usd, anodeRatePerPiece: -1 })).toThrow(AppError);
    expect(() => priceWorkList(items, { ...usd, sedimentRatePerM3: Number.NaN })).toThrow(AppError);
    expect(() => priceWorkList(items.map((i) => ({ ...i, adjustedQuantity: -2, adjustmentReason: "typo" })), usd)).toThrow(AppError);
  });

  it("an empty list costs nothing", () => {
    const list = priceWorkList([], usd);
    expect(list.grandTotal).toBe(0);
    expect(list.totals.steel).toEqual({ quantity: 0, cost: 0, included: 0, excluded: 0 });
  });
});

describe("docking input", () => {
  const form = { yard: "Test Yard", place: "Test Port", plannedOn: "2026-09-15", currency: "usd", steelRatePerKg: "4.50", coatingRatePerM2: "85", anodeRatePerPiece: "120", sedimentRatePerM3: "0" };
  const issues = (r: { error?: { issues: { path: PropertyKey[]; message: string }[] } }) => r.error?.issues.map((i) => `${i.path.join(".")}: ${i.message}`) ?? [];

  it("accepts form strings, upper-cases the currency and allows a rate of 0", () => {
    const r = ZDockingInput.safeParse(form);
    expect(r.success).toBe(true);
    expect(r.data).toMatchObject({ currency: "USD", steelRatePerKg: 4.5, sedimentRatePerM3: 0 });
  });

  it("refuses a currency that is not an ISO 4217 code", () => {
    for (const currency of ["XYZ", "US", "EURO", "€", ""]) {
      expect(issues(ZDockingInput.safeParse({ ...form, currency }))).toEqual(["currency: must be an ISO 4217 currency code such as USD or EUR"]);
    }
    expect(ZDockingInput.safeParse({ ...form, currency: "EUR" }).success).toBe(true);
    expect(ZDockingInput.safeParse({ ...form, currency: "JPY" }).success).toBe(true);
  });

  it("refuses a negative rate, a rate that is not a number and a missing rate, saying which", () => {
    expect(issues(ZDockingInput.safeParse({ ...form, steelRatePerKg: "-1" }))).toEqual(["steelRatePerKg: cannot be negative"]);
    expect(issues(ZDockingInput.safeParse({ ...form, coatingRatePerM2: "eighty" }))).toEqual(["coatingRatePerM2: must be a number: the price per m² of coating repair"]);
    expect(issues(ZDockingInput.safeParse({ ...form, anodeRatePerPiece: "" }))).toEqual(["anodeRatePerPiece: is required: the price per anode"]);
    expect(issues(ZDockingInput.safeParse({ ...form, sedimentRatePerM3: Number.POSITIVE_INFINITY }))).toHaveLength(1);
  });

  it("refuses a date that is not in the calendar and a blank yard", () => {
    expect(issues(ZDockingInput.safeParse({ ...form, plannedOn: "2026-02-30" }))).toEqual(["plannedOn: is not a calendar date"]);
    expect(issues(ZDockingInput.safeParse({ ...form, plannedOn: "15/09/2026" }))).toEqual(["plannedOn: must be a date like 2026-03-14"]);
    expect(issues(ZDockingInput.safeParse({ ...form, yard: " " }))).toEqual(["yard: name the yard"]);
  });

  it("work added by hand: accepts form strings, an optional tank and a rate of 0", () => {
    const add = { description: "Staging in 3P for bracket renewal", tankId: "", quantity: "4", unit: "days", unitRate: "0", reason: "Class asked for access to the brackets" };
    expect(ZDockingOtherItemInput.safeParse(add).data).toEqual({ ...add, tankId: undefined, quantity: 4, unitRate: 0 });
    expect(ZDockingOtherItemInput.safeParse({ ...add, tankId: "8a7f2c1e-3d4b-4f6a-9b8c-1d2e3f4a5b6c" }).success).toBe(true);
  });

  it("work added by hand: refuses a catch-all or too short description, a bad number, a missing unit or reason, saying which", () => {
    const add = { description: "Gas-freeing and ventilation of 1P and 1S", quantity: 1, unit: "lump sum", unitRate: 2400, reason: "Hot work in both tanks" };
    expect(issues(ZDockingOtherItemInput.safeParse({ ...add, description: "Misc works" }))).toEqual([expect.stringMatching(/^description: only says "other work"/)]);
    expect(issues(ZDockingOtherItemInput.safeParse({ ...add, description: "Staging" }))).toEqual([expect.stringMatching(/^description: is too short for a yard to price/)]);
    expect(issues(ZDockingOtherItemInput.safeParse({ ...add, description: " " }))).toEqual(["description: is required: say what the yard is to do"]);
    expect(issues(ZDockingOtherItemInput.safeParse({ ...add, unitRate: -5 }))).toEqual(["unitRate: cannot be negative"]);
    expect(issues(ZDockingOtherItemInput.safeParse({ ...add, unitRate: "NaN" }))).toEqual(["unitRate: must be a number: the price per unit, in the docking's currency"]);
    expect(issues(ZDockingOtherItemInput.safeParse({ ...add, unitRate: Number.NaN }))).toHaveLength(1);
    expect(issues(ZDockingOtherItemInput.safeParse({ ...add, quantity: Number.POSITIVE_INFINITY }))).toHaveLength(1);
    expect(issues(ZDockingOtherItemInput.safeParse({ ...add, unitRate: 2_000_000_000 }))).toEqual(["unitRate: must be at most 1,000,000,000"]);
    expect(issues(ZDockingOtherItemInput.safeParse({ ...add, unit: "" }))).toEqual(["unit: is required: lump sum, days, m², pcs …"]);
    expect(issues(ZDockingOtherItemInput.safeParse({ ...add, reason: undefined }))).toEqual(["reason: is required: say why the item is added"]);
    expect(issues(ZDockingOtherItemInput.safeParse({ ...add, tankId: "3P" }))).toEqual(["tankId: must be a tank of the vessel"]);
  });

  it("an adjusted quantity needs a reason; including or excluding does not", () => {
    expect(ZDockingItemDecisionInput.safeParse({ included: false }).success).toBe(true);
    expect(ZDockingItemDecisionInput.safeParse({ included: true, adjustedQuantity: "400", adjustmentReason: "Yard gauging shows less" }).data).toMatchObject({ adjustedQuantity: 400 });
    expect(issues(ZDockingItemDecisionInput.safeParse({ included: true, adjustedQuantity: "400", adjustmentReason: " " }))).toEqual(["adjustmentReason: is required: say why the quantity was changed"]);
    expect(issues(ZDockingItemDecisionInput.safeParse({ included: true, adjustedQuantity: "-3", adjustmentReason: "less" }))).toEqual(["adjustedQuantity: cannot be negative"]);
  });
});
