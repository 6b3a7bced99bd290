"use client";

import { useCallback, useEffect, useState, type FormEvent } from "react";
import { api } from "@/components/plans/api";

interface LinkRow {
  id: string;
  label: string | null;
  createdAt: string;
  expiresAt: string | null;
  lastOpenedAt: string | null;
  openCount: number;
  state: "live" | "expired" | "revoked";
}

const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString("en-US", { dateStyle: "medium", timeStyle: "short" }) : "never");

/** The owner's read-only links: make one (optionally expiring), see when each was last opened, revoke. */
export function LinksSection({ planId }: { planId: string }) {
  const [links, setLinks] = useState<LinkRow[]>([]);
  const [fresh, setFresh] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const base = `/api/v1/plans/${planId}/links`;

  const load = useCallback(() => api<{ links: LinkRow[] }>(base).then((r) => setLinks(r.links)).catch((e: Error) => setError(e.message)), [base]);
  useEffect(() => {
    void load();
  }, [load]);

  async function create(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const days = Number(f.get("days"));
    setError(null);
    try {
      const r = await api<{ url: string }>(base, { method: "POST", body: JSON.stringify({ label: String(f.get("label") || "") || undefined, expiresInDays: days > 0 ? days : undefined }) });
      setFresh(r.url);
      await load();
    } catch (err) {
      setError((err as Error).message);
    }
  }

  async function revoke(id: string) {
    await api(`${base}/${id}`, { method: "DELETE" }).catch((e: Error) => setError(e.message));
    await load();
  }

  return (
    <section aria-labelledby="links-h" className="flex flex-col gap-3">
      <h2 id="links-h" className="text-lg font-semibold text-walnut-900">Read-only links</h2>
      <p className="text-sm text-walnut-700">Anyone with a link can look at the plan without an account, and copy it into their own. They cannot change yours.</p>
      <form onSubmit={create} className="flex flex-wrap items-end gap-2">
        <label className="flex flex-col text-sm">
          Note (who it is for)
          <input name="label" maxLength={80} className="rounded-md border border-walnut-300 bg-white px-2 py-1" />
        </label>
        <label className="flex flex-col text-sm">
          Stops working after
          <select name="days" defaultValue="0" className="rounded-md border border-walnut-300 bg-white px-2 py-1">
            <option value="0">no expiry</option>
            <option value="1">1 day</option>
            <option value="7">7 days</option>
            <option value="30">30 days</option>
          </select>
        </label>
        <button type="submit" className="rounded-md bg-walnut-700 px-3 py-1.5 text-sm font-medium text-paper hover:bg-walnut-900">Make a link</button>
      </form>
      {fresh && (
        <p className="rounded-md bg-pine-100 p-2 text-sm text-pine-700">
          New link (shown once, copy it now): <input readOnly value={fresh} data-testid="new-link" className="w-full rounded border border-pine-500 bg-white px-2 py-1 font-mono text-xs" onFocus={(e) => e.currentTarget.select()} />
        </p>
      )}
      {error && <p role="alert" className="text-sm text-brick-700">{error}</p>}
      <table className="w-full text-left text-sm">
        <thead>
          <tr className="border-b border-walnut-100 text-walnut-500">
            <th className="py-1">Note</th>
            <th>Made</th>
            <th>Expires</th>
            <th>Last opened</th>
            <th>Opens</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {links.map((l) => (
            <tr key={l.id} className="border-b border-walnut-50" data-state={l.state}>
              <td className="py-1">{l.label || "—"}</td>
              <td>{when(l.createdAt)}</td>
              <td>{l.expiresAt ? when(l.expiresAt) : "no expiry"}</td>
              <td>{when(l.lastOpenedAt)}</td>
              <td>{l.openCount}</td>
              <td>
                {l.state === "live" ? (
                  <button onClick={() => revoke(l.id)} className="text-brick-700 underline">Revoke</button>
                ) : (
                  <span className="text-walnut-500">{l.state}</span>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
