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

const SESSION_ENDED = "Your session has ended (the account was disabled or its password was changed): sign in again.";

async function loadActor(userId: string, { orgId, signedInAt }: { orgId?: string; signedInAt?: number } = {}): Promise<TActor | null> {
  const found = await getUserWithMemberships({ userId });
  if (!found || found.user.disabledAt) return null;
  // A session signed in before the password was last set (a reset after a lost or
  // exposed password) is no longer accepted: the next request asks to sign in again.
  if (signedInAt !== undefined && found.user.passwordChangedAt && signedInAt < found.user.passwordChangedAt.getTime()) return null;
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
  // A session from before sign-in times were kept counts as signed in at the epoch.
  if (userId) return { actor: await loadActor(userId, { signedInAt: session.user?.signedInAt ?? 0 }), refusal: SESSION_ENDED };
  const authorization = (await headers()).get("authorization");
  if (!authorization) return { actor: null };
  const bearer = await resolveBearer(authorization);
  if (!bearer.ok) return { actor: null, refusal: bearer.message };
  const actor = await loadActor(bearer.userId, { orgId: bearer.orgId });
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
