"use client";
import { useMemo } from "react";
import type { Finding } from "@/lib/engine/checks/types";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDerived, useDoc, useUi } from "@/lib/client/react/useEditorState";
import { describeZone } from "./zone-info";
import { zoneStates } from "./zone-states";

const NONE: readonly Finding[] = [];
const stateCls = { conflict: "border-brick-500 bg-brick-100 text-brick-700", caution: "border-amberline-500 bg-amberline-100 text-amberline-700", clear: "border-pine-500 bg-pine-100 text-pine-700" } as const;
const stateMark = { conflict: "✕", caution: "!", clear: "✓" } as const;

/**
 * The card beside the pointer over a keep-clear zone: what it is, its size in the plan's units,
 * its state in words and the numbers of the checks naming it. A positioned div over the canvas,
 * so it never makes the 3D scene draw again.
 */
export function ZoneTooltip() {
  const ed = useEditor();
  const hover = useUi((s) => s.hoveredZone);
  // Subscribed only while a zone is hovered, so a drag (which never hovers) does not re-render the card.
  const hovering = hover !== null;
  const zones = useDerived((s) => (hovering ? (s.derived?.zones ?? null) : null));
  const findings = useDerived((s) => (hovering ? s.findings : NONE));
  // Re-format when the plan's units or precision change.
  const settings = useDoc((d) => d.settings);
  const zone = hover && zones ? zones.find((z) => z.id === hover.id) : undefined;
  const info = useMemo(() => {
    if (!zone) return null;
    const state = zoneStates(findings).get(zone.id) ?? "clear";
    return describeZone(zone, findings, state, (mm) => ed.engine.formatLength(mm, settings));
  }, [zone, findings, ed, settings]);
  if (!hover || !info) return null;
  // Keep the card inside the view: flip to the pointer's left or above near the far edges.
  const left = hover.x + 300 > hover.w ? Math.max(0, hover.x - 296) : hover.x + 16;
  const top = hover.y + 200 > hover.h ? Math.max(0, hover.y - 180) : hover.y + 16;
  return (
    <div role="tooltip" data-testid="zone-tooltip" data-zone={hover.id} data-state={info.state} className="pointer-events-none absolute z-20 w-72 rounded-md border border-walnut-300 bg-white/95 p-2 text-xs text-walnut-900 shadow-lg" style={{ left, top }}>
      <div className="flex items-start justify-between gap-2">
        <p className="font-semibold">{info.label}</p>
        <span className={`shrink-0 rounded border px-1 font-semibold ${stateCls[info.state]}`}>
          <span aria-hidden="true">{stateMark[info.state]} </span>
          {info.stateText}
        </span>
      </div>
      <p className="tabular-nums text-walnut-700" data-testid="zone-size">
        Keep-clear zone {info.size}
      </p>
      {info.findings.map((f, i) => (
        <div key={`${f.ruleId}-${i}`} className="mt-1 border-t border-walnut-100 pt-1" data-testid="zone-finding">
          {f.measured !== undefined || f.required !== undefined ? (
            <p className="tabular-nums">
              {f.measured !== undefined ? <>Measured <strong>{f.measured}</strong></> : null}
              {f.measured !== undefined && f.required !== undefined ? " · " : null}
              {f.required !== undefined ? <>needs <strong>{f.required}</strong></> : null}
            </p>
          ) : null}
          <p className="line-clamp-3 text-walnut-700">{f.message}</p>
        </div>
      ))}
    </div>
  );
}
