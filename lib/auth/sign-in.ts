import "server-only";
import { recordFailedSignIn, recordSignIn, unsafeGetUserByEmail } from "@/db/queries/users";
import { dummyPasswordHash, verifyPassword } from "./password";

/** The one message for every refused sign-in: it does not tell which part was wrong. */
export const SIGN_IN_REFUSED =
  "Sign-in refused: check the e-mail address and password. After several failed attempts the account waits a little before it accepts another try.";

export type TSignedInUser = { id: string; email: string; name: string };

export async function checkCredentials(email: string, password: string): Promise<TSignedInUser | null> {
  const user = await unsafeGetUserByEmail({ email });
  if (!user) {
    await verifyPassword(await dummyPasswordHash(), password);
    return null;
  }
  if (user.disabledAt) return null;
  if (user.lockedUntil && user.lockedUntil > new Date()) {
    // Still waiting after repeated failures: refuse without looking at the password.
    return null;
  }
  if (!(await verifyPassword(user.passwordHash, password))) {
    await recordFailedSignIn({ userId: user.id });
    return null;
  }
  await recordSignIn({ userId: user.id });
  return { id: user.id, email: user.email, name: user.name };
}
