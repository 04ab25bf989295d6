"use client";

import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { useCheckedForm } from "@/components/ui/use-checked-form";
import type { TActionState } from "@/lib/http/action-state";
import { ZVesselInput } from "@/lib/schemas/vessel";
import { VESSEL_TYPE_LABELS, VESSEL_TYPES } from "@/lib/vocabulary";
import { FormStatus } from "./form-status";

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
  const f = useCheckedForm(action, ZVesselInput);
  const v = (name: string) => f.value(name, vessel?.[name]);
  const e = f.error;
  const key = f.remountKey;
  return (
    <form action={f.formAction} onSubmit={f.onSubmit} className="space-y-6" noValidate>
      {vesselId ? <input type="hidden" name="$vesselId" value={vesselId} /> : null}
      {f.summary ? <Notice tone="error">{f.summary}</Notice> : <FormStatus state={f.state} />}
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
      <Button type="submit" disabled={f.pending}>
        {f.pending ? "Saving…" : vesselId ? "Save vessel" : "Create vessel"}
      </Button>
    </form>
  );
}
