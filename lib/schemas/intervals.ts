import { z } from "zod";

// Only a missing value is "required"; anything else that is not a number ("abc", NaN, "12") is told what it must be.
const months = (what: string) =>
  z
    .number({ error: (issue) => (issue.input === undefined || issue.input === null ? `is required: ${what} in months` : "must be a whole number of months") })
    .int("must be a whole number of months").min(1, "must be at least 1 month").max(60, "must be at most 60 months");

/** The company's inspection intervals (vesselId absent), or one vessel's own (which then take precedence). */
export const ZIntervalsInput = z
  .object({
    vesselId: z.uuid({ error: "must be a vessel of the company" }).nullish(),
    defaultMonths: months("the interval for tanks rated GOOD"),
    belowGoodMonths: months("the interval for tanks below GOOD"),
  })
  .refine((v) => v.belowGoodMonths <= v.defaultMonths, { path: ["belowGoodMonths"], message: "must not be longer than the interval for tanks rated GOOD" });
export type TIntervalsInput = z.infer<typeof ZIntervalsInput>;
