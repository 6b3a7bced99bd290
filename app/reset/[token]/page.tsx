import type { Metadata } from "next";
import Link from "next/link";
import { ResetConfirmForm } from "@/components/sharing/ResetForms";
import { requestEm } from "@/lib/server/db";
import { checkResetToken } from "@/lib/server/services/email-tokens";

export const metadata: Metadata = { title: "Choose a new password", robots: { index: false, follow: false } };

export default async function ResetPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const ok = await checkResetToken(await requestEm(), token).then(
    (r) => r,
    () => null,
  );
  return (
    <div className="mx-auto max-w-sm px-4 py-12">
      <h1 className="mb-4 text-2xl font-semibold text-walnut-900">Choose a new password</h1>
      {ok ? (
        <>
          <p className="mb-4 text-sm text-walnut-700">For {ok.email}.</p>
          <ResetConfirmForm token={token} />
        </>
      ) : (
        <p className="text-walnut-700">
          This link was used already or has expired. <Link className="underline" href="/reset">Ask for a new one</Link>.
        </p>
      )}
    </div>
  );
}
