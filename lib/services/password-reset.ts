import "server-only";
// Password reset by e-mail. Public by nature (the person cannot sign in), so it
// never tells whether an address has an account: every request gets the same
// answer at once, and the look-up, the token and the e-mail happen after the
// response has gone (also keeping the answer's timing the same).
import { createHash, randomBytes } from "node:crypto";
import { after } from "next/server";
import { unsafeGetResetTokenState, unsafeIssueResetToken, unsafeUseResetToken, type TResetTokenState } from "@/db/queries/password-reset";
import { unsafeGetUserByEmail } from "@/db/queries/users";
import { hashPassword } from "@/lib/auth/password";
import { serverEnv } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { formatDateTime } from "@/lib/format";
import { validateInput } from "@/lib/http/route";
import { sendMail } from "@/lib/mail/mailer";
import { ZPasswordResetConfirm, ZPasswordResetRequest, ZResetToken } from "@/lib/schemas/password-reset";
import { passwordResetEmail } from "@/templates/email/password-reset";

/** A link works for one hour. */
export const RESET_TOKEN_TTL_SECONDS = 60 * 60;
/** At most this many links per account within the window; more requests are quietly ignored. */
export const RESET_REQUESTS_PER_WINDOW = 3;
export const RESET_WINDOW_SECONDS = 15 * 60;

export const RESET_REQUESTED_MESSAGE =
  "If an account exists for that address, an e-mail with a link to choose a new password is on its way. The link works once, for one hour. Check the spam folder if it does not arrive within a few minutes.";

export const RESET_TOKEN_MESSAGES: Record<Exclude<TResetTokenState, "valid">, string> = {
  unknown: "This password reset link is not valid: it may have been cut short when it was copied. Ask for a new link.",
  expired: "This password reset link has expired: a link works for one hour. Ask for a new link.",
  used: "This password reset link was already used, or a newer link replaced it. Ask for a new link if you still need one.",
};

export const RESET_DONE_MESSAGE = "Your password has been changed. Sign in with the new password.";
export const FIRST_PASSWORD_DONE_MESSAGE = "Your password is set. Sign in with it.";

/** 32 random bytes as base64url (43 characters); only its SHA-256 is stored. */
export function newResetToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, tokenHash: hashResetToken(token) };
}

export function hashResetToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

export function resetLink(appUrl: string, token: string): string {
  return `${appUrl.replace(/\/$/, "")}/reset-password?token=${encodeURIComponent(token)}`;
}

async function issueResetLink(email: string): Promise<void> {
  const user = await unsafeGetUserByEmail({ email });
  if (!user || user.disabledAt) return;
  const { token, tokenHash } = newResetToken();
  const issued = await unsafeIssueResetToken({
    userId: user.id,
    tokenHash,
    ttlSeconds: RESET_TOKEN_TTL_SECONDS,
    maxPerWindow: RESET_REQUESTS_PER_WINDOW,
    windowSeconds: RESET_WINDOW_SECONDS,
  });
  if (!issued) {
    console.warn(`[tankwright] password reset: too many requests for user ${user.id}; no e-mail sent`);
    return;
  }
  const mail = passwordResetEmail({ name: user.name, link: resetLink(serverEnv().APP_URL, token), expires: formatDateTime(issued.expiresAt) });
  await sendMail({ to: user.email, ...mail });
}

/** "Forgot your password?": the same answer for every well-formed address. */
export async function requestPasswordReset(body: unknown): Promise<{ message: string }> {
  const { email } = validateInput(ZPasswordResetRequest, body);
  after(async () => {
    try {
      await issueResetLink(email);
    } catch (error) {
      // Never shown to the requester: that would tell them the address has an account.
      console.error("[tankwright] password reset e-mail failed", error);
    }
  });
  return { message: RESET_REQUESTED_MESSAGE };
}

/** For the reset page: whether the link still works, and for which address. */
export async function checkResetToken(token: unknown): Promise<{ state: TResetTokenState; email?: string; firstPassword?: boolean; message?: string }> {
  const parsed = ZResetToken.safeParse(token);
  if (!parsed.success) return { state: "unknown", message: RESET_TOKEN_MESSAGES.unknown };
  const found = await unsafeGetResetTokenState({ tokenHash: hashResetToken(parsed.data) });
  return found.state === "valid" ? found : { ...found, message: RESET_TOKEN_MESSAGES[found.state] };
}

/** Sets the new password when the token still works; otherwise says why and changes nothing. */
export async function resetPassword(body: unknown): Promise<{ message: string }> {
  // A token that cannot be one gets the same message as one that was never issued.
  if (!ZResetToken.safeParse((body as { token?: unknown } | null)?.token).success) throw tokenRefused("unknown");
  const input = validateInput(ZPasswordResetConfirm, body);
  const tokenHash = hashResetToken(input.token);
  // Look first, so that a dead link does not cost an Argon2 hash; the update below checks again.
  const before = await unsafeGetResetTokenState({ tokenHash });
  if (before.state !== "valid") throw tokenRefused(before.state);
  const result = await unsafeUseResetToken({ tokenHash, passwordHash: await hashPassword(input.password) });
  if (result.state !== "valid") throw tokenRefused(result.state);
  return { message: before.firstPassword ? FIRST_PASSWORD_DONE_MESSAGE : RESET_DONE_MESSAGE };
}

function tokenRefused(state: Exclude<TResetTokenState, "valid">): AppError {
  return new AppError("bad_request", RESET_TOKEN_MESSAGES[state], [{ path: "token", message: RESET_TOKEN_MESSAGES[state] }]);
}
