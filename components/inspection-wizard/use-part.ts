"use client";

import { useEffect, useRef, useState } from "react";
import type { z } from "zod";
import { useSync } from "./sync";

export type TFieldErrors = Record<string, string>;

/**
 * The local state of one part of the inspection. Every change is kept as a
 * draft at once; when the same zod schema the server uses accepts it, it is
 * queued for saving after a short pause. Until then the errors say what is
 * missing, and nothing is sent.
 */
export function usePart<T>({
  part,
  url,
  method = "PUT",
  initial,
  schema,
  toBody,
  delayMs = 700,
}: {
  part: string;
  url: string;
  method?: "PUT" | "POST" | "DELETE";
  initial: T;
  schema: z.ZodType | null;
  toBody: (value: T) => Record<string, unknown>;
  delayMs?: number;
}) {
  const sync = useSync();
  const [value, setValue] = useState<T>(() => {
    const d = sync.drafts.get(part);
    return d?.dirty ? (d.value as T) : initial;
  });
  const [errors, setErrors] = useState<TFieldErrors>({});
  const timer = useRef<number | undefined>(undefined);
  /** The request waiting for the typing pause, sent at once if the part goes away first. */
  const waitingBody = useRef<Record<string, unknown> | null>(null);
  const reset = sync.resets[part] ?? 0;
  const first = useRef(true);

  useEffect(() => {
    if (first.current) {
      first.current = false;
      return;
    }
    setValue(initial);
    setErrors({});
    // Only when the part is reloaded from the server (after "take theirs").
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [reset]);

  function check(next: T): { ok: boolean; body: Record<string, unknown> } {
    const body = toBody(next);
    if (!schema) return { ok: true, body };
    const r = schema.safeParse(body);
    const errs: TFieldErrors = {};
    if (!r.success) for (const i of r.error.issues) errs[i.path.map(String).join(".")] ??= i.message;
    setErrors(errs);
    return { ok: r.success, body };
  }

  function update(next: T) {
    setValue(next);
    const { ok, body } = check(next);
    sync.drafts.set(part, { value: next, dirty: true, payload: JSON.stringify(body) });
    window.clearTimeout(timer.current);
    if (ok) {
      waitingBody.current = body;
      sync.setWaiting(part, true);
      timer.current = window.setTimeout(flush, delayMs);
    } else {
      waitingBody.current = null;
      sync.setWaiting(part, false);
    }
  }

  function flush() {
    window.clearTimeout(timer.current);
    const body = waitingBody.current;
    waitingBody.current = null;
    sync.setWaiting(part, false);
    if (body) sync.enqueue({ part, url, method, body });
  }

  useEffect(() => {
    // Back after a reload with unsent edits: show their errors, and queue them if they were valid
    // but the tab closed before the pause ran out.
    if (sync.drafts.get(part)?.dirty) {
      const { ok, body } = check(value);
      if (ok && !sync.isQueued(part)) sync.enqueue({ part, url, method, body });
    }
    // Leaving the step (or the page) sends what is waiting instead of dropping it.
    return flush;
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);

  const refused = sync.refused[part];
  const serverErrors: TFieldErrors = {};
  for (const i of refused?.issues ?? []) serverErrors[i.path] ??= i.message;
  return { value, update, errors: { ...serverErrors, ...errors }, refused: refused?.message ?? null, dirty: Boolean(sync.drafts.get(part)?.dirty) };
}
