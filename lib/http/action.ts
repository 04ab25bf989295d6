import "server-only";
import { z } from "zod";
import { requireActor, type TActor } from "@/lib/auth/actor";
import { AppError, issuesFromZod } from "@/lib/errors";
import { toAppError } from "./route";

import type { TActionState } from "./action-state";

export type { TActionState };

const SECRET_FIELDS = new Set(["password"]);

function formValues(form: FormData): Record<string, string> {
  const values: Record<string, string> = {};
  for (const [key, value] of form.entries()) {
    if (typeof value === "string" && !key.startsWith("$") && !SECRET_FIELDS.has(key)) values[key] = value;
  }
  return values;
}

/**
 * Runs a server action: a public endpoint, so it signs in the actor, validates
 * the form with the same zod schema as the API, and lets `fn` authorize.
 */
export async function runFormAction<S extends z.ZodType>(
  form: FormData,
  schema: S,
  fn: (input: z.infer<S>, actor: TActor) => Promise<string>,
): Promise<TActionState> {
  const values = formValues(form);
  try {
    const actor = await requireActor();
    const raw = Object.fromEntries([...form.entries()].filter(([k]) => !k.startsWith("$")));
    const parsed = schema.safeParse(raw);
    if (!parsed.success) {
      const issues = issuesFromZod(parsed.error.issues);
      throw new AppError("bad_request", "Some fields need attention; nothing was saved.", issues);
    }
    return { status: "ok", message: await fn(parsed.data, actor) };
  } catch (error) {
    const e = toAppError(error);
    const fieldErrors: Record<string, string> = {};
    for (const i of e.issues) fieldErrors[i.path] ??= i.message;
    return { status: "error", message: e.message, fieldErrors, values };
  }
}

/** Like runFormAction, for services that authorize first and then validate the raw form themselves. */
export async function runServiceAction(
  form: FormData,
  fn: (raw: Record<string, FormDataEntryValue>, actor: TActor) => Promise<string>,
): Promise<TActionState> {
  return runFormAction(form, z.record(z.string(), z.any()), (raw, actor) => fn(raw as Record<string, FormDataEntryValue>, actor));
}
