import type { Metadata } from "next";
import { SignInForm } from "@/components/account/SignInForm";
import { safeCallback } from "@/lib/server/callback-url";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const sp = await searchParams;
  return (
    <div className="mx-auto max-w-sm px-4 py-12">
      <h1 className="mb-6 text-2xl font-semibold text-walnut-900">Sign in</h1>
      <SignInForm callbackUrl={safeCallback(sp.callbackUrl)} />
    </div>
  );
}
