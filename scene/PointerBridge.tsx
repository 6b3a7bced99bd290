"use client";
import { useThree } from "@react-three/fiber";
import { useEffect } from "react";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import type { PointerInput } from "@/lib/client/tools/types";
import { useEditor } from "@/lib/client/react/EditorContext";
import { aim, canvasRect, onLevel, onWallPlane, pickHit, wallNear } from "./pick";
import { zoneUnderRay } from "./zone-hover";

/**
 * Turns pointer events on the canvas into tool events in plan coordinates. Listens in the capture
 * phase so a press on a fixture stops the camera controls before they start orbiting.
 */
export function PointerBridge() {
  const ed = useEditor();
  const gl = useThree((s) => s.gl);
  const camera = useThree((s) => s.camera);
  const scene = useThree((s) => s.scene);
  const controls = useThree((s) => s.controls) as OrbitControlsImpl | null;

  useEffect(() => {
    const el = gl.domElement;
    let grabZ = 0;
    // Where a press on empty space began (a click there, without a drag, clears the selection).
    let downAt: { x: number; y: number } | null = null;

    const roots = () => {
      const g = scene.getObjectByName("pickables");
      return g ? [g] : [];
    };

    const toInput = (e: PointerEvent, withHit: boolean): PointerInput | null => {
      const ray = aim(e, el, camera);
      const room = ed.derived.getState().derived?.room;
      const view = ed.ui.getState().view;
      const elevWall = ed.ui.getState().elevationWallId ?? room?.walls[0]?.id;
      const mods = { shift: e.shiftKey, mod: e.ctrlKey || e.metaKey, alt: e.altKey };
      const picked = withHit ? pickHit(ray, roots()) : null;
      let point: { x: number; y: number } | null = null;
      if (view === "elevation" && room && elevWall) point = onWallPlane(ray, room, elevWall);
      else point = onLevel(ray, withHit ? (picked?.hit.type === "fixture" ? picked.zMm : 0) : grabZ);
      if (!point) return null;
      let hit = picked?.hit ?? null;
      if (view === "elevation" && !hit && elevWall) hit = { type: "wall", wallId: elevWall };
      if (hit?.type === "floor" && room && ed.ui.getState().tool === "placing" && !e.altKey) hit = wallNear(room, point) ?? hit;
      if (picked?.hit.type === "fixture") grabZ = view === "elevation" ? 0 : picked.zMm;
      return { point: { x: point.x, y: point.y }, hit, ...mods };
    };

    // Zone hover: only while idle with no button held, at most once a frame, so drags never pay for it.
    let hoverFrame = 0;
    let hoverAt: { clientX: number; clientY: number } | null = null;
    const clearHover = () => {
      if (hoverFrame) cancelAnimationFrame(hoverFrame);
      hoverFrame = 0;
      hoverAt = null;
      if (ed.ui.getState().hoveredZone) ed.ui.setState({ hoveredZone: null });
    };
    const hover = () => {
      hoverFrame = 0;
      const at = hoverAt;
      if (!at || ed.ui.getState().tool !== "idle") return;
      const id = zoneUnderRay(aim(at, el, camera), scene.getObjectByName("zones"), ed.derived.getState().findings);
      const r = canvasRect(el);
      const prev = ed.ui.getState().hoveredZone;
      if (!id) {
        if (prev) ed.ui.setState({ hoveredZone: null });
        return;
      }
      const x = at.clientX - r.left;
      const y = at.clientY - r.top;
      if (prev?.id !== id || prev.x !== x || prev.y !== y) ed.ui.setState({ hoveredZone: { id, x, y, w: r.width, h: r.height } });
    };

    const setOrbit = (on: boolean) => {
      if (controls) controls.enabled = on;
    };

    const down = (e: PointerEvent) => {
      if (e.button !== 0) return;
      clearHover();
      const tool = ed.ui.getState().tool;
      const input = toInput(e, true);
      if (!input) return;
      downAt = null;
      if (tool === "idle" && input.hit?.type !== "fixture") {
        downAt = { x: e.clientX, y: e.clientY };
        return; // empty space: let the camera orbit; a click clears on release
      }
      setOrbit(false);
      try {
        el.setPointerCapture(e.pointerId);
      } catch {
        // Synthetic events (benchmarks) carry no live pointer to capture.
      }
      ed.tools.down(input);
      el.focus({ preventScroll: true });
    };

    const move = (e: PointerEvent) => {
      const tool = ed.ui.getState().tool;
      if (tool === "idle") {
        if (e.buttons !== 0) {
          clearHover();
          return;
        }
        hoverAt = { clientX: e.clientX, clientY: e.clientY };
        if (!hoverFrame) hoverFrame = requestAnimationFrame(hover);
        return;
      }
      if (hoverAt || ed.ui.getState().hoveredZone) clearHover();
      const input = toInput(e, tool === "placing");
      if (input) ed.tools.move(input);
    };

    const up = (e: PointerEvent) => {
      if (e.button !== 0) return;
      const input = toInput(e, false);
      if (downAt) {
        if (Math.hypot(e.clientX - downAt.x, e.clientY - downAt.y) < 4 && !e.shiftKey) ed.select([]);
      } else if (input) ed.tools.up(input);
      downAt = null;
      setOrbit(true);
      if (el.hasPointerCapture(e.pointerId)) el.releasePointerCapture(e.pointerId);
    };

    el.addEventListener("pointerdown", down, { capture: true });
    el.addEventListener("pointermove", move);
    el.addEventListener("pointerup", up);
    el.addEventListener("pointercancel", up);
    el.addEventListener("pointerleave", clearHover);
    // Zooming moves the view under a still pointer: the card would point at the wrong place.
    el.addEventListener("wheel", clearHover, { passive: true });
    return () => {
      clearHover();
      el.removeEventListener("pointerleave", clearHover);
      el.removeEventListener("wheel", clearHover);
      el.removeEventListener("pointerdown", down, { capture: true });
      el.removeEventListener("pointermove", move);
      el.removeEventListener("pointerup", up);
      el.removeEventListener("pointercancel", up);
    };
  }, [ed, gl, camera, scene, controls]);

  return null;
}
