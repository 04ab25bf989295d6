import "server-only";
// Password reset tokens. A reset happens before anyone is signed in and a user may
// belong to several companies, so these read by user or token hash across tenants
// (the "unsafe" prefix says so); each write is audited in every company of the user.
import { and, count, eq, gt, isNull, ne, sql } from "drizzle-orm";
import { db } from "@/db";
import { auditLog, memberships, passwordResetTokens, users } from "@/db/schema";
import type { TWriter } from "@/db/seed/builders";

async function auditInUserOrgs(w: TWriter, userId: string, action: string, detail: unknown) {
  const orgs = await w.selectDistinct({ orgId: memberships.orgId }).from(memberships).where(eq(memberships.userId, userId));
  const rows = orgs.length > 0 ? orgs.map((o) => o.orgId) : [null];
  await w.insert(auditLog).values(rows.map((orgId) => ({ orgId, actorUserId: userId, action, entity: "user", entityId: userId, detail })));
}

/**
 * Stores a new token's hash for the user, unless the user already asked `maxPerWindow`
 * times within the window (then nothing is stored and it returns null). The user's
 * other open tokens stop working: only the newest link counts.
 */
export async function unsafeIssueResetToken({
  userId,
  tokenHash,
  ttlSeconds,
  maxPerWindow,
  windowSeconds,
}: {
  userId: string;
  tokenHash: string;
  ttlSeconds: number;
  maxPerWindow: number;
  windowSeconds: number;
}): Promise<{ expiresAt: Date } | null> {
  return db().transaction(async (tx) => {
    // One request at a time per user, so that the count below holds.
    await tx.select({ id: users.id }).from(users).where(eq(users.id, userId)).for("update");
    const [recent] = await tx
      .select({ n: count() })
      .from(passwordResetTokens)
      .where(and(eq(passwordResetTokens.userId, userId), gt(passwordResetTokens.createdAt, sql`now() - make_interval(secs => ${windowSeconds})`)));
    if ((recent?.n ?? 0) >= maxPerWindow) return null;
    await tx
      .update(passwordResetTokens)
      .set({ usedAt: sql`now()` })
      .where(and(eq(passwordResetTokens.userId, userId), isNull(passwordResetTokens.usedAt)));
    const [token] = await tx
      .insert(passwordResetTokens)
      .values({ userId, tokenHash, expiresAt: sql`now() + make_interval(secs => ${ttlSeconds})` })
      .returning({ id: passwordResetTokens.id, expiresAt: passwordResetTokens.expiresAt });
    await auditInUserOrgs(tx, userId, "password_reset_requested", { tokenId: token!.id });
    return { expiresAt: token!.expiresAt };
  });
}

export type TResetTokenState = "valid" | "expired" | "used" | "unknown";

function stateOf(row: { expiresAt: Date; usedAt: Date | null; disabledAt: Date | null; now: Date } | undefined): TResetTokenState {
  if (!row || row.disabledAt) return "unknown";
  if (row.usedAt) return "used";
  if (row.expiresAt <= row.now) return "expired";
  return "valid";
}

/** What a token is worth now, without using it (for the reset page). */
export async function unsafeGetResetTokenState({ tokenHash }: { tokenHash: string }): Promise<{ state: TResetTokenState; email?: string; firstPassword?: boolean }> {
  const [row] = await db()
    .select({
      expiresAt: passwordResetTokens.expiresAt,
      usedAt: passwordResetTokens.usedAt,
      disabledAt: users.disabledAt,
      email: users.email,
      // An invited user who has never signed in nor chosen a password: the link sets their first one.
      firstPassword: sql<boolean>`${users.lastSignInAt} is null and ${users.passwordChangedAt} is null`,
      now: sql<Date>`now()`.mapWith(passwordResetTokens.expiresAt),
    })
    .from(passwordResetTokens)
    .innerJoin(users, eq(users.id, passwordResetTokens.userId))
    .where(eq(passwordResetTokens.tokenHash, tokenHash));
  const state = stateOf(row);
  return state === "unknown" ? { state } : { state, email: row!.email, firstPassword: row!.firstPassword };
}

/**
 * Uses a token: when it is still valid, sets the new password hash, lifts a sign-in
 * wait, marks the token used and stops the user's other open tokens, in one transaction.
 */
export async function unsafeUseResetToken({
  tokenHash,
  passwordHash,
}: {
  tokenHash: string;
  passwordHash: string;
}): Promise<{ state: TResetTokenState; userId?: string }> {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .select({
        id: passwordResetTokens.id,
        userId: passwordResetTokens.userId,
        expiresAt: passwordResetTokens.expiresAt,
        usedAt: passwordResetTokens.usedAt,
        disabledAt: users.disabledAt,
        now: sql<Date>`now()`.mapWith(passwordResetTokens.expiresAt),
      })
      .from(passwordResetTokens)
      .innerJoin(users, eq(users.id, passwordResetTokens.userId))
      .where(eq(passwordResetTokens.tokenHash, tokenHash))
      .for("update", { of: passwordResetTokens });
    const state = stateOf(row);
    if (state !== "valid") return { state };
    const { id, userId } = row!;
    await tx.update(passwordResetTokens).set({ usedAt: sql`now()` }).where(eq(passwordResetTokens.id, id));
    await tx
      .update(passwordResetTokens)
      .set({ usedAt: sql`now()` })
      .where(and(eq(passwordResetTokens.userId, userId), isNull(passwordResetTokens.usedAt), ne(passwordResetTokens.id, id)));
    await tx.update(users).set({ passwordHash, failedSignIns: 0, lockedUntil: null, passwordChangedAt: sql`now()`, updatedAt: sql`now()` }).where(eq(users.id, userId));
    await auditInUserOrgs(tx, userId, "password_reset", { tokenId: id });
    return { state, userId };
  });
}
