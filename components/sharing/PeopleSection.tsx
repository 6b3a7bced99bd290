"use client";

import { useCallback, useEffect, useState, type FormEvent } from "react";
import { api } from "@/components/plans/api";

interface Member {
  userId: string;
  name: string;
  email: string;
  role: "owner" | "editor" | "viewer";
}
interface Invite {
  id: string;
  email: string;
  role: "editor" | "viewer";
  expiresAt: string;
  state: string;
}

/** Collaborators and invitations. The owner invites, changes and removes; others only see who is on the plan. */
export function PeopleSection({ planId, isOwner }: { planId: string; isOwner: boolean }) {
  const [members, setMembers] = useState<Member[]>([]);
  const [invites, setInvites] = useState<Invite[]>([]);
  const [msg, setMsg] = useState<{ ok: boolean; text: string } | null>(null);
  const base = `/api/v1/plans/${planId}`;

  const load = useCallback(
    () =>
      Promise.all([api<{ members: Member[] }>(`${base}/members`), isOwner ? api<{ invitations: Invite[] }>(`${base}/invitations`) : Promise.resolve({ invitations: [] })])
        .then(([m, i]) => {
          setMembers(m.members);
          setInvites(i.invitations);
        })
        .catch((e: Error) => setMsg({ ok: false, text: e.message })),
    [base, isOwner],
  );
  useEffect(() => {
    void load();
  }, [load]);

  const act = async (p: Promise<unknown>, ok?: string) => {
    try {
      await p;
      if (ok) setMsg({ ok: true, text: ok });
    } catch (e) {
      setMsg({ ok: false, text: (e as Error).message });
    }
    await load();
  };

  function invite(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const email = String(f.get("email"));
    e.currentTarget.reset();
    void act(api(`${base}/invitations`, { method: "POST", body: JSON.stringify({ email, role: f.get("role") }) }), `Invitation sent to ${email}.`);
  }

  return (
    <section aria-labelledby="people-h" className="flex flex-col gap-3">
      <h2 id="people-h" className="text-lg font-semibold text-walnut-900">People on this plan</h2>
      <p className="text-sm text-walnut-700">Editors can change the plan; viewers can only look. Every save records who made it.</p>
      <ul className="divide-y divide-walnut-50 text-sm">
        {members.map((m) => (
          <li key={m.userId} className="flex flex-wrap items-center gap-2 py-1.5">
            <span className="min-w-40 font-medium">{m.name}</span>
            <span className="text-walnut-500">{m.email}</span>
            <span className="ml-auto">
              {m.role === "owner" || !isOwner ? (
                <span className="rounded bg-paper-deep px-2 py-0.5">{m.role}</span>
              ) : (
                <span className="flex items-center gap-2">
                  <select aria-label={`Role of ${m.name}`} value={m.role} onChange={(e) => act(api(`${base}/members/${m.userId}`, { method: "PATCH", body: JSON.stringify({ role: e.target.value }) }))} className="rounded border border-walnut-300 bg-white px-1 py-0.5">
                    <option value="editor">editor</option>
                    <option value="viewer">viewer</option>
                  </select>
                  <button onClick={() => act(api(`${base}/members/${m.userId}`, { method: "DELETE" }))} className="text-brick-700 underline">Remove</button>
                </span>
              )}
            </span>
          </li>
        ))}
      </ul>
      {isOwner && (
        <>
          <form onSubmit={invite} className="flex flex-wrap items-end gap-2">
            <label className="flex flex-col text-sm">
              Invite by e-mail
              <input name="email" type="email" required className="rounded-md border border-walnut-300 bg-white px-2 py-1" />
            </label>
            <label className="flex flex-col text-sm">
              Role
              <select name="role" defaultValue="viewer" className="rounded-md border border-walnut-300 bg-white px-2 py-1">
                <option value="viewer">viewer (can look)</option>
                <option value="editor">editor (can change)</option>
              </select>
            </label>
            <button type="submit" className="rounded-md bg-walnut-700 px-3 py-1.5 text-sm font-medium text-paper hover:bg-walnut-900">Send invitation</button>
          </form>
          {invites.length > 0 && (
            <ul className="text-sm">
              {invites.map((i) => (
                <li key={i.id} className="flex items-center gap-2 py-1">
                  <span>{i.email}</span>
                  <span className="text-walnut-500">{i.role} · {i.state}</span>
                  {i.state === "pending" && (
                    <button onClick={() => act(api(`${base}/invitations/${i.id}`, { method: "DELETE" }))} className="text-brick-700 underline">Withdraw</button>
                  )}
                </li>
              ))}
            </ul>
          )}
        </>
      )}
      {msg && <p role={msg.ok ? "status" : "alert"} className={`text-sm ${msg.ok ? "text-pine-700" : "text-brick-700"}`}>{msg.text}</p>}
    </section>
  );
}
