"use client";

import Link from "next/link";
import { useState, type FormEvent } from "react";
import { signInWithPassword } from "./auth-client";
import { Field } from "./Field";

const MESSAGES: Record<string, string> = {
  CredentialsSignin: "That e-mail and password do not match an account.",
  too_many_attempts: "Too many failed attempts. Wait 15 minutes and try again.",
};

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    setBusy(true);
    setError(null);
    const res = await signInWithPassword(String(form.get("email")), String(form.get("password")), callbackUrl).catch(() => null);
    setBusy(false);
    if (res?.ok) {
      window.location.assign(callbackUrl);
      return;
    }
    setError(MESSAGES[res?.error ?? ""] ?? "Sign-in failed. Try again in a moment.");
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
      <Field id="email" name="email" type="email" label="E-mail" autoComplete="email" required />
      <Field id="password" name="password" type="password" label="Password" autoComplete="current-password" required />
      {error && <p role="alert" className="rounded-md bg-brick-100 px-3 py-2 text-sm text-brick-700">{error}</p>}
      <button type="submit" disabled={busy} className="rounded-md bg-walnut-700 px-4 py-2 font-medium text-paper hover:bg-walnut-900 disabled:opacity-60">
        {busy ? "Signing in…" : "Sign in"}
      </button>
      <p className="text-sm text-walnut-700">
        New here? <Link className="underline" href={`/signup?callbackUrl=${encodeURIComponent(callbackUrl)}`}>Create an account</Link>
        {" · "}
        <Link className="underline" href="/reset">Forgot your password?</Link>
      </p>
    </form>
  );
}
