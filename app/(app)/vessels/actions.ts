"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { runServiceAction, type TActionState } from "@/lib/http/action";
import { startInspectionAs } from "@/lib/services/inspections";
import {
  addMemberAs,
  addSpecialFrameAs,
  createTankAs,
  deleteTankAs,
  mirrorTankAs,
  removeMemberAs,
  removeSpecialFrameAs,
  updateTankAs,
} from "@/lib/services/tanks";

// Server actions of the structure map. Each is a public endpoint: the service
// it calls authorizes the signed-in user on the vessel before anything else.

const ids = (form: FormData) => ({ vesselId: String(form.get("$vesselId") ?? ""), tankId: String(form.get("$tankId") ?? "") });

export async function createTankAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  const { vesselId } = ids(form);
  let createdId = "";
  const state = await runServiceAction(form, async (raw, actor) => {
    const tank = await createTankAs(actor, vesselId, raw);
    createdId = tank.id;
    return `Tank ${tank.code} created.`;
  });
  if (createdId) redirect(`/vessels/${vesselId}/tanks/${createdId}`);
  return state;
}

export async function updateTankAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  const { vesselId, tankId } = ids(form);
  let saved = false;
  const state = await runServiceAction(form, async (raw, actor) => {
    const tank = await updateTankAs(actor, vesselId, tankId, raw);
    saved = true;
    return `Tank ${tank.code} saved.`;
  });
  if (saved) redirect(`/vessels/${vesselId}/tanks/${tankId}`);
  return state;
}

export async function deleteTankAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  const { vesselId, tankId } = ids(form);
  let deleted = false;
  const state = await runServiceAction(form, async (_raw, actor) => {
    await deleteTankAs(actor, vesselId, tankId);
    deleted = true;
    return "Tank deleted.";
  });
  if (deleted) redirect(`/vessels/${vesselId}`);
  return state;
}

export async function mirrorTankAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  const { vesselId, tankId } = ids(form);
  let createdId = "";
  const state = await runServiceAction(form, async (_raw, actor) => {
    const tank = await mirrorTankAs(actor, vesselId, tankId);
    createdId = tank.id;
    return `Tank ${tank.code} created on the other side.`;
  });
  if (createdId) redirect(`/vessels/${vesselId}/tanks/${createdId}`);
  return state;
}

export async function addMemberAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  const { vesselId, tankId } = ids(form);
  return runServiceAction(form, async (raw, actor) => {
    await addMemberAs(actor, vesselId, tankId, raw);
    revalidatePath(`/vessels/${vesselId}/tanks/${tankId}`);
    return "Added to the member catalogue.";
  });
}

export async function removeMemberAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  const { vesselId, tankId } = ids(form);
  return runServiceAction(form, async (raw, actor) => {
    await removeMemberAs(actor, vesselId, tankId, String(raw.memberId ?? ""));
    revalidatePath(`/vessels/${vesselId}/tanks/${tankId}`);
    return "Removed from the member catalogue.";
  });
}

export async function addSpecialFrameAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  const { vesselId, tankId } = ids(form);
  return runServiceAction(form, async (raw, actor) => {
    await addSpecialFrameAs(actor, vesselId, tankId, raw);
    revalidatePath(`/vessels/${vesselId}/tanks/${tankId}`);
    return "Special frame noted.";
  });
}

export async function removeSpecialFrameAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  const { vesselId, tankId } = ids(form);
  return runServiceAction(form, async (raw, actor) => {
    await removeSpecialFrameAs(actor, vesselId, tankId, String(raw.specialFrameId ?? ""));
    revalidatePath(`/vessels/${vesselId}/tanks/${tankId}`);
    return "Special frame removed.";
  });
}

export async function startInspectionAction(_prev: TActionState, form: FormData): Promise<TActionState> {
  const { vesselId } = ids(form);
  let createdId = "";
  const state = await runServiceAction(form, async (raw, actor) => {
    const inspection = await startInspectionAs(actor, vesselId, raw);
    createdId = inspection.id;
    return "Inspection started.";
  });
  if (createdId) redirect(`/inspections/${createdId}?step=entry`);
  return state;
}
