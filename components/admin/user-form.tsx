"use client";

import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { useCheckedForm } from "@/components/ui/use-checked-form";
import type { TActionState } from "@/lib/http/action-state";
import { ZUserInput } from "@/lib/schemas/user";
import { ROLE_LABELS, ROLES } from "@/lib/vocabulary";
import { FormStatus } from "./form-status";

type TAction = (prev: TActionState, form: FormData) => Promise<TActionState>;
type TVesselOption = { id: string; name: string };

type TFieldAccess = { value: (name: string) => string; error: (name: string) => string | undefined };

export function RoleFields({ f, vessels, compact = false }: { f: TFieldAccess; vessels: TVesselOption[]; compact?: boolean }) {
  return (
    <>
      <SelectField
        label="Role"
        name="role"
        defaultValue={f.value("role") || "officer"}
        error={f.error("role")}
        options={ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))}
      />
      <SelectField
        label="Vessel"
        name="vesselId"
        defaultValue={f.value("vesselId")}
        error={f.error("vesselId")}
        hint={compact ? undefined : "For officer and master only; the other roles apply company-wide"}
        options={[{ value: "", label: "— company-wide —" }, ...vessels.map((v) => ({ value: v.id, label: v.name }))]}
      />
    </>
  );
}

export function UserForm({ action, vessels }: { action: TAction; vessels: TVesselOption[] }) {
  const f = useCheckedForm(action, ZUserInput);
  return (
    <form action={f.formAction} onSubmit={f.onSubmit} className="space-y-4" noValidate>
      {f.summary ? <Notice tone="error">{f.summary}</Notice> : <FormStatus state={f.state} />}
      <div key={f.remountKey} className="grid gap-4 sm:grid-cols-2">
        <TextField label="E-mail" name="email" type="email" required defaultValue={f.value("email")} error={f.error("email")} />
        <TextField label="Name" name="name" required defaultValue={f.value("name")} error={f.error("name")} />
        <TextField label="Rank or position" name="rank" defaultValue={f.value("rank")} error={f.error("rank")} />
        <TextField
          label="Initial password"
          name="password"
          type="password"
          autoComplete="new-password"
          required
          error={f.error("password")}
          hint="At least 12 characters; tell it to the user in person"
        />
        <RoleFields f={f} vessels={vessels} />
      </div>
      <Button type="submit" disabled={f.pending}>
        {f.pending ? "Creating…" : "Create user"}
      </Button>
    </form>
  );
}
