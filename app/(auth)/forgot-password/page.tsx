import type { Metadata } from "next";
import Link from "next/link";
import { ForgotPasswordForm } from "@/components/auth/forgot-password-form";

export const metadata: Metadata = { title: "Forgot your password?" };

/** Public: asks for the address and always answers the same, so it reveals no accounts. */
export default function ForgotPasswordPage() {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-4 py-12">
      <div className="rounded-xl border border-slate-200 bg-white p-8 shadow-sm">
        <p className="text-sm font-semibold uppercase tracking-widest text-hull-600">Tankwright</p>
        <h1 className="mb-1 mt-2 text-2xl font-bold text-hull-900">Forgot your password?</h1>
        <p className="mb-6 text-sm text-slate-600">
          Enter the e-mail address you sign in with. If it belongs to an account, we send a link to choose a new password; the link works once, for one hour.
        </p>
        <ForgotPasswordForm />
        <p className="mt-6 text-center text-sm">
          <Link href="/sign-in" className="text-hull-700 underline">Back to sign-in</Link>
        </p>
      </div>
    </main>
  );
}
