import "server-only";
import { getServerSession } from "next-auth";
import { headers } from "next/headers";
import { cache } from "react";
import { getUserWithMemberships, type TMembership } from "@/db/queries/users";
import { AppError } from "@/lib/errors";
import { API_TOKEN_MESSAGES, resolveBearer } from "./api-token";
import { authOptions } from "./options";

export type TActor = {
  userId: string;
  email: string;
  name: string;
  rank: string | null;
  memberships: TMembership[];
  /** Set when the request came with a personal API token instead of a session. */
  apiTokenId?: string;
};

type TResolved = { actor: TActor | null; refusal?: string };

async function loadActor(userId: string, orgId?: string): Promise<TActor | null> {
  const found = await getUserWithMemberships({ userId });
  if (!found || found.user.disabledAt) return null;
  return {
    userId,
    email: found.user.email,
    name: found.user.name,
    rank: found.user.rank,
    memberships: orgId ? found.memberships.filter((m) => m.orgId === orgId) : found.memberships,
  };
}

/**
 * The session's user; without a session, the owner of a Bearer API token, with the
 * roles the owner holds now in the token's company. A refused token says why.
 */
const resolveActor = cache(async (): Promise<TResolved> => {
  const session = await getServerSession(authOptions());
  const userId = session?.user?.id;
  if (userId) return { actor: await loadActor(userId) };
  const authorization = (await headers()).get("authorization");
  if (!authorization) return { actor: null };
  const bearer = await resolveBearer(authorization);
  if (!bearer.ok) return { actor: null, refusal: bearer.message };
  const actor = await loadActor(bearer.userId, bearer.orgId);
  if (!actor) return { actor: null, refusal: API_TOKEN_MESSAGES.ownerDisabled };
  return { actor: { ...actor, apiTokenId: bearer.tokenId } };
});

/** The signed-in user with the roles they hold now (read from the database, not the token). */
export const getActor = cache(async (): Promise<TActor | null> => (await resolveActor()).actor);

export async function requireActor(): Promise<TActor> {
  const { actor, refusal } = await resolveActor();
  if (!actor) throw new AppError("unauthenticated", refusal);
  return actor;
}
