import "server-only";
// The Bearer half of authentication: `Authorization: Bearer tw_…` → the token's owner.
import { createHash, randomBytes } from "node:crypto";
import { unsafeFindApiTokenByHash, unsafeTouchApiToken } from "@/db/queries/api-tokens";
import { API_TOKEN_PATTERN } from "@/lib/schemas/api-token";

export function newApiToken(): { token: string; tokenHash: string } {
  const token = `tw_${randomBytes(32).toString("base64url")}`;
  return { token, tokenHash: hashApiToken(token) };
}

export function hashApiToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

export const API_TOKEN_MESSAGES = {
  malformed: "The Authorization header must be \"Bearer tw_…\" followed by a Tankwright API token; this one is not in that form.",
  unknown: "This API token is not known: it may have been copied incompletely. Create a new token if you no longer have it.",
  revoked: "This API token was revoked. Create a new token.",
  ownerDisabled: "The account this API token belongs to is disabled.",
  viaToken: "Manage API tokens while signed in, not with an API token.",
} as const;

export type TBearerResult = { ok: true; tokenId: string; userId: string; orgId: string } | { ok: false; message: string };

/** Turns an Authorization header's value into the token's owner, or the reason it is refused. */
export async function resolveBearer(header: string): Promise<TBearerResult> {
  const match = /^Bearer\s+(\S+)\s*$/i.exec(header.trim());
  const token = match?.[1];
  if (!token || !API_TOKEN_PATTERN.test(token)) return { ok: false, message: API_TOKEN_MESSAGES.malformed };
  const row = await unsafeFindApiTokenByHash({ tokenHash: hashApiToken(token) });
  if (!row) return { ok: false, message: API_TOKEN_MESSAGES.unknown };
  if (row.revokedAt) return { ok: false, message: API_TOKEN_MESSAGES.revoked };
  if (row.ownerDisabledAt) return { ok: false, message: API_TOKEN_MESSAGES.ownerDisabled };
  if (!row.lastUsedAt || Date.now() - row.lastUsedAt.getTime() >= 60_000) await unsafeTouchApiToken({ tokenId: row.id });
  return { ok: true, tokenId: row.id, userId: row.userId, orgId: row.orgId };
}
