import type { Metadata } from "next";
import { SignUpForm } from "@/components/account/SignUpForm";
import { safeCallback } from "@/lib/server/callback-url";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const sp = await searchParams;
  return (
    <div className="mx-auto max-w-sm px-4 py-12">
      <h1 className="mb-2 text-2xl font-semibold text-walnut-900">Create an account</h1>
      <p className="mb-6 text-sm text-walnut-700">Free while we build. Your plans stay private until you share a link.</p>
      <SignUpForm callbackUrl={safeCallback(sp.callbackUrl)} />
    </div>
  );
}
