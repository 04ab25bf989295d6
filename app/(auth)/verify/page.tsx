import type { Metadata } from "next";
import { VerifyForm } from "@/components/signing/verify-form";

export const metadata: Metadata = { title: "Check a signed report" };

/** Open to anyone who holds a copy of a report: it says which report it is, never what it contains. */
export default function VerifyPage() {
  return (
    <main className="mx-auto flex min-h-screen max-w-2xl flex-col justify-center px-4 py-12">
      <div className="rounded-xl border border-slate-200 bg-white p-8 shadow-sm">
        <p className="text-sm font-semibold uppercase tracking-widest text-hull-600">Tankwright</p>
        <h1 className="mb-1 mt-2 text-2xl font-bold text-hull-900">Check a signed report</h1>
        <p className="mb-6 text-sm text-slate-600">
          Choose the PDF, or paste its SHA-256 fingerprint. The file is fingerprinted in your browser and is not sent anywhere; only the fingerprint is compared with the reports that were signed and countersigned. The answer names the vessel, tank, date and revision, never the content.
        </p>
        <VerifyForm />
      </div>
    </main>
  );
}
