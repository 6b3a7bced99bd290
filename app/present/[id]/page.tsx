import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Presenter } from "@/components/teaching/Presenter";
import type { Step } from "@/components/teaching/steps";
import { requestEm } from "@/lib/server/db";
import { AppError } from "@/lib/server/errors";
import { currentUser } from "@/lib/server/session";
import { analyseForReading } from "@/lib/server/services/shared-analysis";
import { showWalkthrough, type WalkthroughShow } from "@/lib/server/services/walkthroughs";

export const metadata: Metadata = { title: "Presentation", robots: { index: false, follow: false } };

type Props = { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

/** Presentation mode: students open it from a link (?t=...) or the class page; nobody edits here. */
export default async function PresentPage({ params, searchParams }: Props) {
  const { id } = await params;
  const t = (await searchParams).t;
  if (!/^[0-9a-f-]{36}$/i.test(id)) notFound();
  const em = await requestEm();
  let w: WalkthroughShow;
  try {
    w = await showWalkthrough(em, await currentUser(em), id, typeof t === "string" ? t : null);
  } catch (e) {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  }
  const { findings, drawings } = await analyseForReading(w.document, w.preset ? { name: w.preset.name, numbers: w.preset.numbers } : null);
  return <Presenter title={w.title} planName={w.planName} ownerName={w.ownerName} steps={w.steps as Step[]} document={w.document} drawings={drawings} presetName={w.preset?.name ?? null} findings={findings} />;
}
