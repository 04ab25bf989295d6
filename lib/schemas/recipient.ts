import { z } from "zod";
import { RECIPIENT_KINDS } from "@/lib/vocabulary";

/** How many addresses a vessel's report goes to at most (office and class together). */
export const RECIPIENTS_PER_VESSEL = 20;

const blankIsAbsent = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);
const oneLine = (v: string) => !/[\r\n]/.test(v);

/** An e-mail address, trimmed and kept in lower case so that the same address is never listed twice. */
export const ZRecipientEmail = z
  .string({ error: (iss) => (iss.input === undefined ? "is required" : "must be text") })
  .trim()
  .toLowerCase()
  .min(1, "is required")
  .max(254, "must be at most 254 characters")
  .pipe(z.email("must be an e-mail address, e.g. technical@company.com"));

export const ZRecipientInput = z.object({
  kind: z.enum(RECIPIENT_KINDS, { error: "must be office or class" }),
  name: z.preprocess(
    blankIsAbsent,
    z.string({ error: "must be text" }).trim().max(120, "must be at most 120 characters").refine(oneLine, "must be on one line").optional(),
  ),
  email: ZRecipientEmail,
});
export type TRecipientInput = z.infer<typeof ZRecipientInput>;
