"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { IDLE_STATE, type TActionState } from "@/lib/http/action-state";
import { Notice } from "@/components/ui/notice";
import { useCheckedForm } from "@/components/ui/use-checked-form";
import { ZMembershipInput } from "@/lib/schemas/user";
import { FormStatus } from "./form-status";
import { RoleFields } from "./user-form";

type TAction = (prev: TActionState, form: FormData) => Promise<TActionState>;

export function GrantRoleForm({ action, userId, vessels }: { action: TAction; userId: string; vessels: { id: string; name: string }[] }) {
  const f = useCheckedForm(action, ZMembershipInput);
  return (
    <form action={f.formAction} onSubmit={f.onSubmit} className="space-y-2" noValidate>
      {f.summary ? <Notice tone="error">{f.summary}</Notice> : <FormStatus state={f.state} />}
      <input type="hidden" name="userId" value={userId} />
      <div key={f.remountKey} className="grid gap-2 sm:grid-cols-[1fr_1fr_auto] sm:items-end">
        <RoleFields f={f} vessels={vessels} compact />
        <Button type="submit" variant="secondary" disabled={f.pending}>
          Grant role
        </Button>
      </div>
    </form>
  );
}

export function RevokeRoleButton({ action, membershipId, label }: { action: TAction; membershipId: string; label: string }) {
  const [state, formAction, pending] = useActionState(action, IDLE_STATE);
  return (
    <form action={formAction} onSubmit={(e) => { if (!window.confirm(`Remove ${label}?`)) e.preventDefault(); }} className="inline">
      <input type="hidden" name="membershipId" value={membershipId} />
      <button type="submit" disabled={pending} aria-label={`Remove ${label}`} className="ml-1 text-xs text-red-700 hover:underline">
        remove
      </button>
      {state.status === "error" ? <span className="ml-1 text-xs text-red-700">{state.message}</span> : null}
    </form>
  );
}
