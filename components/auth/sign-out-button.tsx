"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button type="button" onClick={() => signOut({ callbackUrl: "/sign-in" })} className="text-label font-medium uppercase text-slate-600 hover:text-ink">
      Sign out
    </button>
  );
}
