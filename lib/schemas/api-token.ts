import { z } from "zod";

/** A new personal API token: a name that says which system uses it. */
export const ZApiTokenInput = z.object({
  name: z.string({ error: "is required" }).trim().min(1, "is required: name the system that will use the token").max(80, "may have at most 80 characters"),
});
export type TApiTokenInput = z.infer<typeof ZApiTokenInput>;

/** "tw_" and 32 random bytes in base64url (43 characters). */
export const API_TOKEN_PATTERN = /^tw_[A-Za-z0-9_-]{43}$/;
