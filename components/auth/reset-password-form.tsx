"use client";

import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ZPasswordResetConfirm } from "@/lib/schemas/password-reset";

export function ResetPasswordForm({ token, email }: { token: string; email: string }) {
  const [password, setPassword] = useState("");
  const [passwordAgain, setPasswordAgain] = useState("");
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setError(null);
    const checked = ZPasswordResetConfirm.safeParse({ token, password, passwordAgain });
    const errors: Record<string, string> = {};
    if (!checked.success) for (const i of checked.error.issues) errors[i.path.map(String).join(".")] ??= i.message;
    setFieldErrors(errors);
    if (!checked.success) return;
    setBusy(true);
    try {
      const res = await fetch("/api/v1/password-reset/confirm", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(checked.data),
      });
      const body = (await res.json()) as { message?: string; error?: { message: string } };
      if (res.ok) setDone(body.message ?? "");
      else {
        setError(body.error?.message ?? "The new password was not saved.");
        setPassword("");
        setPasswordAgain("");
      }
    } catch {
      setError("The server could not be reached. Check the connection and try again.");
    } finally {
      setBusy(false);
    }
  }

  if (done) {
    return (
      <div className="space-y-4">
        <Notice tone="success">{done}</Notice>
        <Link href="/sign-in" className="block text-center text-sm font-semibold text-hull-700 underline">
          Go to sign-in
        </Link>
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      <TextField
        label="New password"
        name="password"
        type="password"
        autoComplete="new-password"
        required
        hint="At least 12 characters. A few unrelated words make a long password that is easy to type."
        value={password}
        error={fieldErrors.password}
        onChange={(e) => setPassword(e.target.value)}
      />
      <TextField
        label="New password again"
        name="passwordAgain"
        type="password"
        autoComplete="new-password"
        required
        value={passwordAgain}
        error={fieldErrors.passwordAgain}
        onChange={(e) => setPasswordAgain(e.target.value)}
      />
      <Button type="submit" disabled={busy} className="w-full">
        {busy ? "Saving…" : "Set the new password"}
      </Button>
    </form>
  );
}
