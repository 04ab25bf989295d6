import type { Metadata } from "next";
import Link from "next/link";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { Notice } from "@/components/ui/notice";
import { checkResetToken } from "@/lib/services/password-reset";

export const metadata: Metadata = { title: "Choose a password" };

/** Public: opened from the e-mailed link. The token itself is the permission; the page only looks, it uses nothing. */
export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { token } = await searchParams;
  const check = await checkResetToken(token);
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-4 py-12">
      <div className="rounded-xl border border-slate-200 bg-white p-8 shadow-sm">
        <p className="text-sm font-semibold uppercase tracking-widest text-hull-600">Tankwright</p>
        <h1 className="mb-1 mt-2 text-2xl font-bold text-hull-900">{check.firstPassword ? "Choose your password" : "Choose a new password"}</h1>
        {check.state === "valid" && typeof token === "string" ? (
          <>
            <p className="mb-6 text-sm text-slate-600">
              For {check.email}. {check.firstPassword ? "Your account is ready: type the password you want to sign in with, twice." : "Type the new password twice."}
            </p>
            <ResetPasswordForm token={token} email={check.email ?? ""} />
          </>
        ) : (
          <div className="mt-4 space-y-4">
            <Notice tone="error">{check.message}</Notice>
            <p className="text-center text-sm">
              <Link href="/forgot-password" className="font-semibold text-hull-700 underline">Ask for a new link</Link>
            </p>
          </div>
        )}
      </div>
    </main>
  );
}
