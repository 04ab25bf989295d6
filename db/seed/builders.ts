// Small builders over the schema, shared by the demo seed and the test fixtures.
import { hashPassword } from "@/lib/auth/password";
import type { TRole } from "@/lib/vocabulary";
import type { TDb } from "../client";
import * as s from "../schema";

type TTx = Parameters<Parameters<TDb["transaction"]>[0]>[0];
export type TWriter = TDb | TTx;

export async function insertOrganisation(w: TWriter, v: { slug: string; name: string }) {
  const [org] = await w.insert(s.organisations).values(v).returning();
  await w.insert(s.orgSettings).values({ orgId: org!.id });
  return org!;
}

export async function insertUser(
  w: TWriter,
  v: { email: string; name: string; rank?: string; password: string },
) {
  const [user] = await w
    .insert(s.users)
    .values({ email: v.email.toLowerCase(), name: v.name, rank: v.rank, passwordHash: await hashPassword(v.password) })
    .returning();
  return user!;
}

export async function insertMembership(
  w: TWriter,
  v: { orgId: string; userId: string; role: TRole; vesselId?: string | null },
) {
  const [m] = await w
    .insert(s.memberships)
    .values({ ...v, vesselId: v.vesselId ?? null })
    .returning();
  return m!;
}

export async function insertVessel(w: TWriter, v: typeof s.vessels.$inferInsert) {
  const [vessel] = await w.insert(s.vessels).values(v).returning();
  return vessel!;
}

export async function insertTank(
  w: TWriter,
  v: typeof s.tanks.$inferInsert,
  members: Omit<typeof s.tankMembers.$inferInsert, "orgId" | "tankId">[] = [],
  special: { frame: number; note: string }[] = [],
) {
  const [tank] = await w.insert(s.tanks).values(v).returning();
  if (members.length) {
    await w.insert(s.tankMembers).values(members.map((m) => ({ ...m, orgId: v.orgId, tankId: tank!.id })));
  }
  if (special.length) {
    await w.insert(s.specialFrames).values(special.map((f) => ({ ...f, orgId: v.orgId, tankId: tank!.id })));
  }
  return tank!;
}
