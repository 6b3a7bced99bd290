"use client";

import Link from "next/link";
import { useState, type FormEvent } from "react";
import { Field } from "@/components/account/Field";
import { ApiError, api } from "@/components/plans/api";

/** Ask for a password link by e-mail. */
export function ResetRequestForm() {
  const [done, setDone] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const email = String(new FormData(e.currentTarget).get("email"));
    try {
      setDone((await api<{ message: string }>("/api/v1/account/reset", { method: "POST", body: JSON.stringify({ email }) })).message);
    } catch (err) {
      setError((err as Error).message);
    }
  }
  if (done) return <p role="status" className="rounded-md bg-pine-100 p-3 text-pine-700">{done}</p>;
  return (
    <form onSubmit={submit} className="flex flex-col gap-4">
      <Field id="email" name="email" type="email" label="E-mail of your account" autoComplete="email" required error={error ?? undefined} />
      <button type="submit" className="rounded-md bg-walnut-700 px-4 py-2 font-medium text-paper hover:bg-walnut-900">Send me a link</button>
    </form>
  );
}

/** Choose the new password with the e-mailed token. */
export function ResetConfirmForm({ token }: { token: string }) {
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const password = String(new FormData(e.currentTarget).get("password"));
    setError(null);
    try {
      await api("/api/v1/account/reset/confirm", { method: "POST", body: JSON.stringify({ token, password }) });
      setDone(true);
    } catch (err) {
      const fields = err instanceof ApiError ? (err.body as { error?: { fields?: { password?: string } } })?.error?.fields : undefined;
      setError(fields?.password ?? (err as Error).message);
    }
  }
  if (done)
    return (
      <p role="status" className="rounded-md bg-pine-100 p-3 text-pine-700">
        Your password was changed. <Link className="underline" href="/signin">Sign in</Link>
      </p>
    );
  return (
    <form onSubmit={submit} className="flex flex-col gap-4">
      <Field id="password" name="password" type="password" label="New password" autoComplete="new-password" required error={error ?? undefined} hint="At least 10 characters, letters with a digit or symbol, no common words." />
      <button type="submit" className="rounded-md bg-walnut-700 px-4 py-2 font-medium text-paper hover:bg-walnut-900">Set the new password</button>
    </form>
  );
}

/** Confirms the address on a click (not on page load: mail scanners open links too). */
export function VerifyButton({ token }: { token: string }) {
  const [state, setState] = useState<"idle" | "done" | string>("idle");
  async function confirm() {
    try {
      await api("/api/v1/account/verify/confirm", { method: "POST", body: JSON.stringify({ token }) });
      setState("done");
    } catch (e) {
      setState((e as Error).message);
    }
  }
  if (state === "done") return <p role="status" className="rounded-md bg-pine-100 p-3 text-pine-700">Thank you: your address is confirmed.</p>;
  return (
    <div className="flex flex-col gap-2">
      <button onClick={confirm} className="self-start rounded-md bg-walnut-700 px-4 py-2 font-medium text-paper hover:bg-walnut-900">Confirm my address</button>
      {state !== "idle" && <p role="alert" className="text-sm text-brick-700">{state}</p>}
    </div>
  );
}

/** For a signed-in account: send the confirmation message again. */
export function SendVerifyButton() {
  const [text, setText] = useState<string | null>(null);
  async function send() {
    try {
      const r = await api<{ sent: boolean; verified: boolean }>("/api/v1/account/verify", { method: "POST", body: "{}" });
      setText(r.verified ? "Your address is already confirmed." : "A confirmation message is on its way.");
    } catch (e) {
      setText((e as Error).message);
    }
  }
  return (
    <div className="flex flex-col gap-2">
      <button onClick={send} className="self-start rounded-md bg-walnut-700 px-4 py-2 font-medium text-paper hover:bg-walnut-900">Send the confirmation message</button>
      {text && <p role="status" className="text-sm text-walnut-700">{text}</p>}
    </div>
  );
}
