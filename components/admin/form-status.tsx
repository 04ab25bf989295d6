import { Notice } from "@/components/ui/notice";
import type { TActionState } from "@/lib/http/action-state";

export function FormStatus({ state }: { state: TActionState }) {
  if (state.status === "ok") return <Notice tone="success">{state.message}</Notice>;
  if (state.status === "error") return <Notice tone="error">{state.message}</Notice>;
  return null;
}
