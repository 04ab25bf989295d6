// Calls to the signing routes from the browser; a refusal comes back with its message and fields.
export type TApiIssue = { path: string; message: string };
export type TApiResult<T> = { ok: true; body: T } | { ok: false; status: number; message: string; issues: TApiIssue[] };

export async function postJson<T>(url: string, body?: unknown): Promise<TApiResult<T>> {
  try {
    const res = await fetch(url, { method: "POST", headers: body === undefined ? {} : { "content-type": "application/json" }, body: body === undefined ? undefined : JSON.stringify(body) });
    const json = (await res.json().catch(() => ({}))) as T & { error?: { message: string; issues: TApiIssue[] } };
    if (res.ok) return { ok: true, body: json };
    return { ok: false, status: res.status, message: json.error?.message ?? `The server answered ${res.status}.`, issues: json.error?.issues ?? [] };
  } catch {
    return { ok: false, status: 0, message: "No connection to the server: nothing was signed. Try again when the connection is back.", issues: [] };
  }
}

/** The inspection as the server has it now: its version and what still blocks signing. */
export async function freshInspection(id: string) {
  const res = await fetch(`/api/v1/inspections/${id}`, { cache: "no-store" });
  if (!res.ok) return null;
  return (await res.json()) as { inspection: { version: number; status: string }; blockers: { message: string }[] };
}
