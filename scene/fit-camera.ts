import { OrthographicCamera, PerspectiveCamera, Vector3, type Camera } from "three";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import type { Derived } from "@/lib/engine/derive-types";
import type { PlacedFixture } from "@/lib/engine/fixtures/types";
import type { ViewMode } from "@/lib/client/store/ui-store";
import { boundsOf, roomDepthFrom } from "./frame";
import { M } from "./units";

/** Room an elevation leaves around the wall for its dimension strings, CSS px: the rows under the floor, the levels at the left, the heights at the right. */
const ELEVATION_MARGIN_PX = { bottom: 230, top: 24, left: 110, right: 70 };

/** Points the camera at the room (or the given fixtures) for the view, and fits it to the canvas size in pixels. */
export function fitCamera(camera: Camera, controls: OrbitControlsImpl, d: Derived, view: ViewMode, wallId: string | null, bodies: readonly PlacedFixture[], size: { width: number; height: number }, dimensions = false): boolean {
  const pts = bodies.length ? bodies.flatMap((f) => f.body.polygon) : d.room.corners;
  const top = bodies.length ? Math.max(...bodies.map((f) => f.body.zMax)) : d.room.ceilingHeightMm;
  const b = boundsOf(pts, top);
  const c = new Vector3(((b.minX + b.maxX) / 2) * M, ((b.minY + b.maxY) / 2) * M, 0);
  const w = Math.max(0.5, (b.maxX - b.minX) * M);
  const h = Math.max(0.5, (b.maxY - b.minY) * M);
  const r = Math.max(w, h, b.maxZ * M);
  if (view === "orbit" && camera instanceof PerspectiveCamera) {
    c.z = (b.maxZ * M) / 3;
    camera.position.set(c.x - r * 0.55, c.y - r * 1.25, c.z + r * 0.95);
  } else if (view === "plan" && camera instanceof OrthographicCamera) {
    camera.position.set(c.x, c.y, 50);
    camera.zoom = Math.min(size.width / (w * 1.25 + 0.9), size.height / (h * 1.25 + 0.9));
  } else if (view === "elevation" && camera instanceof OrthographicCamera) {
    const wall = d.room.walls.find((x) => x.id === wallId) ?? d.room.walls[0];
    const mid = { x: (wall.start.x + wall.end.x) / 2, y: (wall.start.y + wall.end.y) / 2 };
    // Stand inside the room, short of the far side, so its fixtures do not block the view.
    const back = Math.max(1000, roomDepthFrom(wall, d.room.corners) - 700);
    const zMid = (d.room.ceilingHeightMm * M) / 2;
    c.set(mid.x * M, mid.y * M, zMid);
    camera.position.set((mid.x + wall.inward.x * back) * M, (mid.y + wall.inward.y * back) * M, zMid);
    camera.zoom = Math.min(size.width / (wall.lengthMm * M * 1.15 + 0.6), size.height / (d.room.ceilingHeightMm * M * 1.15 + 0.6));
    if (dimensions && !bodies.length) {
      // Leave the dimension strings room and set the wall in what is left.
      const m = ELEVATION_MARGIN_PX;
      const w = Math.max(80, size.width - m.left - m.right);
      const h = Math.max(80, size.height - m.bottom - m.top);
      camera.zoom = Math.min(w / (wall.lengthMm * M * 1.04), h / (d.room.ceilingHeightMm * M * 1.04));
      // The wall's centre sits right of and above the canvas centre: the camera looks left of it (along the wall's direction, the viewer's left) and below.
      const right = (m.left - m.right) / 2 / camera.zoom;
      c.set(c.x + wall.dir.x * right, c.y + wall.dir.y * right, zMid - (m.bottom - m.top) / 2 / camera.zoom);
      camera.position.set((mid.x + wall.inward.x * back) * M + wall.dir.x * right, (mid.y + wall.inward.y * back) * M + wall.dir.y * right, c.z);
    }
  } else return false;
  if (camera instanceof PerspectiveCamera || camera instanceof OrthographicCamera) camera.updateProjectionMatrix();
  controls.target.copy(c);
  camera.lookAt(c);
  controls.update();
  return true;
}
