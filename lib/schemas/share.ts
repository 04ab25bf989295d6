import { z } from "zod";

/** Sharing a countersigned report with one of the company's surveyors. */
export const ZShareInput = z.object({ surveyorUserId: z.uuid({ error: "must name one of the company's surveyors" }) });

/** A surveyor's acknowledgement, with an optional comment. */
export const ZAcknowledgeInput = z.object({
  comment: z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? undefined : v), z.string().trim().max(2000, "must be at most 2 000 characters").optional()),
});
