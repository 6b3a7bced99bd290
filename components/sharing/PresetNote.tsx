import type { PlanDocument } from "@/lib/engine/plan/schema";
import { formatLength } from "@/lib/engine/units/format-length";

export interface PresetInfo {
  name: string;
  ownerName: string;
  numbers: Record<string, number>;
}

/** Names the class preset a plan follows and the numbers it sets, so readers know which limits the checks use. */
export function PresetNote({ preset, document }: { preset: PresetInfo | null; document: PlanDocument }) {
  if (!preset) return null;
  const fmt = (k: string, v: number) => (k.endsWith("Mm") ? formatLength(v, { units: document.settings.units, precision: document.settings.precision }) : String(v));
  return (
    <section className="rounded-lg border border-amberline-500 bg-amberline-100 p-3 text-sm text-walnut-900" aria-label="Rule preset">
      <p className="font-medium">
        Checks use the preset “{preset.name}” by {preset.ownerName}.
      </p>
      <ul className="mt-1 flex flex-wrap gap-x-4 gap-y-1">
        {Object.entries(preset.numbers).map(([k, v]) => (
          <li key={k}>
            <span className="text-walnut-500">{k.replace(/Mm$/, "").replace(/([A-Z])/g, " $1").toLowerCase()}:</span> {fmt(k, v)}
          </li>
        ))}
      </ul>
    </section>
  );
}
