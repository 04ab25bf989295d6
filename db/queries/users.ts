import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { memberships, users, vessels } from "@/db/schema";
import type { TWriter } from "@/db/seed/builders";
import { AppError } from "@/lib/errors";
import type { TRole } from "@/lib/vocabulary";
import { writeAudit } from "./audit";

export type TMembership = { id: string; orgId: string; role: TRole; vesselId: string | null };

/** For sign-in only: looks a user up by e-mail across all companies. */
export async function unsafeGetUserByEmail({ email }: { email: string }) {
  return db().query.users.findFirst({ where: eq(users.email, email.trim().toLowerCase()) });
}

/** A user and every membership they hold, in one round trip (read on every request by lib/auth/actor.ts). */
export async function getUserWithMemberships({ userId }: { userId: string }) {
  const rows = await db()
    .select({ user: users, membership: { id: memberships.id, orgId: memberships.orgId, role: memberships.role, vesselId: memberships.vesselId } })
    .from(users)
    .leftJoin(memberships, eq(memberships.userId, users.id))
    .where(eq(users.id, userId));
  if (!rows.length) return undefined;
  return { user: rows[0]!.user, memberships: rows.flatMap((r) => (r.membership ? [r.membership as TMembership] : [])) };
}

/** Records a failed sign-in; after the fifth in a row the account waits, longer each time. */
export async function recordFailedSignIn({ userId }: { userId: string }) {
  await db()
    .update(users)
    .set({
      failedSignIns: sql`${users.failedSignIns} + 1`,
      lockedUntil: sql`case when ${users.failedSignIns} + 1 >= 5
        then now() + least(interval '15 minutes', interval '30 seconds' * power(2, ${users.failedSignIns} + 1 - 5))
        else null end`,
    })
    .where(eq(users.id, userId));
}

export async function recordSignIn({ userId }: { userId: string }) {
  await db()
    .update(users)
    .set({ failedSignIns: 0, lockedUntil: null, lastSignInAt: sql`now()` })
    .where(eq(users.id, userId));
}

export async function listOrgUsers({ orgId }: { orgId: string }) {
  const rows = await db()
    .select({
      userId: users.id,
      email: users.email,
      name: users.name,
      rank: users.rank,
      disabledAt: users.disabledAt,
      membershipId: memberships.id,
      role: memberships.role,
      vesselId: memberships.vesselId,
      vesselName: vessels.name,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .leftJoin(vessels, and(eq(vessels.id, memberships.vesselId), eq(vessels.orgId, orgId)))
    .where(eq(memberships.orgId, orgId))
    .orderBy(asc(users.name), asc(memberships.role));
  const byUser = new Map<
    string,
    { id: string; email: string; name: string; rank: string | null; disabled: boolean; roles: { membershipId: string; role: TRole; vesselId: string | null; vesselName: string | null }[] }
  >();
  for (const r of rows) {
    const entry = byUser.get(r.userId) ?? {
      id: r.userId, email: r.email, name: r.name, rank: r.rank, disabled: r.disabledAt !== null, roles: [],
    };
    entry.roles.push({ membershipId: r.membershipId, role: r.role, vesselId: r.vesselId, vesselName: r.vesselName });
    byUser.set(r.userId, entry);
  }
  return [...byUser.values()];
}

/** A user belongs to a company when they hold at least one role in it. */
export async function getOrgUser({ orgId, userId }: { orgId: string; userId: string }) {
  const [row] = await db()
    .select({ id: users.id, email: users.email, name: users.name })
    .from(users)
    .innerJoin(memberships, eq(memberships.userId, users.id))
    .where(and(eq(users.id, userId), eq(memberships.orgId, orgId)))
    .limit(1);
  return row;
}

/** Creates a user with their first role in one transaction; the vessel must belong to the company. */
export async function createOrgUser({
  orgId,
  actorUserId,
  input,
}: {
  orgId: string;
  actorUserId: string;
  input: { email: string; name: string; rank?: string; passwordHash: string; role: TRole; vesselId?: string };
}) {
  return db().transaction(async (tx) => {
    if (input.vesselId) await requireOrgVessel(tx, { orgId, vesselId: input.vesselId });
    const [user] = await tx
      .insert(users)
      .values({ email: input.email, name: input.name, rank: input.rank ?? null, passwordHash: input.passwordHash })
      .returning({ id: users.id, email: users.email, name: users.name });
    await tx.insert(memberships).values({ orgId, userId: user!.id, role: input.role, vesselId: input.vesselId ?? null });
    await writeAudit(tx, {
      orgId, actorUserId, action: "create", entity: "user", entityId: user!.id,
      detail: { email: input.email, role: input.role, vesselId: input.vesselId ?? null },
    });
    return user!;
  });
}

export async function addMembership({
  orgId,
  actorUserId,
  userId,
  role,
  vesselId,
}: {
  orgId: string;
  actorUserId: string;
  userId: string;
  role: TRole;
  vesselId?: string;
}) {
  return db().transaction(async (tx) => {
    if (vesselId) await requireOrgVessel(tx, { orgId, vesselId });
    const [row] = await tx.insert(memberships).values({ orgId, userId, role, vesselId: vesselId ?? null }).returning();
    await writeAudit(tx, { orgId, actorUserId, action: "grant", entity: "membership", entityId: row!.id, detail: { userId, role, vesselId } });
    return row!;
  });
}

export async function removeMembership({
  orgId,
  actorUserId,
  membershipId,
}: {
  orgId: string;
  actorUserId: string;
  membershipId: string;
}) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .delete(memberships)
      .where(and(eq(memberships.orgId, orgId), eq(memberships.id, membershipId)))
      .returning();
    if (row) {
      await writeAudit(tx, { orgId, actorUserId, action: "revoke", entity: "membership", entityId: row.id, detail: row });
    }
    return row;
  });
}

async function requireOrgVessel(tx: TWriter, { orgId, vesselId }: { orgId: string; vesselId: string }) {
  const [v] = await tx
    .select({ id: vessels.id })
    .from(vessels)
    .where(and(eq(vessels.orgId, orgId), eq(vessels.id, vesselId)));
  if (!v) throw new AppError("not_found", "No such vessel.");
}
