import type { Severity } from "@/lib/engine/checks/types";

const STYLE: Record<Severity, { text: string; cls: string }> = {
  conflict: { text: "Conflict", cls: "bg-walnut-700 text-paper" },
  caution: { text: "Caution", cls: "bg-amberline-100 text-amberline-700 border border-amberline-500" },
  advice: { text: "Advice", cls: "bg-pine-100 text-pine-700" },
};

/** How serious a rule's findings are, as a small label (text, not colour alone). */
export function SeverityBadge({ severity }: { severity: Severity }) {
  const s = STYLE[severity];
  return <span className={`inline-block rounded px-2 py-0.5 text-xs font-semibold uppercase tracking-wide ${s.cls}`}>{s.text}</span>;
}
