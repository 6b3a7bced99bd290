"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { api } from "@/components/plans/api";

export function AcceptInvite({ token }: { token: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function accept() {
    setBusy(true);
    try {
      const r = await api<{ planId: string }>(`/api/v1/invitations/${token}/accept`, { method: "POST", body: "{}" });
      router.push(`/plans/${r.planId}`);
    } catch (e) {
      setError((e as Error).message);
      setBusy(false);
    }
  }
  return (
    <div className="flex flex-col gap-2">
      <button onClick={accept} disabled={busy} className="self-start rounded-md bg-walnut-700 px-4 py-2 font-medium text-paper hover:bg-walnut-900 disabled:opacity-60">
        {busy ? "Joining…" : "Accept and open the plan"}
      </button>
      {error && <p role="alert" className="text-sm text-brick-700">{error}</p>}
    </div>
  );
}
