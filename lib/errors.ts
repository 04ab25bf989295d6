// One typed error for the whole server. Each code maps to an HTTP status and a
// message that is safe to show; internals are logged, never returned.

export const ERROR_STATUS = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  unprocessable: 422,
  too_many_requests: 429,
  internal: 500,
} as const;
export type TErrorCode = keyof typeof ERROR_STATUS;

export type TIssue = { path: string; message: string };

const DEFAULT_MESSAGES: Record<TErrorCode, string> = {
  bad_request: "The request is not valid.",
  unauthenticated: "Sign in to continue.",
  forbidden: "Your role does not allow this.",
  not_found: "Not found.",
  conflict: "Someone else changed this in the meantime.",
  payload_too_large: "The request is too large.",
  unsupported_media_type: "This type of content is not accepted.",
  unprocessable: "The entry cannot be accepted as it is.",
  too_many_requests: "Too many attempts; wait a moment and try again.",
  internal: "Something went wrong on our side. Nothing was changed.",
};

export class AppError extends Error {
  readonly code: TErrorCode;
  readonly issues: TIssue[];
  constructor(code: TErrorCode, message?: string, issues: TIssue[] = []) {
    super(message ?? DEFAULT_MESSAGES[code]);
    this.name = "AppError";
    this.code = code;
    this.issues = issues;
  }
  get status(): number {
    return ERROR_STATUS[this.code];
  }
}

export const notFound = (what = "Not found.") => new AppError("not_found", what);
export const forbidden = (why?: string) => new AppError("forbidden", why);

export type TErrorBody = { error: { code: TErrorCode; message: string; issues: TIssue[] } };

export function errorBody(error: AppError): TErrorBody {
  return { error: { code: error.code, message: error.message, issues: error.issues } };
}

/** Turns zod issues into the `issues` list of an error body, with dotted paths. */
export function issuesFromZod(issues: readonly { path: readonly PropertyKey[]; message: string }[]): TIssue[] {
  return issues.map((i) => ({ path: i.path.map(String).join(".") || "(body)", message: i.message }));
}

/** The PostgreSQL error code behind a driver or ORM error, if there is one. */
export function databaseErrorCode(error: unknown): string | undefined {
  const e = (error as { cause?: unknown } | null)?.cause ?? error;
  const code = (e as { code?: unknown } | null)?.code;
  return typeof code === "string" ? code : undefined;
}
