import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { EditorShell } from "@/components/editor/EditorShell";
import { requestEm } from "@/lib/server/db";
import { AppError } from "@/lib/server/errors";
import { currentUser } from "@/lib/server/session";
import { getPlan } from "@/lib/server/services/plans";

export const metadata: Metadata = { title: "Plan" };

/** The room editor for one plan; signed-in users with access only. */
export default async function PlanPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const em = await requestEm();
  const user = await currentUser(em);
  if (!user) redirect(`/signin?callbackUrl=/plans/${id}`);
  if (!/^[0-9a-f-]{36}$/i.test(id)) notFound();
  const plan = await getPlan(em, user, id).catch((e: unknown) => {
    if (e instanceof AppError && (e.status === 404 || e.status === 403)) notFound();
    throw e;
  });
  return <EditorShell plan={{ id: plan.id, name: plan.name, version: plan.version, document: plan.document, role: plan.role }} />;
}
