import "server-only";
import { getServerSession } from "next-auth";
import { cache } from "react";
import { getUserWithMemberships, type TMembership } from "@/db/queries/users";
import { AppError } from "@/lib/errors";
import { authOptions } from "./options";

export type TActor = {
  userId: string;
  email: string;
  name: string;
  rank: string | null;
  memberships: TMembership[];
};

/** The signed-in user with the roles they hold now (read from the database, not the token). */
export const getActor = cache(async (): Promise<TActor | null> => {
  const session = await getServerSession(authOptions());
  const userId = session?.user?.id;
  if (!userId) return null;
  const found = await getUserWithMemberships({ userId });
  if (!found || found.user.disabledAt) return null;
  return {
    userId,
    email: found.user.email,
    name: found.user.name,
    rank: found.user.rank,
    memberships: found.memberships,
  };
});

export async function requireActor(): Promise<TActor> {
  const actor = await getActor();
  if (!actor) throw new AppError("unauthenticated");
  return actor;
}
