import { describe, expect, it } from "vitest";
import { csvField, csvMoney, csvQuantity, defuseFormula, workListCsv } from "@/lib/office/work-list-csv";
import { priceWorkList } from "@/lib/office/work-list";

describe("CSV fields (RFC 4180)", () => {
  it("quotes a field with a comma, a quote or a line break, doubling quotes", () => {
    expect(csvField("plain")).toBe("plain");
    expect(csvField("a, b")).toBe('"a, b"');
    expect(csvField('say "3 m³"')).toBe('"say ""3 m³"""');
    expect(csvField("two\nlines")).toBe('"two\nlines"');
  });

  it("keeps a spreadsheet from running typed text as a formula", () => {
    expect(defuseFormula("=SUM(A1:A9)")).toBe("'=SUM(A1:A9)");
    expect(defuseFormula("@cmd")).toBe("'@cmd");
    expect(defuseFormula("Yard survey")).toBe("Yard survey");
  });

  it("writes money to the currency's minor unit and quantities to 3 decimals", () => {
    expect(csvMoney(42.6, 2)).toBe("42.60");
    expect(csvMoney(1500, 0)).toBe("1500");
    expect(csvQuantity(117.75000000000001)).toBe("117.75");
    expect(csvQuantity(0.1234)).toBe("0.123");
  });
});

describe("workListCsv", () => {
  it("writes a header, the items, a total per kind and the grand total, CRLF-terminated", () => {
    const list = priceWorkList(
      [
        { key: "a", kind: "coating" as const, quantity: 2, tankCode: "No. 2 WBT S", description: "Finding 1: x, y", unit: "m²" },
        { key: "b", kind: "anodes" as const, quantity: 3, tankCode: "No. 2 WBT S", description: "Anodes to renew", unit: "pcs", included: false, adjustmentReason: "=renewed already" },
      ],
      { currency: "JPY", steelRatePerKg: 500, coatingRatePerM2: 4000.4, anodeRatePerPiece: 20000, sedimentRatePerM3: 9000 },
    );
    const lines = workListCsv(list, { vesselName: "Test Vessel", yard: "Yard", place: "Port", plannedOn: "2027-01-01" }).split("\r\n");
    // coating 2 m² × 4000.4 = 8000.8 → 8001 yen (JPY has no minor unit);
    // the excluded anodes (3 × 20 000 = 60 000 yen) leave Cost empty: the items' Cost column sums to 8001, the grand total
    expect(lines).toEqual([
      "Tank,Kind,Description,Included,Quantity gathered,Adjusted quantity,Quantity priced,Unit,Unit rate,Currency,Cost,Reason",
      'No. 2 WBT S,Coating repair,"Finding 1: x, y",yes,2,,2,m²,4000.4,JPY,8001,',
      "No. 2 WBT S,Anode renewal,Anodes to renew,no,3,,3,pcs,20000,JPY,,'=renewed already",
      'Total,Steel renewal,"0 included, 0 excluded",,,,0,kg,,JPY,0,',
      'Total,Coating repair,"1 included, 0 excluded",,,,2,m²,,JPY,8001,',
      'Total,Anode renewal,"0 included, 1 excluded",,,,0,pcs,,JPY,0,',
      'Total,Sediment removal,"0 included, 0 excluded",,,,0,m³,,JPY,0,',
      'Total,Other work (added by hand),"0 included, 0 excluded",,,,,,,JPY,0,',
      'Grand total,,"Test Vessel, Yard, Port, planned 2027-01-01",,,,,,,JPY,8001,',
      "",
    ]);
  });

  it("writes work added by hand at its own rate with why it was added; its total has no quantity or unit (mixed units)", () => {
    const list = priceWorkList(
      [
        { key: "a", kind: "sediment" as const, quantity: 1.5, tankCode: "1P", description: "Sediment removal, 1 zone", unit: "m³" },
        { key: "o1", kind: "other" as const, quantity: 2, unitRate: 850.5, tankCode: "1P", description: "Staging in 1P, Fr. 60–64", unit: "days", addedReason: "Class wants the brackets gauged" },
        { key: "o2", kind: "other" as const, quantity: 1, unitRate: 1200, tankCode: null, description: "Surveyor's attendance, one visit", unit: "lump sum", addedReason: "Intermediate survey", adjustedQuantity: 0.5, adjustmentReason: "Shared with the hull survey" },
      ],
      { currency: "EUR", steelRatePerKg: 3, coatingRatePerM2: 40, anodeRatePerPiece: 150, sedimentRatePerM3: 70 },
    );
    const lines = workListCsv(list, { vesselName: "Test Vessel", yard: "Yard", place: "Port", plannedOn: "2027-01-01" }).split("\r\n");
    expect(lines.slice(1, 4)).toEqual([
      "1P,Sediment removal,\"Sediment removal, 1 zone\",yes,1.5,,1.5,m³,70,EUR,105.00,", // 1.5 m³ × 70 = 105.00
      "1P,Other work (added by hand),\"Staging in 1P, Fr. 60–64\",yes,2,,2,days,850.5,EUR,1701.00,Added: Class wants the brackets gauged", // 2 days × 850.50 = 1 701.00
      ",Other work (added by hand),\"Surveyor's attendance, one visit\",yes,1,0.5,0.5,lump sum,1200,EUR,600.00,Added: Intermediate survey; Shared with the hull survey", // 0.5 × 1 200 = 600.00
    ]);
    // other: 1 701.00 + 600.00 = 2 301.00; grand total 105.00 + 2 301.00 = 2 406.00
    expect(lines).toContain('Total,Other work (added by hand),"2 included, 0 excluded",,,,,,,EUR,2301.00,');
    expect(lines.at(-2)).toBe('Grand total,,"Test Vessel, Yard, Port, planned 2027-01-01",,,,,,,EUR,2406.00,');
  });

  it("leaves an excluded item's Cost empty, so the items' Cost column adds up to the grand total", () => {
    const list = priceWorkList(
      [
        { key: "s", kind: "steel" as const, quantity: 100, tankCode: "3P", description: "Finding 1: insert plate", unit: "kg" },
        { key: "c", kind: "coating" as const, quantity: 2, tankCode: "3P", description: "Finding 2: touch-up", unit: "m²", included: false, adjustmentReason: "Crew touched it up at sea" },
        { key: "o", kind: "other" as const, quantity: 1, unitRate: 300, tankCode: null, description: "Gas-freeing of 3P before entry", unit: "lump sum", addedReason: "Hot work in 3P" },
      ],
      { currency: "USD", steelRatePerKg: 4, coatingRatePerM2: 40, anodeRatePerPiece: 150, sedimentRatePerM3: 70 },
    );
    const rows = workListCsv(list, { vesselName: "Test Vessel", yard: "Yard", place: "Port", plannedOn: "2027-01-01" }).split("\r\n").slice(1, 4);
    // steel 100 kg × 4.00 = 400.00; coating 2 m² × 40.00 = 80.00 but excluded: no cost; other 1 × 300.00 = 300.00
    expect(rows).toEqual([
      "3P,Steel renewal,Finding 1: insert plate,yes,100,,100,kg,4,USD,400.00,",
      "3P,Coating repair,Finding 2: touch-up,no,2,,2,m²,40,USD,,Crew touched it up at sea",
      ",Other work (added by hand),Gas-freeing of 3P before entry,yes,1,,1,lump sum,300,USD,300.00,Added: Hot work in 3P",
    ]);
    // 400.00 + 300.00 = 700.00, the grand total
    expect(list.grandTotal).toBe(700);
  });
});
