"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ZPasswordResetRequest } from "@/lib/schemas/password-reset";

export function ForgotPasswordForm() {
  const [email, setEmail] = useState("");
  const [fieldError, setFieldError] = useState<string | undefined>();
  const [error, setError] = useState<string | null>(null);
  const [sent, setSent] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setError(null);
    const checked = ZPasswordResetRequest.safeParse({ email });
    if (!checked.success) {
      setFieldError(checked.error.issues[0]?.message);
      return;
    }
    setFieldError(undefined);
    setBusy(true);
    try {
      const res = await fetch("/api/v1/password-reset", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(checked.data),
      });
      const body = (await res.json()) as { message?: string; error?: { message: string } };
      if (!res.ok) setError(body.error?.message ?? "The request was refused.");
      else setSent(body.message ?? "");
    } catch {
      setError("The server could not be reached. Check the connection and try again.");
    } finally {
      setBusy(false);
    }
  }

  if (sent) return <Notice tone="success">{sent}</Notice>;
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <TextField
        label="E-mail"
        name="email"
        type="email"
        autoComplete="username"
        required
        value={email}
        error={fieldError}
        onChange={(e) => setEmail(e.target.value)}
      />
      <Button type="submit" disabled={busy} className="w-full">
        {busy ? "Sending…" : "Send me a link"}
      </Button>
    </form>
  );
}
