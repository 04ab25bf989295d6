/** Accepts only a path on this site as a place to return to after sign-in (no open redirect). */
export function safeCallbackPath(value: unknown): string | null {
  if (typeof value !== "string") return null;
  if (!value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return null;
  if (value.startsWith("/sign-in") || value.startsWith("/api/")) return null;
  return value;
}
