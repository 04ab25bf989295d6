"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { IDLE_STATE, type TActionState } from "@/lib/http/action-state";
import { FormStatus } from "./form-status";
import { RoleFields } from "./user-form";

type TAction = (prev: TActionState, form: FormData) => Promise<TActionState>;

export function GrantRoleForm({ action, userId, vessels }: { action: TAction; userId: string; vessels: { id: string; name: string }[] }) {
  const [state, formAction, pending] = useActionState(action, IDLE_STATE);
  return (
    <form action={formAction} className="space-y-2" noValidate>
      <FormStatus state={state} />
      <input type="hidden" name="userId" value={userId} />
      <div key={state.status === "error" ? JSON.stringify(state.values) : state.status} className="grid gap-2 sm:grid-cols-[1fr_1fr_auto] sm:items-end">
        <RoleFields state={state} vessels={vessels} compact />
        <Button type="submit" variant="secondary" disabled={pending}>
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
