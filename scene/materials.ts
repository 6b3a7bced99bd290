import { Color, MeshStandardMaterial } from "three";

/** Colours by what a box is (LocalBox.role); our own palette of shop materials. */
const roleColours: Record<string, string> = {
  carcass: "#c9a77c",
  "toe-kick": "#5c4632",
  platform: "#5c4632",
  counter: "#6d6358",
  countertop: "#6d6358",
  "drawer-front": "#dcc29b",
  door: "#dcc29b",
  "face-frame": "#b68d5d",
  shelf: "#d2b48c",
  tool: "#5b6b7d",
  track: "#9aa5b1",
  stop: "#d99a1e",
  bench: "#b68d5d",
  cleat: "#a88256",
  pegboard: "#c8b28a",
  rack: "#8a6a48",
};

const cache = new Map<string, MeshStandardMaterial>();

/** One shared material per role, so fixtures of a kind batch together. */
export function materialFor(role: string): MeshStandardMaterial {
  let m = cache.get(role);
  if (!m) {
    m = new MeshStandardMaterial({ color: new Color(roleColours[role] ?? "#bfa27e"), roughness: 0.85, metalness: role === "tool" || role === "track" ? 0.3 : 0 });
    cache.set(role, m);
  }
  return m;
}
