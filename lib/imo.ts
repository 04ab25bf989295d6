// IMO ship identification number: seven digits, the last a check digit. The
// first six digits are multiplied by 7, 6, 5, 4, 3, 2; the last digit of the
// sum is the check digit.

export type TImoCheck = { ok: true; number: string } | { ok: false; message: string };

const WEIGHTS = [7, 6, 5, 4, 3, 2] as const;

export function imoCheckDigit(firstSix: string): number {
  if (!/^[0-9]{6}$/.test(firstSix)) throw new Error("imoCheckDigit needs six digits");
  const sum = WEIGHTS.reduce((acc, w, i) => acc + w * Number(firstSix[i]), 0);
  return sum % 10;
}

/** Accepts "9074729" or "IMO 9074729"; explains what is wrong otherwise. */
export function checkImoNumber(input: string): TImoCheck {
  const trimmed = input.trim().replace(/^IMO\s*/i, "");
  if (!/^[0-9]{7}$/.test(trimmed)) {
    return { ok: false, message: "An IMO number has exactly seven digits (for example 9074729)." };
  }
  const expected = imoCheckDigit(trimmed.slice(0, 6));
  const given = Number(trimmed[6]);
  if (expected !== given) {
    return {
      ok: false,
      message: `The check digit does not match: with these first six digits the seventh must be ${expected}, not ${given}. Check the number on the ship's certificate.`,
    };
  }
  return { ok: true, number: trimmed };
}
