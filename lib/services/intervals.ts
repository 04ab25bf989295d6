import "server-only";
// Inspection intervals are company settings kept by the office: a default and a
// shorter one for tanks whose coating is below GOOD, company-wide or per vessel.
import { z } from "zod";
import * as q from "@/db/queries/intervals";
import { getVessel } from "@/db/queries/vessels";
import type { TActor } from "@/lib/auth/actor";
import { authorizeOrg } from "@/lib/auth/authorize";
import { rolesInOrg } from "@/lib/auth/roles";
import { AppError } from "@/lib/errors";
import { validateInput } from "@/lib/http/route";
import { ZIntervalsInput } from "@/lib/schemas/intervals";

export const INTERVAL_KEEPERS = ["superintendent", "admin"] as const;

/** Whether this user keeps the company's intervals (the fleet page shows the settings to them only). */
export const keepsIntervals = (actor: TActor, orgId: string) => rolesInOrg(actor.memberships, orgId).some((r) => (INTERVAL_KEEPERS as readonly string[]).includes(r));

export async function listIntervalsAs(actor: TActor) {
  const { orgId } = await authorizeOrg({ actor, allow: INTERVAL_KEEPERS });
  const rows = await q.listIntervals({ orgId });
  return { company: rows.find((r) => r.vesselId === null) ?? null, vessels: rows.filter((r) => r.vesselId !== null) };
}

async function ownVessel(orgId: string, vesselId: string) {
  if (!(await getVessel({ orgId, vesselId }))) throw new AppError("not_found", "No such vessel.");
}

export async function setIntervalsAs(actor: TActor, body: unknown) {
  const { orgId } = await authorizeOrg({ actor, allow: INTERVAL_KEEPERS });
  const input = validateInput(ZIntervalsInput, body);
  if (input.vesselId) await ownVessel(orgId, input.vesselId);
  const row = await q.setIntervals({ orgId, vesselId: input.vesselId ?? null, defaultMonths: input.defaultMonths, belowGoodMonths: input.belowGoodMonths, actorUserId: actor.userId });
  return { vesselId: row.vesselId, defaultMonths: row.defaultMonths, belowGoodMonths: row.belowGoodMonths };
}

export async function clearVesselIntervalsAs(actor: TActor, vesselId: string | null) {
  const { orgId } = await authorizeOrg({ actor, allow: INTERVAL_KEEPERS });
  if (!vesselId || !z.uuid().safeParse(vesselId).success) throw new AppError("bad_request", "Check vesselId: name the vessel that goes back to the company's intervals.", [{ path: "vesselId", message: "is required" }]);
  await ownVessel(orgId, vesselId);
  if (!(await q.clearVesselIntervals({ orgId, vesselId, actorUserId: actor.userId }))) throw new AppError("not_found", "This vessel has no intervals of its own.");
  return { ok: true };
}
