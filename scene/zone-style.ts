import { CanvasTexture, Color, DoubleSide, MeshBasicMaterial, RepeatWrapping } from "three";
import type { Finding } from "@/lib/engine/checks/types";

export type ZoneState = "conflict" | "caution" | "clear";

/** Colour and pattern per state: the pattern and the label carry the meaning without colour. */
export const zoneStyle: Record<ZoneState, { colour: string; pattern: "hatch" | "dots" | "plain"; label: string }> = {
  conflict: { colour: "#b5432c", pattern: "hatch", label: "Conflict" },
  caution: { colour: "#d99a1e", pattern: "dots", label: "Caution" },
  clear: { colour: "#2f7d4f", pattern: "plain", label: "Clear" },
};

/** Each zone's state from the failing findings that name it. */
export function zoneStates(findings: readonly Finding[]): Map<string, ZoneState> {
  const out = new Map<string, ZoneState>();
  for (const f of findings) {
    if (f.pass) continue;
    const st: ZoneState = f.severity === "conflict" ? "conflict" : "caution";
    for (const z of f.zoneIds) if (out.get(z) !== "conflict") out.set(z, st);
  }
  return out;
}

function patternTexture(kind: "hatch" | "dots"): CanvasTexture | null {
  if (typeof document === "undefined") return null;
  const c = document.createElement("canvas");
  c.width = c.height = 32;
  const g = c.getContext("2d");
  if (!g) return null;
  g.fillStyle = "#ffffff";
  g.globalAlpha = 0.35;
  g.fillRect(0, 0, 32, 32);
  g.globalAlpha = 1;
  if (kind === "hatch") {
    g.strokeStyle = "#ffffff";
    g.lineWidth = 6;
    g.beginPath();
    g.moveTo(-8, 40);
    g.lineTo(40, -8);
    g.stroke();
  } else {
    g.fillStyle = "#ffffff";
    g.beginPath();
    g.arc(16, 16, 6, 0, Math.PI * 2);
    g.fill();
  }
  const t = new CanvasTexture(c);
  t.wrapS = t.wrapT = RepeatWrapping;
  // Extruded geometry carries uv in mm: one tile every 150 mm.
  t.repeat.set(1 / 150, 1 / 150);
  return t;
}

const materials = new Map<ZoneState, MeshBasicMaterial>();

/** One translucent material per state, patterned for conflict and caution. */
export function zoneMaterial(state: ZoneState): MeshBasicMaterial {
  let m = materials.get(state);
  if (!m) {
    const st = zoneStyle[state];
    const map = st.pattern === "plain" ? null : patternTexture(st.pattern);
    m = new MeshBasicMaterial({ color: new Color(st.colour), transparent: true, opacity: state === "clear" ? 0.18 : 0.4, depthWrite: false, side: DoubleSide, map });
    materials.set(state, m);
  }
  return m;
}
