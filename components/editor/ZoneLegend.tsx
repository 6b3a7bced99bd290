"use client";
import { zoneStyle, type ZoneState } from "@/scene/zone-states";

const swatch: Record<ZoneState, string> = {
  conflict: "repeating-linear-gradient(45deg, #b5432c 0 4px, #f8dcd5 4px 8px)",
  caution: "radial-gradient(circle, #d99a1e 2px, #fdf0cf 2.5px) 0 0 / 8px 8px",
  clear: "#dcefe2",
};

/** What the zone colours and patterns mean, readable without colour: each has a pattern and a word. */
export function ZoneLegend() {
  return (
    <ul aria-label="Keep-clear zone legend" className="flex flex-wrap gap-3 text-xs text-walnut-900">
      {(Object.keys(zoneStyle) as ZoneState[]).map((s) => (
        <li key={s} className="flex items-center gap-1">
          <span className="inline-block h-3 w-5 rounded-sm border border-walnut-300" style={{ background: swatch[s] }} aria-hidden="true" />
          {zoneStyle[s].label}
          <span className="text-walnut-500">({zoneStyle[s].pattern === "hatch" ? "hatched" : zoneStyle[s].pattern === "dots" ? "dotted" : "plain"})</span>
        </li>
      ))}
    </ul>
  );
}
