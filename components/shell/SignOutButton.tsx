"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button type="button" onClick={() => signOut({ callbackUrl: "/" })} className="rounded-md border border-walnut-300 px-3 py-1.5 text-walnut-700 hover:bg-walnut-50">
      Sign out
    </button>
  );
}
