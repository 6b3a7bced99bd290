"use client";
import { useFrame } from "@react-three/fiber";

declare global {
  interface Window {
    __bwFrames?: number;
  }
}

/** Counts drawn frames so tests can tell the canvas is alive. */
export function FrameCounter() {
  useFrame(() => {
    window.__bwFrames = (window.__bwFrames ?? 0) + 1;
  });
  return null;
}
