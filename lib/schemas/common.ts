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

// ---------------------------------------------------------------- URL search params

/** A blank box or an absent search param is "not given". */
export const blankParam = (v: unknown) => (v === "" || v === null ? undefined : v);

/** A whole-number search param within bounds, with a message that names it. */
export const wholeParam = (what: string, min: number, max: number) =>
  z.coerce
    .number({ error: `${what} must be a whole number` })
    .refine((n) => Number.isInteger(n), `${what} must be a whole number`)
    .refine((n) => n >= min && n <= max, `${what} must be between ${min} and ${max}`);

/** Reads one search param as Next.js or a URL hands them over (a repeated key: the first value counts). */
export function searchParamReader(params: Record<string, string | string[] | undefined> | URLSearchParams) {
  return (k: string) => {
    const v = params instanceof URLSearchParams ? params.get(k) : params[k];
    return Array.isArray(v) ? v[0] : (v ?? undefined);
  };
}
