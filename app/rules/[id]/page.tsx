import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { CodesFirstNote } from "@/components/rules/CodesFirstNote";
import { RuleDiagram } from "@/components/rules/RuleDiagram";
import { SeverityBadge } from "@/components/rules/SeverityBadge";
import { ruleDiagram } from "@/lib/engine/checks/diagrams";
import { RULES, getRule } from "@/lib/engine/checks/registry";

const STATUS: Record<string, string> = {
  published: "published source",
  memory: "published source, value recalled from memory",
  practice: "common practice, no formal source",
  derived: "derived from geometry or the formulas above",
};

export function generateStaticParams() {
  return RULES.map((r) => ({ id: r.id }));
}

export async function generateMetadata({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> {
  const rule = getRule((await params).id);
  return rule ? { title: rule.title, description: rule.protects } : { title: "Rule not found" };
}

export default async function RulePage({ params }: { params: Promise<{ id: string }> }) {
  const rule = getRule((await params).id);
  if (!rule) notFound();
  const diagram = ruleDiagram(rule.id);
  return (
    <article className="mx-auto max-w-4xl px-4 py-10">
      <nav className="mb-4 text-sm">
        <Link href="/rules" className="text-walnut-500 hover:underline">
          All rules
        </Link>
      </nav>
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-3xl font-bold text-walnut-900">{rule.title}</h1>
        <SeverityBadge severity={rule.severity} />
      </div>
      <section className="mt-6">
        <h2 className="text-lg font-semibold text-walnut-900">What it protects</h2>
        <p className="mt-1 text-walnut-700">{rule.protects}</p>
      </section>
      <section className="mt-6">
        <h2 className="text-lg font-semibold text-walnut-900">Formula</h2>
        <p className="mt-1 rounded bg-paper-deep p-3 font-mono text-sm text-walnut-900">{rule.formula}</p>
      </section>
      {rule.numbers.length ? (
        <section className="mt-6">
          <h2 className="text-lg font-semibold text-walnut-900">Numbers</h2>
          <table className="mt-2 w-full text-left text-sm">
            <tbody>
              {rule.numbers.map((n) => (
                <tr key={n.label} className="border-b border-walnut-100">
                  <th scope="row" className="py-2 pr-4 font-medium text-walnut-900">
                    {n.label}
                  </th>
                  <td className="py-2 text-walnut-700">{n.value}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="mt-2 text-xs text-walnut-500">An instructor&apos;s class preset can make these stricter; findings then say &quot;(class preset)&quot;.</p>
        </section>
      ) : null}
      {diagram ? (
        <section className="mt-6">
          <h2 className="sr-only">Drawing</h2>
          <RuleDiagram diagram={diagram} />
        </section>
      ) : null}
      <section className="mt-6">
        <h2 className="text-lg font-semibold text-walnut-900">Sources</h2>
        <ul className="mt-2 list-disc space-y-1 pl-5 text-sm text-walnut-700">
          {rule.sources.map((s) => (
            <li key={s.citation}>
              {s.citation} <span className="text-walnut-500">({STATUS[s.status] ?? s.status})</span>
              {s.note ? <span className="block text-walnut-500">{s.note}</span> : null}
            </li>
          ))}
        </ul>
      </section>
      {rule.cautions.length ? (
        <section className="mt-6">
          <h2 className="text-lg font-semibold text-walnut-900">Cautions</h2>
          <ul className="mt-2 list-disc space-y-1 pl-5 text-sm text-walnut-700">
            {rule.cautions.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        </section>
      ) : null}
      <div className="mt-8">
        <CodesFirstNote />
      </div>
    </article>
  );
}
