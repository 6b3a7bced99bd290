"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { api } from "@/components/plans/api";

/**
 * Copies a shared plan into the reader's account. Signed out, it offers sign-in or sign-up and
 * comes back here with ?copy=1 so the copy is one click away.
 */
export function CopyPlanButton({ token, signedIn, prompt }: { token: string; signedIn: boolean; prompt: boolean }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const back = encodeURIComponent(`/s/${token}?copy=1`);

  if (!signedIn) {
    return (
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <span className="text-walnut-700">Want your own copy to change?</span>
        <Link className="rounded-md bg-walnut-700 px-3 py-1.5 font-medium text-paper hover:bg-walnut-900" href={`/signup?callbackUrl=${back}`}>
          Sign up and copy
        </Link>
        <Link className="underline" href={`/signin?callbackUrl=${back}`}>
          Sign in and copy
        </Link>
      </div>
    );
  }

  async function copy() {
    setBusy(true);
    setError(null);
    try {
      const r = await api<{ plan: { id: string } }>(`/api/v1/shared/${token}/copy`, { method: "POST", body: "{}" });
      router.push(`/plans/${r.plan.id}`);
    } catch (e) {
      setError((e as Error).message);
      setBusy(false);
    }
  }

  return (
    <div className={`flex flex-wrap items-center gap-2 text-sm ${prompt ? "rounded-lg bg-pine-100 p-3" : ""}`}>
      {prompt && <span className="text-pine-700">You are signed in. Make your own copy of this plan?</span>}
      <button onClick={copy} disabled={busy} className="rounded-md bg-walnut-700 px-3 py-1.5 font-medium text-paper hover:bg-walnut-900 disabled:opacity-60">
        {busy ? "Copying…" : "Copy into my plans"}
      </button>
      {error && <span role="alert" className="text-brick-700">{error}</span>}
    </div>
  );
}
