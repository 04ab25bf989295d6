// IMO ship identification number. Rule: the first six digits weighted
// 7, 6, 5, 4, 3, 2; the last digit of the sum is the seventh digit
// (IMO Res. A.1117(30); the rule and the worked example are from memory).
import { describe, expect, it } from "vitest";
import { checkImoNumber, imoCheckDigit } from "@/lib/imo";
import { ZImoNumber } from "@/lib/schemas/vessel";

describe("IMO check digit", () => {
  it("worked example IMO 9074729: 9×7 + 0×6 + 7×5 + 4×4 + 7×3 + 2×2 = 139 → 9 (memory)", () => {
    expect(imoCheckDigit("907472")).toBe(9);
    expect(checkImoNumber("9074729")).toEqual({ ok: true, number: "9074729" });
  });

  it("accepts the 'IMO ' prefix and surrounding spaces", () => {
    expect(checkImoNumber("  IMO 9074729 ")).toEqual({ ok: true, number: "9074729" });
  });

  it("refuses a wrong check digit and says which digit fits", () => {
    const result = checkImoNumber("9074728");
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toMatch(/seventh must be 9, not 8/);
  });

  it("refuses anything but seven digits", () => {
    for (const bad of ["", "907472", "90747290", "9O74729", "907-4729"]) {
      expect(checkImoNumber(bad).ok, bad).toBe(false);
    }
  });

  it("the vessel schema refuses a bad IMO number with the message", () => {
    const r = ZImoNumber.safeParse("9074728");
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.message).toMatch(/check digit/);
  });
});
