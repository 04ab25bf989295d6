import "server-only";
import { z } from "zod";
import {
  addSpecialFrame,
  addTankMember,
  countTankInspections,
  createMirroredTank,
  createTank,
  createTanks,
  deleteSpecialFrame,
  deleteTank,
  deleteTankMember,
  getTank,
  getTankCatalogue,
  listTanks,
  toCatalogue,
  updateTank,
} from "@/db/queries/tanks";
import type { TActor } from "@/lib/auth/actor";
import { authorizeVessel } from "@/lib/auth/authorize";
import { AppError, databaseErrorCode } from "@/lib/errors";
import { validateInput } from "@/lib/http/route";
import { memberInputSchema, specialFrameInputSchema, tankInputSchema, type TTankInput } from "@/lib/schemas/tank";
import { memberConflict, memberMisfit } from "@/lib/structure/catalogue";
import { mirrorTankInput } from "@/lib/structure/mirror";
import { parseTankCsv, type TCsvPreview } from "@/lib/structure/tank-csv";
import { VESSEL_READERS } from "./vessels";

/** Who keeps a vessel's structure map: its officers and master, and the office. */
export const STRUCTURE_EDITORS = ["officer", "master", "superintendent", "admin"] as const;

const ZId = z.uuid();

function duplicateCode(error: unknown, code: string): never {
  if (databaseErrorCode(error) === "23505") {
    throw new AppError("conflict", `A tank with the code "${code}" already exists on this vessel.`, [{ path: "code", message: "is already used on this vessel" }]);
  }
  throw error;
}

export const canEditStructure = (roles: readonly string[]) => roles.some((r) => (STRUCTURE_EDITORS as readonly string[]).includes(r));

export async function readVesselTanks(actor: TActor, vesselId: string) {
  const { orgId, vessel, roles } = await authorizeVessel({ actor, vesselId, allow: VESSEL_READERS });
  return { vessel, roles, tanks: await listTanks({ orgId, vesselId }) };
}

/** A tank with its catalogue; 404 when the tank is not on this vessel. */
export async function readTank(actor: TActor, vesselId: string, tankId: string) {
  const auth = await authorizeVessel({ actor, vesselId, allow: VESSEL_READERS });
  if (!ZId.safeParse(tankId).success) throw new AppError("not_found", "No such tank.");
  const tank = await getTank({ orgId: auth.orgId, vesselId, tankId });
  if (!tank) throw new AppError("not_found", "No such tank.");
  const rows = await getTankCatalogue({ orgId: auth.orgId, tankId });
  return { ...auth, tank, rows, catalogue: toCatalogue(tank, rows) };
}

async function editableTank(actor: TActor, vesselId: string, tankId: string) {
  await authorizeVessel({ actor, vesselId, allow: STRUCTURE_EDITORS });
  return readTank(actor, vesselId, tankId);
}

export async function createTankAs(actor: TActor, vesselId: string, body: unknown) {
  const { orgId, vessel } = await authorizeVessel({ actor, vesselId, allow: STRUCTURE_EDITORS });
  const input = validateInput(tankInputSchema(vessel), body);
  return createTank({ orgId, vesselId, actorUserId: actor.userId, input }).catch((e) => duplicateCode(e, input.code));
}

export async function updateTankAs(actor: TActor, vesselId: string, tankId: string, body: unknown) {
  const { orgId, vessel, catalogue } = await editableTank(actor, vesselId, tankId);
  const input = validateInput(tankInputSchema(vessel), body);
  const outside = [
    ...catalogue.members.flatMap((m) => m.frames ?? []),
    ...catalogue.specialFrames.map((s) => s.frame),
  ].filter((f) => f < input.frameFrom || f > input.frameTo);
  if (outside.length) {
    throw new AppError("conflict", `The new frame range leaves Fr. ${[...new Set(outside)].join(", ")} of the member catalogue outside the tank; change those first.`, [
      { path: "frameFrom", message: "would leave catalogued frames outside the tank" },
    ]);
  }
  const row = await updateTank({ orgId, vesselId, tankId, actorUserId: actor.userId, input }).catch((e) => duplicateCode(e, input.code));
  if (!row) throw new AppError("not_found", "No such tank.");
  return row;
}

export async function deleteTankAs(actor: TActor, vesselId: string, tankId: string) {
  const { orgId, tank } = await editableTank(actor, vesselId, tankId);
  if ((await countTankInspections({ orgId, tankId })) > 0) {
    throw new AppError("conflict", `${tank.code} has inspections on record and cannot be deleted.`);
  }
  await deleteTank({ orgId, vesselId, tankId, actorUserId: actor.userId });
}

export async function addMemberAs(actor: TActor, vesselId: string, tankId: string, body: unknown) {
  const { orgId, tank, catalogue } = await editableTank(actor, vesselId, tankId);
  const input = validateInput(memberInputSchema(tank), body);
  const misfit = memberMisfit(tank.kind, input);
  if (misfit) throw new AppError("unprocessable", misfit.message, [{ path: misfit.path, message: misfit.message }]);
  const clash = memberConflict(catalogue.members, {
    kind: input.kind, platingRegion: input.platingRegion ?? null, numberFrom: input.numberFrom ?? null, numberTo: input.numberTo ?? null,
    numbering: input.numbering ?? null, frames: input.frames ?? null, hasCentreGirder: input.hasCentreGirder ?? null,
  });
  if (clash) throw new AppError("conflict", clash, [{ path: input.kind === "web_frame" ? "frames" : "numberFrom", message: "overlaps the catalogue" }]);
  return addTankMember({ orgId, actorUserId: actor.userId, tankId, input });
}

export async function removeMemberAs(actor: TActor, vesselId: string, tankId: string, memberId: string) {
  const { orgId } = await editableTank(actor, vesselId, tankId);
  if (!ZId.safeParse(memberId).success || !(await deleteTankMember({ orgId, actorUserId: actor.userId, tankId, memberId }))) {
    throw new AppError("not_found", "No such member.");
  }
}

export async function addSpecialFrameAs(actor: TActor, vesselId: string, tankId: string, body: unknown) {
  const { orgId, tank, catalogue } = await editableTank(actor, vesselId, tankId);
  const input = validateInput(specialFrameInputSchema(tank), body);
  if (catalogue.specialFrames.some((s) => s.frame === input.frame)) {
    throw new AppError("conflict", `Fr. ${input.frame} already has a note.`, [{ path: "frame", message: "already has a note" }]);
  }
  return addSpecialFrame({ orgId, actorUserId: actor.userId, tankId, ...input });
}

export async function removeSpecialFrameAs(actor: TActor, vesselId: string, tankId: string, specialFrameId: string) {
  const { orgId } = await editableTank(actor, vesselId, tankId);
  if (!ZId.safeParse(specialFrameId).success || !(await deleteSpecialFrame({ orgId, actorUserId: actor.userId, tankId, specialFrameId }))) {
    throw new AppError("not_found", "No such special frame.");
  }
}

/** "Copy to the other side": the port tank's definition and catalogue as a new starboard tank (or the reverse). */
export async function mirrorTankAs(actor: TActor, vesselId: string, tankId: string) {
  const { orgId, vessel, tank, rows, catalogue } = await editableTank(actor, vesselId, tankId);
  const mirrored = mirrorTankInput(tank);
  if (!mirrored) throw new AppError("unprocessable", "A centre tank has no other side to copy to.");
  const input: TTankInput = validateInput(tankInputSchema(vessel), mirrored);
  return createMirroredTank({
    orgId, vesselId, actorUserId: actor.userId, input, sourceTankId: tank.id, catalogue,
    members: rows.members.map((m) => ({ label: m.label, note: m.note })),
  }).catch((e) => duplicateCode(e, input.code));
}

/** CSV import: `commit` false only previews; nothing is written unless every row is valid. */
export async function importTanksAs(actor: TActor, vesselId: string, bytes: Uint8Array, commit: boolean): Promise<TCsvPreview & { created: number }> {
  const { orgId, vessel } = await authorizeVessel({ actor, vesselId, allow: STRUCTURE_EDITORS });
  const existing = await listTanks({ orgId, vesselId });
  const preview = parseTankCsv(bytes, { vessel, existingCodes: existing.map((t) => t.code) });
  if (!commit || !preview.ok) return { ...preview, created: 0 };
  const rows = await createTanks({ orgId, vesselId, actorUserId: actor.userId, inputs: preview.rows.map((r) => r.input!) }).catch((e) => {
    if (databaseErrorCode(e) === "23505") throw new AppError("conflict", "A tank code in the file was created by someone else meanwhile; preview again.");
    throw e;
  });
  return { ...preview, created: rows.length };
}
