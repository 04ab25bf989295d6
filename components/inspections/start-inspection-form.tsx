"use client";

import { useMemo } from "react";
import { FormStatus } from "@/components/admin/form-status";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { useCheckedForm } from "@/components/ui/use-checked-form";
import type { TActionState } from "@/lib/http/action-state";
import { ZInspectionStart } from "@/lib/schemas/inspection";
import { PLACE_KIND_LABELS, PLACE_KINDS } from "@/lib/vocabulary";

type TAction = (prev: TActionState, form: FormData) => Promise<TActionState>;

export function StartInspectionForm({ action, vesselId, tanks, tankId, today }: { action: TAction; vesselId: string; tanks: { id: string; code: string; name: string }[]; tankId?: string; today: string }) {
  const f = useCheckedForm(action, ZInspectionStart);
  const id = useMemo(() => crypto.randomUUID(), []);
  return (
    <form action={f.formAction} onSubmit={f.onSubmit} className="space-y-4" noValidate>
      <input type="hidden" name="$vesselId" value={vesselId} />
      {/* Chosen here, so that a double click or a retried request starts one inspection, not two. */}
      <input type="hidden" name="id" value={id} />
      {f.summary ? <Notice tone="error">{f.summary}</Notice> : <FormStatus state={f.state} />}
      <div key={f.remountKey} className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Tank" name="tankId" defaultValue={f.value("tankId", tankId ?? tanks[0]?.id)} error={f.error("tankId")} options={tanks.map((t) => ({ value: t.id, label: `${t.code} — ${t.name}` }))} />
        <TextField label="Date of inspection" name="inspectedOn" type="date" defaultValue={f.value("inspectedOn", today)} error={f.error("inspectedOn")} />
        <SelectField label="Where the ship was" name="placeKind" defaultValue={f.value("placeKind", "port")} error={f.error("placeKind")} options={PLACE_KINDS.map((p) => ({ value: p, label: PLACE_KIND_LABELS[p] }))} />
        <TextField label="Port or position" name="place" defaultValue={f.value("place")} error={f.error("place")} hint='e.g. "Port Demo, berth 4" or "12°34′N 045°12′E"' />
        <TextField label="Inspection team" name="team" defaultValue={f.value("team")} error={f.error("team")} hint="Names separated by commas" />
      </div>
      <Button type="submit" disabled={f.pending}>{f.pending ? "Starting…" : "Start the inspection"}</Button>
    </form>
  );
}
