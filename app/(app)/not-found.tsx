import type { Metadata } from "next";
import Link from "next/link";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";

export const metadata: Metadata = { title: "Not found" };

// Every notFound() of the signed-in pages ends here, inside the app's layout: a
// record that does not exist and one the user may not open (another vessel, another
// company, a role without access) look the same, so neither is disclosed. It
// gets no params, so the links are the same for everyone; the start page
// leads each user to their own home.
export default function AppNotFound() {
  const link = "font-semibold text-hull-700 underline hover:no-underline";
  return (
    <>
      <PageHeader title="Not found" />
      <div className="space-y-4">
        <Notice title="This record does not exist or is not open to you.">
          <p>The link may be mistyped or out of date, the record may have been removed, or it belongs to a vessel or company your account does not cover.</p>
        </Notice>
        <nav aria-label="Where to go" className="text-sm">
          <ul className="flex flex-wrap gap-x-6 gap-y-2">
            <li>
              <Link href="/" className={link}>
                Your start page
              </Link>
            </li>
            <li>
              <Link href="/fleet" className={link}>
                Fleet overview
              </Link>
            </li>
            <li>
              <Link href="/vessels" className={link}>
                Vessels
              </Link>
            </li>
          </ul>
        </nav>
      </div>
    </>
  );
}
