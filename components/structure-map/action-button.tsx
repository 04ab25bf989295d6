"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { IDLE_STATE, type TActionState } from "@/lib/http/action-state";

type TAction = (prev: TActionState, form: FormData) => Promise<TActionState>;

/** One button that runs a server action with hidden fields, and shows the refusal if any. */
export function ActionButton({
  action,
  fields,
  label,
  variant = "secondary",
  confirm,
}: {
  action: TAction;
  fields: Record<string, string>;
  label: string;
  variant?: "primary" | "secondary" | "danger";
  confirm?: string;
}) {
  const [state, formAction, pending] = useActionState(action, IDLE_STATE);
  return (
    <form
      action={formAction}
      onSubmit={(e) => {
        if (confirm && !window.confirm(confirm)) e.preventDefault();
      }}
      className="inline-flex flex-col gap-1"
    >
      {Object.entries(fields).map(([k, v]) => (
        <input key={k} type="hidden" name={k} value={v} />
      ))}
      <Button type="submit" variant={variant} disabled={pending}>{label}</Button>
      {state.status === "error" ? <span role="alert" className="max-w-xs text-sm text-red-700">{state.message}</span> : null}
    </form>
  );
}
