import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { getActor } from "@/lib/auth/actor";
import { homePath } from "@/lib/auth/roles";
import { SIGN_IN_REFUSED } from "@/lib/auth/sign-in";
import { safeCallbackPath } from "@/lib/http/paths";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const actor = await getActor();
  if (actor) redirect(homePath(actor.memberships));
  const callbackUrl = safeCallbackPath(params.callbackUrl) ?? "/";
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-4 py-12">
      <div className="rounded-xl border border-slate-200 bg-white p-8 shadow-sm">
        <p className="text-sm font-semibold uppercase tracking-widest text-hull-600">Tankwright</p>
        <h1 className="mb-1 mt-2 text-2xl font-bold text-hull-900">Sign in</h1>
        <p className="mb-6 text-sm text-slate-600">Ballast tank inspections for the ship, the master, the office and class.</p>
        <SignInForm callbackUrl={callbackUrl} refused={SIGN_IN_REFUSED} />
        <p className="mt-6 text-center text-sm">
          <Link href="/forgot-password" className="text-hull-700 underline">Forgot your password?</Link>
        </p>
      </div>
    </main>
  );
}
