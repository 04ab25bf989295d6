import { Notice } from "@/components/ui/notice";
import type { TActionState } from "@/lib/http/action-state";

export function FormStatus({ state }: { state: TActionState }) {
  if (state.status === "ok") return <Notice tone="success">{state.message}</Notice>;
  if (state.status === "error") return <Notice tone="error">{state.message}</Notice>;
  return null;
}

/** The value to show in a field: what the user typed last if the save was refused, else the stored one. */
export function fieldValue(state: TActionState, name: string, stored?: string | number | null): string {
  if (state.status === "error" && name in state.values) return state.values[name]!;
  return stored === undefined || stored === null ? "" : String(stored);
}

export function fieldError(state: TActionState, name: string): string | undefined {
  return state.status === "error" ? state.fieldErrors[name] : undefined;
}
