"use client";

import { useMemo } from "react";
import { FormStatus } from "@/components/admin/form-status";
import { Button } from "@/components/ui/button";
import { CheckboxField } from "@/components/ui/checkbox-field";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { useCheckedForm } from "@/components/ui/use-checked-form";
import type { TActionState } from "@/lib/http/action-state";
import { tankInputSchema } from "@/lib/schemas/tank";
import { TANK_KIND_LABELS, TANK_KINDS, TANK_SIDE_LABELS, TANK_SIDES } from "@/lib/vocabulary";

type TAction = (prev: TActionState, form: FormData) => Promise<TActionState>;
type TTankValues = Partial<Record<string, string | number | boolean | null>>;

const COATING_OPTIONS = [
  { value: "hard", label: "Hard coating" },
  { value: "semi_hard", label: "Semi-hard coating" },
  { value: "soft", label: "Soft coating" },
  { value: "none", label: "No coating" },
];

export function TankForm({
  action,
  vessel,
  tank,
  tankId,
}: {
  action: TAction;
  vessel: { id: string; frameFirst: number; frameLast: number };
  tank?: TTankValues;
  tankId?: string;
}) {
  const schema = useMemo(() => tankInputSchema(vessel), [vessel]);
  const f = useCheckedForm(action, schema);
  const stored = (name: string) => {
    const v = tank?.[name];
    return typeof v === "boolean" ? undefined : v;
  };
  const checked = (name: string) =>
    f.state.status === "error" ? f.state.values[name] === "on" : Boolean(tank?.[name]);
  return (
    <form action={f.formAction} onSubmit={f.onSubmit} className="space-y-6" noValidate>
      <input type="hidden" name="$vesselId" value={vessel.id} />
      {tankId ? <input type="hidden" name="$tankId" value={tankId} /> : null}
      {f.summary ? <Notice tone="error">{f.summary}</Notice> : <FormStatus state={f.state} />}
      <div key={f.remountKey} className="grid gap-4 sm:grid-cols-2">
        <TextField label="Code" name="code" required defaultValue={f.value("code", stored("code") as string)} error={f.error("code")} hint='As marked on the tank, e.g. "No. 3 WBT P"' />
        <TextField label="Name" name="name" required defaultValue={f.value("name", stored("name") as string)} error={f.error("name")} />
        <SelectField label="Side" name="side" defaultValue={f.value("side", stored("side") as string) || "port"} error={f.error("side")} options={TANK_SIDES.map((s) => ({ value: s, label: TANK_SIDE_LABELS[s] }))} />
        <SelectField label="Kind" name="kind" defaultValue={f.value("kind", stored("kind") as string) || "double_bottom"} error={f.error("kind")} options={TANK_KINDS.map((k) => ({ value: k, label: TANK_KIND_LABELS[k] }))} />
        <TextField label="Aft frame" name="frameFrom" inputMode="numeric" required defaultValue={f.value("frameFrom", stored("frameFrom") as number)} error={f.error("frameFrom")} hint={`Vessel frames ${vessel.frameFirst}–${vessel.frameLast}`} />
        <TextField label="Forward frame" name="frameTo" inputMode="numeric" required defaultValue={f.value("frameTo", stored("frameTo") as number)} error={f.error("frameTo")} />
        <TextField label="Bottom area (m²)" name="bottomAreaM2" inputMode="decimal" defaultValue={f.value("bottomAreaM2", stored("bottomAreaM2") as number)} error={f.error("bottomAreaM2")} hint="For sediment volumes" />
        <SelectField label="Coating system" name="coatingSystem" defaultValue={f.value("coatingSystem", stored("coatingSystem") as string) || "hard"} error={f.error("coatingSystem")} options={COATING_OPTIONS} />
        <TextField label="Boundary with a heated tank" name="heatedBoundary" defaultValue={f.value("heatedBoundary", stored("heatedBoundary") as string)} error={f.error("heatedBoundary")} hint='Which boundary, e.g. "aft bulkhead to No. 4 HFO tank"; empty if none' />
        <TextField label="Note" name="note" defaultValue={f.value("note", stored("note") as string)} error={f.error("note")} />
        <CheckboxField label="At the waterline" name="atWaterline" defaultChecked={checked("atWaterline")} hint="Side shell in way of the waterline (contact damage)" />
        <CheckboxField label="At or forward of the collision bulkhead" name="atCollisionBulkhead" defaultChecked={checked("atCollisionBulkhead")} />
      </div>
      <Button type="submit" disabled={f.pending}>
        {f.pending ? "Saving…" : tankId ? "Save tank" : "Create tank"}
      </Button>
    </form>
  );
}
