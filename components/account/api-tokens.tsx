"use client";

import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { Cell, Table } from "@/components/ui/table";

export type TTokenRow = { id: string; name: string; createdAt: string; lastUsedAt: string | null; revokedAt: string | null };

async function errorMessage(res: Response): Promise<string> {
  const body = (await res.json().catch(() => null)) as { error?: { message?: string } } | null;
  return body?.error?.message ?? `The server answered ${res.status}.`;
}

/** Create, list and revoke one's own API tokens; a new token is shown once. */
export function ApiTokens({ tokens }: { tokens: TTokenRow[] }) {
  const router = useRouter();
  const [created, setCreated] = useState<{ name: string; token: string } | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function create(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    const name = String(new FormData(form).get("name") ?? "");
    setBusy(true);
    setError(null);
    const res = await fetch("/api/v1/me/tokens", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ name }) });
    setBusy(false);
    if (!res.ok) return setError(await errorMessage(res));
    const body = (await res.json()) as { apiToken: { name: string }; token: string };
    setCreated({ name: body.apiToken.name, token: body.token });
    form.reset();
    router.refresh();
  }

  async function revoke(row: TTokenRow) {
    if (!window.confirm(`Revoke the token "${row.name}"? Systems that use it stop working at once.`)) return;
    setError(null);
    const res = await fetch(`/api/v1/me/tokens/${row.id}`, { method: "DELETE" });
    if (!res.ok) return setError(await errorMessage(res));
    router.refresh();
  }

  return (
    <div className="space-y-4">
      {created ? (
        <Notice tone="success" title={`Token "${created.name}" created`}>
          <p>Copy it now: it is shown only this once and cannot be shown again. Send it as <code>Authorization: Bearer …</code>.</p>
          <input
            aria-label="The new API token"
            readOnly
            value={created.token}
            onFocus={(e) => e.currentTarget.select()}
            className="mt-2 block w-full rounded-md border border-slate-300 bg-white px-3 py-2 font-mono text-sm"
          />
        </Notice>
      ) : null}
      {error ? <Notice tone="error">{error}</Notice> : null}
      <form onSubmit={create} className="flex flex-wrap items-end gap-3">
        <div className="min-w-64 flex-1">
          <TextField label="Name" name="name" required maxLength={80} hint="Which system will use it, e.g. Planned maintenance system" />
        </div>
        <Button type="submit" disabled={busy}>Create token</Button>
      </form>
      <Table head={["Name", "Created", "Last used", "State", ""]} caption="Your API tokens">
        {tokens.map((t) => (
          <tr key={t.id}>
            <Cell>{t.name}</Cell>
            <Cell>{t.createdAt}</Cell>
            <Cell>{t.lastUsedAt ?? "never"}</Cell>
            <Cell>{t.revokedAt ? `revoked ${t.revokedAt}` : "active"}</Cell>
            <Cell>{t.revokedAt ? null : <Button variant="danger" onClick={() => revoke(t)}>Revoke</Button>}</Cell>
          </tr>
        ))}
      </Table>
      {tokens.length === 0 ? <p className="text-sm text-slate-600">No tokens yet.</p> : null}
    </div>
  );
}
