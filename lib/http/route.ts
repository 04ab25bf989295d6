import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { AppError, databaseErrorCode, errorBody, issuesFromZod } from "@/lib/errors";
import type { TErrorBodyResponse } from "@/lib/schemas/responses";

type TParams = Record<string, string | string[]>;
type THandler<P extends TParams> = (req: Request, params: P) => Promise<Response | unknown>;

/** Postgres error codes that we turn into user-facing errors instead of 500s. */
function fromDatabaseError(error: unknown): AppError | null {
  const code = databaseErrorCode(error);
  if (code === "23505") return new AppError("conflict", "A record with the same identifying value already exists.");
  if (code === "23503") return new AppError("unprocessable", "The entry refers to a record that does not exist.");
  if (code === "22P02") return new AppError("bad_request", "A value has the wrong format.");
  return null;
}

export function toAppError(error: unknown): AppError {
  if (error instanceof AppError) return error;
  const fromDb = fromDatabaseError(error);
  if (fromDb) return fromDb;
  console.error("[tankwright] unexpected error", error);
  return new AppError("internal");
}

export function errorResponse(error: unknown): Response {
  const appError = toAppError(error);
  return NextResponse.json(errorBody(appError) satisfies TErrorBodyResponse, { status: appError.status });
}

/**
 * Wraps a route handler: resolves the params, turns thrown AppErrors into the
 * JSON error body and status, and returns plain values as JSON. The handler
 * itself must call lib/auth/authorize.ts before touching any record.
 */
export function route<P extends TParams = Record<string, never>>(handler: THandler<P>) {
  return async (req: Request, ctx: { params: Promise<P> }): Promise<Response> => {
    try {
      const result = await handler(req, await ctx.params);
      if (result instanceof Response) return result;
      return NextResponse.json(result ?? { ok: true });
    } catch (error) {
      return errorResponse(error);
    }
  };
}

const MAX_JSON_BYTES = 1024 * 1024;

/** Reads a JSON body without judging its shape (the service validates after it authorizes). */
export async function readJsonValue(req: Request): Promise<unknown> {
  const length = Number(req.headers.get("content-length") ?? 0);
  if (length > MAX_JSON_BYTES) throw new AppError("payload_too_large", "The request body is larger than 1 MB.");
  const text = await req.text();
  if (text.length > MAX_JSON_BYTES) throw new AppError("payload_too_large", "The request body is larger than 1 MB.");
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The request body is not valid JSON.");
  }
}

/** Checks a value against a schema: wrong types give 400 naming each field. */
export function validateInput<S extends z.ZodType>(schema: S, value: unknown): z.infer<S> {
  const parsed = schema.safeParse(value);
  if (!parsed.success) {
    const issues = issuesFromZod(parsed.error.issues);
    throw new AppError("bad_request", `Check ${issues.map((i) => i.path).join(", ")}: ${issues[0]?.message ?? ""}`, issues);
  }
  return parsed.data;
}

/** Reads and validates a JSON body: malformed JSON and wrong types give 400 naming the field. */
export async function readJson<S extends z.ZodType>(req: Request, schema: S): Promise<z.infer<S>> {
  return validateInput(schema, await readJsonValue(req));
}

export function created(body: unknown) {
  return NextResponse.json(body, { status: 201 });
}
