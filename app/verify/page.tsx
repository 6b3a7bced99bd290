import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SendVerifyButton } from "@/components/sharing/ResetForms";
import { sessionUser } from "@/lib/server/viewer";

export const metadata: Metadata = { title: "Confirm your address" };

export default async function VerifyRequestPage() {
  const user = await sessionUser();
  if (!user) redirect("/signin?callbackUrl=/verify");
  return (
    <div className="mx-auto max-w-sm px-4 py-12">
      <h1 className="mb-2 text-2xl font-semibold text-walnut-900">Confirm your e-mail address</h1>
      <p className="mb-6 text-sm text-walnut-700">We send invitations and password links to {user.email}. Confirm it is yours.</p>
      <SendVerifyButton />
    </div>
  );
}
