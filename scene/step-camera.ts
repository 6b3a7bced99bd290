/** A walk-through step's saved view: room millimetres in the y-up convention of the step schema (x along the floor, y up, z across). */
export interface StepCameraMm {
  position: [number, number, number];
  target: [number, number, number];
}

const M = 0.001;

/** A saved point as this scene's coordinates: z up, metres; "across" is the plan's y (mm to m). */
export function stepPointToScene(p: readonly [number, number, number]): [number, number, number] {
  return [p[0] * M, p[2] * M, p[1] * M];
}

/** Smoothstep easing for the move to a saved view, 0..1. */
export function ease(k: number): number {
  const t = Math.min(1, Math.max(0, k));
  return t * t * (3 - 2 * t);
}
