import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { env } from "@/lib/server/env";

export const metadata: Metadata = { title: "Caught mail", robots: { index: false, follow: false } };
export const dynamic = "force-dynamic";

interface Caught {
  id: number;
  date: string;
  to: string[];
  subject: string;
  text: string;
}

/** Development only: the messages the local SMTP catcher kept. Absent (404) when no catcher is configured. */
export default async function DevMailPage() {
  const url = env().MAIL_CATCHER_URL;
  if (!url) notFound();
  const list = (await fetch(`${url}/messages`, { cache: "no-store" })
    .then((r) => r.json())
    .catch(() => [])) as Caught[];
  return (
    <div className="mx-auto max-w-4xl px-4 py-6">
      <h1 className="mb-4 text-2xl font-semibold text-walnut-900">Caught mail ({list.length})</h1>
      <p className="mb-4 text-sm text-walnut-700">Messages sent by this instance to the local catcher. Nothing here left the machine.</p>
      <ol className="flex flex-col gap-3">
        {[...list].reverse().map((m) => (
          <li key={m.id} className="rounded-lg border border-walnut-100 bg-white p-3">
            <p className="font-medium">{m.subject}</p>
            <p className="text-xs text-walnut-500">{new Date(m.date).toLocaleString("en-US")} · to {m.to.join(", ")}</p>
            <pre className="mt-2 whitespace-pre-wrap text-sm">{m.text}</pre>
          </li>
        ))}
      </ol>
    </div>
  );
}
