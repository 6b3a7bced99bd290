import { Plane, Raycaster, Vector2, Vector3, type Camera, type Object3D } from "three";
import type { SolvedRoom } from "@/lib/engine/room/types";
import type { Hit } from "@/lib/client/tools/types";
import { nearestWall } from "@/lib/engine/room/wall-frame";
import { M } from "./units";

const raycaster = new Raycaster();
const ndc = new Vector2();
const hitPoint = new Vector3();

/**
 * The element's box on screen, kept between pointer moves: reading it after React changed the DOM
 * forces a layout of the whole page, which cost several ms a drag step. Dropped when the element
 * resizes, the window scrolls or resizes, and at each press or entry of the pointer.
 */
let rectVersion = 0;
const rects = new WeakMap<HTMLElement, { rect: DOMRect; version: number }>();
const watched = new WeakSet<HTMLElement>();
let listening = false;

export function canvasRect(el: HTMLElement): DOMRect {
  const hit = rects.get(el);
  if (hit && hit.version === rectVersion) return hit.rect;
  if (!listening && typeof window !== "undefined") {
    listening = true;
    const bump = () => rectVersion++;
    for (const type of ["scroll", "resize", "pointerdown", "pointerover"]) window.addEventListener(type, bump, { capture: true, passive: true });
  }
  if (!watched.has(el) && typeof ResizeObserver !== "undefined") {
    watched.add(el);
    new ResizeObserver(() => rectVersion++).observe(el);
  }
  const rect = el.getBoundingClientRect();
  rects.set(el, { rect, version: rectVersion });
  return rect;
}

/** Sets the ray from a pointer position on the canvas element. */
export function aim(e: { clientX: number; clientY: number }, el: HTMLElement, camera: Camera): Raycaster {
  const r = canvasRect(el);
  ndc.set(((e.clientX - r.left) / r.width) * 2 - 1, -((e.clientY - r.top) / r.height) * 2 + 1);
  raycaster.setFromCamera(ndc, camera);
  return raycaster;
}

/** The first pickable thing under the ray, and the world point where it was hit (mm). */
export function pickHit(ray: Raycaster, roots: readonly Object3D[]): { hit: Hit; zMm: number; point: Vector3 } | null {
  const hits = ray.intersectObjects(roots as Object3D[], true);
  for (const h of hits) {
    const u = h.object.userData as { pick?: string; owners?: string[]; wallId?: string };
    const zMm = h.point.z / M;
    const point = h.point.clone().divideScalar(M);
    if (u.pick === "fixture" && h.instanceId !== undefined && u.owners) return { hit: { type: "fixture", id: u.owners[h.instanceId] }, zMm, point };
    if (u.pick === "wall" && u.wallId) return { hit: { type: "wall", wallId: u.wallId }, zMm, point };
    if (u.pick === "floor") return { hit: { type: "floor" }, zMm, point };
  }
  return null;
}

/** Where the ray meets a horizontal plane at height zMm, in mm (null when parallel). */
export function onLevel(ray: Raycaster, zMm: number): { x: number; y: number } | null {
  const plane = new Plane(new Vector3(0, 0, 1), -zMm * M);
  const p = ray.ray.intersectPlane(plane, hitPoint);
  return p ? { x: p.x / M, y: p.y / M } : null;
}

/** Where the ray meets a wall's vertical plane, as a floor point on the wall line (mm) and a height. */
export function onWallPlane(ray: Raycaster, room: SolvedRoom, wallId: string): { x: number; y: number; z: number } | null {
  const w = room.walls.find((x) => x.id === wallId);
  if (!w) return null;
  const plane = new Plane().setFromNormalAndCoplanarPoint(new Vector3(w.inward.x, w.inward.y, 0), new Vector3(w.start.x * M, w.start.y * M, 0));
  const p = ray.ray.intersectPlane(plane, hitPoint);
  return p ? { x: p.x / M, y: p.y / M, z: p.z / M } : null;
}

/** Treat a floor hit close to a wall as a wall hit (placing against walls from above). */
export function wallNear(room: SolvedRoom, p: { x: number; y: number }, withinMm = 350): Hit | null {
  const w = nearestWall(room.walls, p, withinMm);
  return w ? { type: "wall", wallId: w.id } : null;
}
