import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ReadOnlyFindings } from "@/components/sharing/ReadOnlyFindings";
import { CopyPlanButton } from "@/components/sharing/CopyPlanButton";
import { PacketButton } from "@/components/packet/PacketButton";
import { SharedParts } from "@/components/sharing/SharedParts";
import { SharedPlanView } from "@/components/sharing/SharedPlanView";
import { FIXTURE_KINDS } from "@/lib/engine/fixtures/registry";
import { requestEm } from "@/lib/server/db";
import { AppError } from "@/lib/server/errors";
import { presetOfDocument } from "@/lib/server/services/plan-preset";
import { analyseForReading } from "@/lib/server/services/shared-analysis";
import { openShared, type SharedPlan } from "@/lib/server/services/share-links";
import { sessionUser } from "@/lib/server/viewer";

// Shared plans are private to whoever holds the link: keep them out of search engines.
export const metadata: Metadata = { title: "Shared plan", robots: { index: false, follow: false, nocache: true } };

type Props = { params: Promise<{ token: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function SharedPlanPage({ params, searchParams }: Props) {
  const { token } = await params;
  const sp = await searchParams;
  const em = await requestEm();
  let plan: SharedPlan;
  try {
    plan = await openShared(em, token);
  } catch (e) {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  }
  const preset = await presetOfDocument(em, plan.document);
  const user = await sessionUser();
  const analysis = await analyseForReading(plan.document, preset ? { name: preset.name, numbers: preset.numbers } : null);
  return (
    <div className="mx-auto flex max-w-6xl flex-col gap-4 px-4 py-6">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <p className="text-xs font-medium uppercase tracking-wide text-walnut-500">Shared plan · read-only</p>
          <h1 className="text-2xl font-semibold text-walnut-900">{plan.name}</h1>
          <p className="text-sm text-walnut-700">
            By {plan.ownerName} · last changed {new Date(plan.updatedAt).toLocaleDateString("en-US", { dateStyle: "medium" })}
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <a href={`/s/${token}/shop`} className="rounded border border-walnut-300 px-3 py-1.5 text-sm text-walnut-900 hover:bg-walnut-100" data-testid="shop-link">
            At the saw (phone view)
          </a>
          <PacketButton href={`/api/v1/shared/${encodeURIComponent(token)}/packet.pdf`} />
          <CopyPlanButton token={token} signedIn={!!user} prompt={sp.copy === "1" && !!user} />
        </div>
      </header>
      <p className="rounded-md bg-steel-100 px-3 py-2 text-sm text-steel-700" data-testid="read-only-note">
        You are looking at a read-only copy. Nothing here can be changed; copy it into your own account to work on it.
      </p>
      <SharedPlanView
        document={plan.document}
        preset={preset ? { name: preset.name, ownerName: preset.ownerName, numbers: preset.numbers as Record<string, number> } : null}
        drawings={analysis.drawings}
        kindNames={Object.fromEntries(FIXTURE_KINDS.map((k) => [k.kind, k.title]))}
        checks={analysis.error ? <p className="text-sm text-brick-700">{analysis.error}</p> : <ReadOnlyFindings findings={analysis.findings} />}
        parts={<SharedParts plan={plan.document} />}
      />
    </div>
  );
}
