"use client";

import { useActionState, useState, type FormEvent } from "react";
import type { z } from "zod";
import { IDLE_STATE, type TActionState } from "@/lib/http/action-state";

type TAction = (prev: TActionState, form: FormData) => Promise<TActionState>;

/**
 * A server-action form that first checks its fields in the browser with the
 * same zod schema the server uses: refusals show at once, without a round trip;
 * the server still decides.
 */
export function useCheckedForm(action: TAction, schema: z.ZodType | null) {
  const [state, formAction, pending] = useActionState(action, IDLE_STATE);
  const [clientErrors, setClientErrors] = useState<Record<string, string> | null>(null);

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    if (!schema) return;
    const raw = Object.fromEntries([...new FormData(event.currentTarget).entries()].filter(([k]) => !k.startsWith("$")));
    const result = schema.safeParse(raw);
    if (result.success) {
      setClientErrors(null);
      return;
    }
    event.preventDefault();
    const errors: Record<string, string> = {};
    for (const issue of result.error.issues) errors[issue.path.map(String).join(".")] ??= issue.message;
    setClientErrors(errors);
  }

  const serverErrors = state.status === "error" ? state.fieldErrors : {};
  const errors = clientErrors ?? serverErrors;
  return {
    state,
    formAction,
    pending,
    onSubmit,
    error: (name: string) => errors[name],
    /** The value to show: what was typed before a refused save, else the stored one. */
    value: (name: string, stored?: string | number | null) =>
      state.status === "error" && name in state.values ? state.values[name]! : stored === undefined || stored === null ? "" : String(stored),
    summary: clientErrors ? "Some fields need attention; nothing was sent." : null,
    remountKey: state.status === "error" ? JSON.stringify(state.values) : "stored",
  };
}
