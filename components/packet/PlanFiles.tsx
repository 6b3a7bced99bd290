"use client";

import { wallName } from "@/lib/engine/drawings/names";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { PacketButton } from "./PacketButton";

const chip = "rounded border border-walnut-300 px-2 py-0.5 text-xs text-walnut-900 hover:bg-walnut-100";

/**
 * The plan's files from the editor: the build packet (PDF), the plan itself in Benchwright's
 * format, and the plan view and wall elevations as SVG. They are made from the saved plan, which the
 * autosave keeps up to date.
 */
export function PlanFiles({ planId, walls }: { planId: string; walls: PlanDocument["room"]["walls"] }) {
  const base = `/api/v1/plans/${planId}`;
  return (
    <div className="flex flex-wrap items-center gap-2">
      <PacketButton href={`${base}/packet.pdf`} />
      <a href={`${base}/export`} download className={chip} data-testid="export-plan">
        Export plan
      </a>
      <details className="relative">
        <summary className={`${chip} cursor-pointer list-none`}>Drawings (SVG)</summary>
        <ul className="absolute z-20 mt-1 min-w-48 rounded-md border border-walnut-100 bg-white p-1 text-sm shadow">
          <li>
            <a href={`${base}/drawings/plan.svg`} download className="block rounded px-2 py-1 hover:bg-walnut-100">
              Plan view
            </a>
          </li>
          {walls.map((w, i) => (
            <li key={w.id}>
              <a href={`${base}/drawings/walls/${w.id}.svg`} download className="block rounded px-2 py-1 hover:bg-walnut-100">
                Elevation: {wallName(w.label, i)}
              </a>
            </li>
          ))}
        </ul>
      </details>
    </div>
  );
}
