import { z } from "zod";

/** A comment of the office on a report, or on one of its findings. */
export const ZCommentInput = z.object({
  body: z.string({ error: "is required" }).trim().min(3, "is required: write the comment").max(4000, "must be at most 4 000 characters"),
  findingId: z.preprocess((v) => (v === "" || v === null ? undefined : v), z.uuid({ error: "must be a finding of this report" }).optional()),
});
