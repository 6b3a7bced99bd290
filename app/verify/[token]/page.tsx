import type { Metadata } from "next";
import { VerifyButton } from "@/components/sharing/ResetForms";

export const metadata: Metadata = { title: "Confirm your address", robots: { index: false, follow: false } };

export default async function VerifyPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return (
    <div className="mx-auto max-w-sm px-4 py-12">
      <h1 className="mb-4 text-2xl font-semibold text-walnut-900">Confirm your e-mail address</h1>
      <VerifyButton token={token} />
    </div>
  );
}
