"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button
      type="button"
      onClick={() => signOut({ callbackUrl: "/sign-in" })}
      className="rounded-md border border-white/40 px-3 py-1.5 text-sm font-semibold text-white hover:bg-white/10"
    >
      Sign out
    </button>
  );
}
