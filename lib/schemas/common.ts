import { z } from "zod";

// Building blocks shared by the schemas that forms and the API both use.

/** Form boxes arrive as strings: a blank box is "not given" (never 0), a number-like string a number. */
export function numberFromForm(v: unknown): unknown {
  if (v === null || (typeof v === "string" && v.trim() === "")) return undefined;
  if (typeof v === "string" && /^\s*[-−]?\d+(\.\d+)?\s*$/.test(v)) return Number(v.trim().replace("−", "-"));
  return v;
}
export const wholeNumber = (what: string) =>
  z
    .number({ error: (iss) => (iss.input === undefined ? "is required" : `must be ${what}`) })
    .int(`must be a whole ${what.replace(/^an? /, "")}`);

/** Optional free text: blank is "not given". */
export const optionalText = (max: number) =>
  z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? undefined : v), z.string().trim().max(max, `must be at most ${max} characters`).optional());
