import type { Vec2 } from "@/lib/engine/geometry/types";
import type { Editor } from "../editor";

/** What the pointer is over, as the view reports it. */
export type Hit = { type: "fixture"; id: string } | { type: "wall"; wallId: string } | { type: "floor" };

/** A pointer event in plan coordinates: the floor point under the pointer, mm. */
export interface PointerInput {
  point: Vec2;
  hit: Hit | null;
  shift?: boolean;
  /** Ctrl or Cmd. */
  mod?: boolean;
  /** Alt turns snapping off while held. */
  alt?: boolean;
}

/** One state of a tool. Each returns nothing; it moves the controller on with `ed.tools.go(...)`. */
export interface ToolState {
  readonly id: string;
  enter?(ed: Editor): void;
  exit?(ed: Editor): void;
  down?(ed: Editor, input: PointerInput): void;
  move?(ed: Editor, input: PointerInput): void;
  up?(ed: Editor, input: PointerInput): void;
  /** Escape, or the pointer lost. */
  cancel?(ed: Editor): void;
}
