"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { IDLE_STATE, type TActionState } from "@/lib/http/action-state";
import { VESSEL_TYPE_LABELS, VESSEL_TYPES } from "@/lib/vocabulary";
import { fieldError, fieldValue, FormStatus } from "./form-status";

type TVesselValues = Partial<Record<string, string | number | null>>;
type TAction = (prev: TActionState, form: FormData) => Promise<TActionState>;

const FRAME_FIELDS = [
  ["frameFirst", "First frame (aft)", "Usually 0 at the aft perpendicular"],
  ["frameLast", "Last frame (forward)", undefined],
  ["frameSpacingMm", "Frame spacing (mm)", undefined],
  ["midshipFromFrame", "Midship region from frame", "About 0.4 L amidships"],
  ["midshipToFrame", "Midship region to frame", undefined],
  ["engineRoomFwdBulkheadFrame", "Engine-room forward bulkhead at frame", undefined],
  ["collisionBulkheadFrame", "Collision bulkhead at frame", undefined],
] as const;

export function VesselForm({ action, vessel, vesselId }: { action: TAction; vessel?: TVesselValues; vesselId?: string }) {
  const [state, formAction, pending] = useActionState(action, IDLE_STATE);
  const v = (name: string) => fieldValue(state, name, vessel?.[name]);
  const e = (name: string) => fieldError(state, name);
  // Remount the fields after a refused save so they show what was typed.
  const key = state.status === "error" ? JSON.stringify(state.values) : "stored";
  return (
    <form action={formAction} className="space-y-6" noValidate>
      {vesselId ? <input type="hidden" name="$vesselId" value={vesselId} /> : null}
      <FormStatus state={state} />
      <fieldset key={key} className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-semibold text-hull-900">Identity</legend>
        <TextField label="Name" name="name" required defaultValue={v("name")} error={e("name")} />
        <TextField
          label="IMO number"
          name="imoNumber"
          required
          inputMode="numeric"
          defaultValue={v("imoNumber")}
          error={e("imoNumber")}
          hint="Seven digits; the last is the check digit"
        />
        <SelectField
          label="Type"
          name="vesselType"
          defaultValue={v("vesselType") || "bulk_carrier"}
          error={e("vesselType")}
          options={VESSEL_TYPES.map((t) => ({ value: t, label: VESSEL_TYPE_LABELS[t] }))}
        />
        <TextField label="Flag" name="flag" defaultValue={v("flag")} error={e("flag")} />
        <TextField label="Class society" name="classSociety" defaultValue={v("classSociety")} error={e("classSociety")} />
        <TextField label="Year built" name="yearBuilt" inputMode="numeric" defaultValue={v("yearBuilt")} error={e("yearBuilt")} />
        <TextField
          label="Ship's time offset from UTC (minutes)"
          name="utcOffsetMinutes"
          inputMode="numeric"
          defaultValue={v("utcOffsetMinutes")}
          error={e("utcOffsetMinutes")}
          hint="For example 480 for UTC+08:00, −180 for UTC−03:00"
        />
      </fieldset>
      <fieldset key={`${key}-frames`} className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-semibold text-hull-900">Frames</legend>
        {FRAME_FIELDS.map(([name, label, hint]) => (
          <TextField key={name} label={label} name={name} inputMode="numeric" defaultValue={v(name)} error={e(name)} hint={hint} />
        ))}
      </fieldset>
      <Button type="submit" disabled={pending}>
        {pending ? "Saving…" : vesselId ? "Save vessel" : "Create vessel"}
      </Button>
    </form>
  );
}
