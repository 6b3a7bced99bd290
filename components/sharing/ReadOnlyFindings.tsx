import Link from "next/link";
import type { Finding } from "@/lib/engine/checks/types";

const look: Record<string, { label: string; cls: string }> = {
  conflict: { label: "Conflict", cls: "border-brick-500 bg-brick-100 text-brick-700" },
  caution: { label: "Caution", cls: "border-amberline-500 bg-amberline-100 text-amberline-700" },
  advice: { label: "Advice", cls: "border-steel-500 bg-steel-100 text-steel-700" },
};

/** The plan's findings, worst first; passes are counted, not listed. Each links to its rule page. */
export function ReadOnlyFindings({ findings }: { findings: Finding[] }) {
  const open = findings.filter((f) => !f.pass);
  const passes = findings.length - open.length;
  return (
    <div className="flex flex-col gap-2">
      <p className="text-sm text-walnut-700" data-testid="findings-summary">
        {open.length} finding{open.length === 1 ? "" : "s"} to look at · {passes} check{passes === 1 ? "" : "s"} met
      </p>
      <ul className="flex flex-col gap-2">
        {open.map((f, i) => (
          <li key={`${f.ruleId}-${f.subjectId ?? i}`} className="flex items-start gap-2 rounded-md bg-white p-2 text-sm" data-rule={f.ruleId}>
            <span className={`shrink-0 rounded border px-1.5 text-xs font-semibold ${look[f.severity].cls}`}>{look[f.severity].label}</span>
            <span className="flex-1">{f.message}</span>
            <Link className="shrink-0 text-xs underline" href={`/rules/${f.ruleId}`}>Why</Link>
          </li>
        ))}
      </ul>
    </div>
  );
}
