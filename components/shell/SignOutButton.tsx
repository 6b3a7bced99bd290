"use client";

import { signOut } from "@/components/account/auth-client";

/** In the header on every page: kept free of next-auth's React client (see auth-client.ts). */
export function SignOutButton() {
  return (
    <button type="button" onClick={() => void signOut("/")} className="rounded-md border border-walnut-300 px-3 py-1.5 text-walnut-700 hover:bg-walnut-50">
      Sign out
    </button>
  );
}
