"use client";

import { useEffect, useMemo, useState } from "react";
import { FormStatus } from "@/components/admin/form-status";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { useCheckedForm } from "@/components/ui/use-checked-form";
import type { TActionState } from "@/lib/http/action-state";
import { memberInputSchema, specialFrameInputSchema } from "@/lib/schemas/tank";
import { PLATING_REGION_LABELS, PLATING_REGIONS } from "@/lib/vocabulary";

type TAction = (prev: TActionState, form: FormData) => Promise<TActionState>;
type TTank = { id: string; vesselId: string; code: string; frameFrom: number; frameTo: number };

const KINDS = [
  { value: "longitudinal", label: "Longitudinals of a plating region" },
  { value: "stringer_deck", label: "Stringer decks" },
  { value: "bottom_girder", label: "Bottom girders" },
  { value: "web_frame", label: "Web frames" },
];

export function AddMemberForm({ action, tank }: { action: TAction; tank: TTank }) {
  const schema = useMemo(() => memberInputSchema(tank), [tank]);
  const f = useCheckedForm(action, schema);
  const [kind, setKind] = useState("longitudinal");
  // React resets the fields when an action returns: a refusal brings back what was typed, a success starts afresh.
  useEffect(() => setKind(f.state.status === "error" ? (f.state.values.kind ?? "longitudinal") : "longitudinal"), [f.state]);
  return (
    <form action={f.formAction} onSubmit={f.onSubmit} className="space-y-3" noValidate aria-label="Add to the member catalogue">
      <input type="hidden" name="$vesselId" value={tank.vesselId} />
      <input type="hidden" name="$tankId" value={tank.id} />
      {f.summary ? <Notice tone="error">{f.summary}</Notice> : <FormStatus state={f.state} />}
      <div key={f.remountKey} className="grid gap-3 sm:grid-cols-3">
        <SelectField label="Member" name="kind" defaultValue={f.value("kind") || "longitudinal"} onChange={(e) => setKind(e.target.value)} options={KINDS} error={f.error("kind")} />
        {kind === "longitudinal" ? (
          <SelectField label="Plating region" name="platingRegion" defaultValue={f.value("platingRegion")} error={f.error("platingRegion")} options={[{ value: "", label: "— choose —" }, ...PLATING_REGIONS.map((r) => ({ value: r, label: PLATING_REGION_LABELS[r] }))]} />
        ) : null}
        {kind !== "web_frame" ? (
          <>
            <TextField label={kind === "longitudinal" ? "First number" : "From number"} name="numberFrom" inputMode="numeric" error={f.error("numberFrom")} defaultValue={f.value("numberFrom") || (kind === "longitudinal" ? "" : "1")} />
            <TextField label={kind === "longitudinal" ? "Last number" : "To number"} name="numberTo" inputMode="numeric" error={f.error("numberTo")} defaultValue={f.value("numberTo")} />
          </>
        ) : (
          <TextField label="At frames" name="frames" error={f.error("frames")} defaultValue={f.value("frames")} hint="e.g. 104, 108, 112 or 104-120/4" />
        )}
        {kind === "stringer_deck" ? (
          <SelectField label="Numbered" name="numbering" defaultValue={f.value("numbering") || "from_top"} error={f.error("numbering")} options={[{ value: "from_top", label: "from the top" }, { value: "from_bottom", label: "from the bottom" }]} />
        ) : null}
        {kind === "bottom_girder" ? (
          <SelectField label="Centre girder in this tank" name="hasCentreGirder" defaultValue={f.value("hasCentreGirder") || "false"} options={[{ value: "false", label: "No" }, { value: "true", label: "Yes (number 0)" }]} />
        ) : null}
        <TextField label="Label (optional)" name="label" error={f.error("label")} defaultValue={f.value("label")} />
      </div>
      <Button type="submit" variant="secondary" disabled={f.pending}>Add to catalogue</Button>
    </form>
  );
}

export function AddSpecialFrameForm({ action, tank }: { action: TAction; tank: TTank }) {
  const schema = useMemo(() => specialFrameInputSchema(tank), [tank]);
  const f = useCheckedForm(action, schema);
  return (
    <form action={f.formAction} onSubmit={f.onSubmit} className="space-y-3" noValidate aria-label="Add a special frame">
      <input type="hidden" name="$vesselId" value={tank.vesselId} />
      <input type="hidden" name="$tankId" value={tank.id} />
      {f.summary ? <Notice tone="error">{f.summary}</Notice> : <FormStatus state={f.state} />}
      <div key={f.remountKey} className="grid gap-3 sm:grid-cols-[8rem_1fr]">
        <TextField label="Frame" name="frame" inputMode="numeric" error={f.error("frame")} defaultValue={f.value("frame")} />
        <TextField label="What differs here" name="note" error={f.error("note")} defaultValue={f.value("note")} hint="A landmark to find one's way, e.g. deep floor with blanked lightening holes" />
      </div>
      <Button type="submit" variant="secondary" disabled={f.pending}>Add special frame</Button>
    </form>
  );
}
