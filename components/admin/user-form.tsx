"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { IDLE_STATE, type TActionState } from "@/lib/http/action-state";
import { ROLE_LABELS, ROLES } from "@/lib/vocabulary";
import { fieldError, fieldValue, FormStatus } from "./form-status";

type TAction = (prev: TActionState, form: FormData) => Promise<TActionState>;
type TVesselOption = { id: string; name: string };

export function RoleFields({ state, vessels, compact = false }: { state: TActionState; vessels: TVesselOption[]; compact?: boolean }) {
  return (
    <>
      <SelectField
        label="Role"
        name="role"
        defaultValue={fieldValue(state, "role") || "officer"}
        error={fieldError(state, "role")}
        options={ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))}
      />
      <SelectField
        label="Vessel"
        name="vesselId"
        defaultValue={fieldValue(state, "vesselId")}
        error={fieldError(state, "vesselId")}
        hint={compact ? undefined : "For officer and master only; the other roles apply company-wide"}
        options={[{ value: "", label: "— company-wide —" }, ...vessels.map((v) => ({ value: v.id, label: v.name }))]}
      />
    </>
  );
}

export function UserForm({ action, vessels }: { action: TAction; vessels: TVesselOption[] }) {
  const [state, formAction, pending] = useActionState(action, IDLE_STATE);
  const key = state.status === "error" ? JSON.stringify(state.values) : state.status;
  return (
    <form action={formAction} className="space-y-4" noValidate>
      <FormStatus state={state} />
      <div key={key} className="grid gap-4 sm:grid-cols-2">
        <TextField label="E-mail" name="email" type="email" required defaultValue={fieldValue(state, "email")} error={fieldError(state, "email")} />
        <TextField label="Name" name="name" required defaultValue={fieldValue(state, "name")} error={fieldError(state, "name")} />
        <TextField label="Rank or position" name="rank" defaultValue={fieldValue(state, "rank")} error={fieldError(state, "rank")} />
        <TextField
          label="Initial password"
          name="password"
          type="password"
          autoComplete="new-password"
          required
          error={fieldError(state, "password")}
          hint="At least 12 characters; tell it to the user in person"
        />
        <RoleFields state={state} vessels={vessels} />
      </div>
      <Button type="submit" disabled={pending}>
        {pending ? "Creating…" : "Create user"}
      </Button>
    </form>
  );
}
