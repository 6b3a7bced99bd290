import type { Metadata } from "next";
import Link from "next/link";
import { CodesFirstNote } from "@/components/rules/CodesFirstNote";
import { SeverityBadge } from "@/components/rules/SeverityBadge";
import { RULES } from "@/lib/engine/checks/registry";

export const metadata: Metadata = {
  title: "Clearance rules",
  description: "Every check Benchwright runs on a shop plan: what it protects, its formula, its numbers and where they come from.",
};

export default function RulesIndex() {
  return (
    <div className="mx-auto max-w-4xl px-4 py-10">
      <h1 className="text-3xl font-bold text-walnut-900">Clearance rules</h1>
      <p className="mt-3 text-walnut-700">
        As you place fixtures, Benchwright runs every rule below and marks what fails in the 3D view and in the list. Each page shows what the rule protects,
        the formula and numbers, a drawing, and the source of each number.
      </p>
      <div className="mt-6">
        <CodesFirstNote />
      </div>
      <ul className="mt-8 divide-y divide-walnut-100 rounded-lg border border-walnut-100 bg-white/60">
        {RULES.map((r) => (
          <li key={r.id} className="p-4">
            <div className="flex flex-wrap items-center gap-3">
              <Link href={`/rules/${r.id}`} className="text-lg font-semibold text-walnut-900 underline-offset-4 hover:underline">
                {r.title}
              </Link>
              <SeverityBadge severity={r.severity} />
            </div>
            <p className="mt-1 text-sm text-walnut-700">{r.protects}</p>
          </li>
        ))}
      </ul>
    </div>
  );
}
