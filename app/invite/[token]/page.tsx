import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AcceptInvite } from "@/components/sharing/AcceptInvite";
import { requestEm } from "@/lib/server/db";
import { AppError } from "@/lib/server/errors";
import { previewInvitation, type InvitationPreview } from "@/lib/server/services/invitations";
import { sessionUser } from "@/lib/server/viewer";

export const metadata: Metadata = { title: "Invitation", robots: { index: false, follow: false } };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  let inv: InvitationPreview;
  try {
    inv = await previewInvitation(await requestEm(), token);
  } catch (e) {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  }
  const user = await sessionUser();
  const back = encodeURIComponent(`/invite/${token}`);
  const wrongAccount = user && user.email.toLowerCase() !== inv.email;
  return (
    <div className="mx-auto flex max-w-lg flex-col gap-4 px-4 py-12">
      <h1 className="text-2xl font-semibold text-walnut-900">Join “{inv.planName}”</h1>
      <p className="text-walnut-700">
        {inv.inviterName} invited {inv.email} as {inv.role === "editor" ? "an editor (can change the plan)" : "a viewer (can look, not change)"}.
      </p>
      {!user && (
        <p className="flex flex-wrap gap-3">
          <Link className="rounded-md bg-walnut-700 px-4 py-2 font-medium text-paper" href={`/signin?callbackUrl=${back}`}>Sign in to accept</Link>
          <Link className="rounded-md border border-walnut-700 px-4 py-2 font-medium text-walnut-900" href={`/signup?callbackUrl=${back}`}>Make an account</Link>
        </p>
      )}
      {wrongAccount && <p className="rounded-md bg-amberline-100 p-3 text-sm text-amberline-700">You are signed in as {user.email}. This invitation is for {inv.email}: sign out and sign in with that address.</p>}
      {user && !wrongAccount && <AcceptInvite token={token} />}
    </div>
  );
}
