import { z } from "zod";

/**
 * Sharing a countersigned report with class: with one of the company's
 * surveyors, or by invitation to an e-mail address (an account is made for a
 * surveyor who has none, and they choose their password from the e-mail).
 */
export const ZShareInput = z.union(
  [
    z.object({ surveyorUserId: z.uuid({ error: "must name one of the company's surveyors" }) }),
    z.object({
      email: z.string({ error: "is required" }).trim().toLowerCase().max(254).pipe(z.email("must be an e-mail address")),
      name: z.string({ error: "is required: the surveyor's name" }).trim().min(2, "is required: the surveyor's name").max(120, "must be at most 120 characters"),
    }),
  ],
  { error: "name a surveyor of the company (surveyorUserId), or invite one by e-mail address and name" },
);
export type TShareInput = z.infer<typeof ZShareInput>;

/** A surveyor's acknowledgement, with an optional comment. */
export const ZAcknowledgeInput = z.object({
  comment: z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? undefined : v), z.string().trim().max(2000, "must be at most 2 000 characters").optional()),
});
