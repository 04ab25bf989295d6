import "server-only";
// Personal API tokens. Only the SHA-256 of a token is stored. Reads and writes
// are scoped to the owner and their company; the one cross-tenant read is the
// look-up by hash that turns a Bearer header into a user (the "unsafe" prefix).
import { and, desc, eq, isNull, lt, or, sql } from "drizzle-orm";
import { db } from "@/db";
import { apiTokens, users } from "@/db/schema";
import { writeAudit } from "./audit";

const PUBLIC_COLUMNS = {
  id: apiTokens.id,
  name: apiTokens.name,
  createdAt: apiTokens.createdAt,
  lastUsedAt: apiTokens.lastUsedAt,
  revokedAt: apiTokens.revokedAt,
};

export type TApiToken = { id: string; name: string; createdAt: Date; lastUsedAt: Date | null; revokedAt: Date | null };

export async function createApiToken({ orgId, userId, name, tokenHash }: { orgId: string; userId: string; name: string; tokenHash: string }): Promise<TApiToken> {
  return db().transaction(async (tx) => {
    const [row] = await tx.insert(apiTokens).values({ orgId, userId, name, tokenHash }).returning(PUBLIC_COLUMNS);
    await writeAudit(tx, { orgId, actorUserId: userId, action: "api_token_created", entity: "api_token", entityId: row!.id, detail: { name } });
    return row!;
  });
}

/** The owner's tokens in one company, newest first (revoked ones too, marked). */
export async function listApiTokens({ orgId, userId }: { orgId: string; userId: string }): Promise<TApiToken[]> {
  return db()
    .select(PUBLIC_COLUMNS)
    .from(apiTokens)
    .where(and(eq(apiTokens.orgId, orgId), eq(apiTokens.userId, userId)))
    .orderBy(desc(apiTokens.createdAt));
}

/** Revokes one of the owner's tokens; undefined when it is not theirs. Revoking twice changes nothing. */
export async function revokeApiToken({ orgId, userId, tokenId }: { orgId: string; userId: string; tokenId: string }): Promise<TApiToken | undefined> {
  return db().transaction(async (tx) => {
    const scope = and(eq(apiTokens.id, tokenId), eq(apiTokens.orgId, orgId), eq(apiTokens.userId, userId));
    const [row] = await tx.select(PUBLIC_COLUMNS).from(apiTokens).where(scope).for("update");
    if (!row || row.revokedAt) return row;
    const [revoked] = await tx.update(apiTokens).set({ revokedAt: sql`now()` }).where(scope).returning(PUBLIC_COLUMNS);
    await writeAudit(tx, { orgId, actorUserId: userId, action: "api_token_revoked", entity: "api_token", entityId: tokenId, detail: { name: row.name } });
    return revoked;
  });
}

/** For the authentication of a Bearer header only: the token and its owner's state, by hash, across companies. */
export async function unsafeFindApiTokenByHash({ tokenHash }: { tokenHash: string }) {
  const [row] = await db()
    .select({
      id: apiTokens.id,
      orgId: apiTokens.orgId,
      userId: apiTokens.userId,
      revokedAt: apiTokens.revokedAt,
      lastUsedAt: apiTokens.lastUsedAt,
      ownerDisabledAt: users.disabledAt,
    })
    .from(apiTokens)
    .innerJoin(users, eq(users.id, apiTokens.userId))
    .where(eq(apiTokens.tokenHash, tokenHash));
  return row;
}

/** Marks a token used, at most once a minute (a busy integration does not write on every request). */
export async function unsafeTouchApiToken({ tokenId }: { tokenId: string }) {
  await db()
    .update(apiTokens)
    .set({ lastUsedAt: sql`now()` })
    .where(and(eq(apiTokens.id, tokenId), or(isNull(apiTokens.lastUsedAt), lt(apiTokens.lastUsedAt, sql`now() - interval '1 minute'`))));
}
