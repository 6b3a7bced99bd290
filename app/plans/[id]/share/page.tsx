import type { Metadata } from "next";
import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import { LinksSection } from "@/components/sharing/LinksSection";
import { PresetPicker } from "@/components/teaching/PresetPicker";
import { WallPhotos } from "@/components/sharing/WallPhotos";
import { PeopleSection } from "@/components/sharing/PeopleSection";
import { requestEm } from "@/lib/server/db";
import { AppError } from "@/lib/server/errors";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { accessPlan } from "@/lib/server/policy";
import { currentUser } from "@/lib/server/session";
import { drawingsForReading } from "@/lib/server/services/shared-analysis";

export const metadata: Metadata = { title: "Share" };

export default async function SharePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const em = await requestEm();
  const user = await currentUser(em);
  if (!user) redirect(`/signin?callbackUrl=/plans/${id}/share`);
  if (!/^[0-9a-f-]{36}$/i.test(id)) notFound();
  let access;
  try {
    access = await accessPlan(em, id, user, "viewer", { withDocument: true });
  } catch (e) {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  }
  const isOwner = access.role === "owner";
  const document = access.plan.document as unknown as PlanDocument;
  const drawings = await drawingsForReading(document);
  return (
    <div className="mx-auto flex max-w-4xl flex-col gap-8 px-4 py-6">
      <header>
        <Link href={`/plans/${id}`} className="text-sm underline">Back to the plan</Link>
        <h1 className="text-2xl font-semibold text-walnut-900">Share “{access.plan.name}”</h1>
      </header>
      {isOwner && <LinksSection planId={id} />}
      <PeopleSection planId={id} isOwner={isOwner} />
      <PresetPicker planId={id} canEdit={access.role !== "viewer"} />
      <WallPhotos planId={id} document={document} canEdit={access.role !== "viewer"} elevations={drawings?.elevations ?? []} />
    </div>
  );
}
