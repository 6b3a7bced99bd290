import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { NewWalkthroughForm } from "@/components/teaching/NewWalkthroughForm";
import { requestEm } from "@/lib/server/db";
import { AppError } from "@/lib/server/errors";
import { teacher as findTeacher, type Teacher } from "@/lib/server/services/classes";
import { listPlans } from "@/lib/server/services/plans";
import { listPresets } from "@/lib/server/services/presets";
import { listWalkthroughs } from "@/lib/server/services/walkthroughs";
import { currentUser } from "@/lib/server/session";

export const metadata: Metadata = { title: "Class" };

/** An instructor's published walk-throughs and presets; the instructor also sees drafts and can start a new one. */
export default async function ClassPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const em = await requestEm();
  let t: Teacher;
  try {
    t = await findTeacher(em, id);
  } catch (e) {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  }
  const user = await currentUser(em);
  const mine = user?.id === t.id;
  const [walks, presets] = await Promise.all([listWalkthroughs(em, user, { ownerId: t.id }), listPresets(em, mine ? user : null, { ownerId: t.id })]);
  const plans = mine && user ? (await listPlans(em, user)).filter((p) => p.role !== "viewer") : [];
  return (
    <div className="mx-auto flex max-w-4xl flex-col gap-8 px-4 py-8">
      <header>
        <p className="text-xs font-medium uppercase tracking-wide text-walnut-500">Class</p>
        <h1 className="text-2xl font-semibold text-walnut-900">{t.name}</h1>
      </header>
      <section aria-labelledby="walks-h" className="flex flex-col gap-2">
        <h2 id="walks-h" className="text-lg font-semibold">Walk-throughs</h2>
        {walks.length === 0 && <p className="text-sm text-walnut-700">Nothing published yet.</p>}
        <ul className="flex flex-col gap-2">
          {walks.map((w) => (
            <li key={w.id} className="flex flex-wrap items-center gap-3 rounded-md border border-walnut-100 bg-white px-3 py-2">
              <Link className="font-medium underline" href={`/present/${w.id}`}>{w.title}</Link>
              <span className="text-sm text-walnut-500">{w.steps.length} steps{w.published ? "" : " · draft"}</span>
              {mine && <Link className="ml-auto text-sm underline" href={`/present/${w.id}/edit`}>Edit</Link>}
            </li>
          ))}
        </ul>
        {mine && <NewWalkthroughForm plans={plans.map((p) => ({ id: p.id, name: p.name }))} />}
      </section>
      <section aria-labelledby="presets-h" className="flex flex-col gap-2">
        <h2 id="presets-h" className="text-lg font-semibold">Rule presets</h2>
        {presets.length === 0 && <p className="text-sm text-walnut-700">No presets published.</p>}
        <ul className="flex flex-col gap-2">
          {presets.map((p) => (
            <li key={p.id} className="rounded-md border border-walnut-100 bg-white px-3 py-2">
              <p className="font-medium">{p.name}{p.published ? "" : " (draft)"}</p>
              {p.description && <p className="text-sm text-walnut-700">{p.description}</p>}
              <p className="text-xs text-walnut-500">{Object.keys(p.numbers).length} numbers set</p>
            </li>
          ))}
        </ul>
        {mine && <Link className="text-sm underline" href="/presets">Manage presets</Link>}
      </section>
    </div>
  );
}
