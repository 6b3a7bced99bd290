"use client";
import { useThree } from "@react-three/fiber";
import { useEffect } from "react";
import { Vector3 } from "three";
import { M } from "./units";

declare global {
  interface Window {
    /** Screen position (page pixels) of a world point in mm: lets browser tests press on a fixture. */
    __bwScreen?: (p: { x: number; y: number; z: number }) => { x: number; y: number };
  }
}

/** Exposes the projection of world points to page pixels for end-to-end tests and benchmarks. */
export function TestHooks() {
  const camera = useThree((s) => s.camera);
  const gl = useThree((s) => s.gl);
  useEffect(() => {
    window.__bwScreen = (p) => {
      const v = new Vector3(p.x * M, p.y * M, p.z * M).project(camera);
      const r = gl.domElement.getBoundingClientRect();
      return { x: r.left + ((v.x + 1) / 2) * r.width, y: r.top + ((1 - v.y) / 2) * r.height };
    };
  }, [camera, gl]);
  return null;
}
