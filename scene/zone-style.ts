export { zoneStates, zoneStyle, type ZoneState } from "./zone-states";
import { CanvasTexture, Color, DoubleSide, MeshBasicMaterial, RepeatWrapping } from "three";
import { zoneStyle, type ZoneState } from "./zone-states";

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

const materials = new Map<string, MeshBasicMaterial>();

/** One translucent material per state (and a faint one for large clear room zones, a stronger one under the pointer), patterned for conflict and caution. */
export function zoneMaterial(state: ZoneState, faint = false, hovered = false): MeshBasicMaterial {
  const key = `${state}:${faint}:${hovered}`;
  let m = materials.get(key);
  if (!m) {
    const st = zoneStyle[state];
    const map = st.pattern === "plain" ? null : patternTexture(st.pattern);
    m = new MeshBasicMaterial({ color: new Color(st.colour), transparent: true, opacity: hovered ? 0.6 : faint ? 0.06 : state === "clear" ? 0.18 : 0.4, depthWrite: false, side: DoubleSide, map });
    materials.set(key, m);
  }
  return m;
}
