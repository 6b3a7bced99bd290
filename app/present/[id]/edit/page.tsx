import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import type { Step } from "@/components/teaching/steps";
import { WalkthroughEditor } from "@/components/teaching/WalkthroughEditor";
import { RULES } from "@/lib/engine/checks/registry";
import { requestEm } from "@/lib/server/db";
import { AppError } from "@/lib/server/errors";
import { currentUser } from "@/lib/server/session";
import { showWalkthrough, type WalkthroughShow } from "@/lib/server/services/walkthroughs";

export const metadata: Metadata = { title: "Edit walk-through" };

export default async function EditWalkthroughPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  if (!/^[0-9a-f-]{36}$/i.test(id)) notFound();
  const em = await requestEm();
  const user = await currentUser(em);
  if (!user) redirect(`/signin?callbackUrl=/present/${id}/edit`);
  let w: WalkthroughShow;
  try {
    w = await showWalkthrough(em, user, id);
  } catch (e) {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  }
  if (!w.canEdit) notFound();
  return (
    <div className="mx-auto max-w-4xl px-4 py-6">
      <h1 className="mb-1 text-2xl font-semibold text-walnut-900">Walk-through on “{w.planName}”</h1>
      <p className="mb-4 text-sm text-walnut-700">Each step picks a view, what to highlight, the rule it shows and a short note.</p>
      <WalkthroughEditor id={w.id} initial={{ title: w.title, steps: w.steps as Step[], published: w.published }} document={w.document} ruleIds={RULES.map((r) => r.id)} />
    </div>
  );
}
