"use client";
import { useFrame, useThree } from "@react-three/fiber";
import { useEffect } from "react";

declare global {
  interface Window {
    __bwFrames?: number;
  }
}

/** Counts drawn frames so tests can tell the canvas is alive; draws a few frames at start (the canvas draws on demand). */
export function FrameCounter() {
  const invalidate = useThree((s) => s.invalidate);
  useFrame(() => {
    window.__bwFrames = (window.__bwFrames ?? 0) + 1;
  });
  useEffect(() => {
    let n = 0;
    let raf = 0;
    const tick = () => {
      invalidate();
      if (++n < 10) raf = requestAnimationFrame(tick);
    };
    raf = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(raf);
  }, [invalidate]);
  return null;
}
