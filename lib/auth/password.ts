import { hash, verify } from "@node-rs/argon2";

// Argon2id with the library's defaults (19 MiB, 2 passes).
export function hashPassword(password: string): Promise<string> {
  return hash(password);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

/** A hash to verify against when the account does not exist, so both paths take the same time. */
let dummyHash: Promise<string> | undefined;
export function dummyPasswordHash(): Promise<string> {
  dummyHash ??= hash("no-such-account-placeholder");
  return dummyHash;
}
