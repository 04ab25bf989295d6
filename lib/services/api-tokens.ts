import "server-only";
// Personal API tokens: an admin or superintendent makes one for themselves, sees it
// once, and sends it as `Authorization: Bearer tw_…`; it acts with the owner's
// current roles in the token's company. Only its SHA-256 is stored.
import { createApiToken, listApiTokens, revokeApiToken } from "@/db/queries/api-tokens";
import type { TActor } from "@/lib/auth/actor";
import { API_TOKEN_MESSAGES, newApiToken } from "@/lib/auth/api-token";
import { authorizeOrg } from "@/lib/auth/authorize";
import { AppError } from "@/lib/errors";
import { validateInput } from "@/lib/http/route";
import { ZApiTokenInput } from "@/lib/schemas/api-token";
import type { TRole } from "@/lib/vocabulary";
import { z } from "zod";

const TOKEN_OWNERS: readonly TRole[] = ["admin", "superintendent"];

/** Tokens are managed in a signed-in session only: a leaked token cannot make more of itself. */
async function authorizeTokenOwner(actor: TActor) {
  if (actor.apiTokenId) throw new AppError("forbidden", API_TOKEN_MESSAGES.viaToken);
  return authorizeOrg({ actor, allow: TOKEN_OWNERS });
}

export async function listApiTokensAs(actor: TActor) {
  const { orgId } = await authorizeTokenOwner(actor);
  return listApiTokens({ orgId, userId: actor.userId });
}

/** Creates a token; the clear text is in the answer once and never again. */
export async function createApiTokenAs(actor: TActor, body: unknown) {
  const { orgId } = await authorizeTokenOwner(actor);
  const input = validateInput(ZApiTokenInput, body);
  const { token, tokenHash } = newApiToken();
  const row = await createApiToken({ orgId, userId: actor.userId, name: input.name, tokenHash });
  return { apiToken: row, token };
}

export async function revokeApiTokenAs(actor: TActor, tokenId: string) {
  const { orgId } = await authorizeTokenOwner(actor);
  if (!z.uuid().safeParse(tokenId).success) throw new AppError("not_found", "No such API token.");
  const row = await revokeApiToken({ orgId, userId: actor.userId, tokenId });
  if (!row) throw new AppError("not_found", "No such API token.");
  return row;
}
