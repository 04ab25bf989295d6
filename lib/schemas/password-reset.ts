import { z } from "zod";
import { ZNewPassword } from "./user";

/** "Forgot your password?": the address to send the link to. */
export const ZPasswordResetRequest = z.object({
  // Trimmed before it is checked: an address pasted with a space around it is still the address.
  email: z.string({ error: "is required" }).trim().toLowerCase().max(320).pipe(z.email("must be an e-mail address")),
});
export type TPasswordResetRequest = z.infer<typeof ZPasswordResetRequest>;

/** The token from the link: 32 random bytes in base64url are 43 characters. */
export const ZResetToken = z.string({ error: "is required" }).regex(/^[A-Za-z0-9_-]{43}$/, "is not a password reset link's token");

export const ZPasswordResetConfirm = z
  .object({
    token: ZResetToken,
    password: ZNewPassword,
    passwordAgain: z.string({ error: "is required" }),
  })
  .refine((v) => v.password === v.passwordAgain, { path: ["passwordAgain"], message: "does not match the new password" });
export type TPasswordResetConfirm = z.infer<typeof ZPasswordResetConfirm>;
