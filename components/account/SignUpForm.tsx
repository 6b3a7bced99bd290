"use client";

import Link from "next/link";
import { useState, type FormEvent } from "react";
import { signInWithPassword } from "./auth-client";
import { Field } from "./Field";

type Errors = Partial<Record<"name" | "email" | "password" | "_", string>>;

export function SignUpForm({ callbackUrl }: { callbackUrl: string }) {
  const [errors, setErrors] = useState<Errors>({});
  const [busy, setBusy] = useState(false);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const body = { name: String(form.get("name")), email: String(form.get("email")), password: String(form.get("password")) };
    setBusy(true);
    setErrors({});
    try {
      const res = await fetch("/api/v1/account", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
      if (res.status !== 201) {
        const data = (await res.json().catch(() => null)) as { error?: { message?: string; fields?: Errors } } | null;
        setErrors({ ...(data?.error?.fields ?? {}), _: data?.error?.message ?? "Could not create the account. Try again." });
        return;
      }
      const signed = await signInWithPassword(body.email, body.password, callbackUrl);
      if (signed?.ok) {
        // Ask for the address-confirmation e-mail; the account works meanwhile, so a failure here is not fatal.
        await fetch("/api/v1/account/verify", { method: "POST" }).catch(() => undefined);
        window.location.assign(callbackUrl);
      }
      else setErrors({ _: "Your account was created, but signing in failed. Try signing in." });
    } catch {
      setErrors({ _: "The server could not be reached. Check your connection and try again." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
      <Field id="name" name="name" label="Your name" autoComplete="name" required error={errors.name} />
      <Field id="email" name="email" type="email" label="E-mail" autoComplete="email" required error={errors.email} />
      <Field id="password" name="password" type="password" label="Password" autoComplete="new-password" required error={errors.password} hint="At least 10 characters, letters with a digit or symbol, no common words." />
      {errors._ && <p role="alert" className="rounded-md bg-brick-100 px-3 py-2 text-sm text-brick-700">{errors._}</p>}
      <button type="submit" disabled={busy} className="rounded-md bg-walnut-700 px-4 py-2 font-medium text-paper hover:bg-walnut-900 disabled:opacity-60">
        {busy ? "Creating your account…" : "Create account"}
      </button>
      <p className="text-sm text-walnut-700">
        Already have one? <Link className="underline" href={`/signin?callbackUrl=${encodeURIComponent(callbackUrl)}`}>Sign in</Link>
      </p>
    </form>
  );
}
