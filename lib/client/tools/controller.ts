import type { Editor } from "../editor";
import { createIdle } from "./idle";
import type { PointerInput, ToolState } from "./types";

/** Runs the active tool state; the view feeds it pointer events in plan coordinates. */
export class ToolController {
  private state: ToolState;

  constructor(private readonly ed: Editor) {
    this.state = createIdle();
  }

  get current(): ToolState {
    return this.state;
  }

  go(next: ToolState): void {
    this.state.exit?.(this.ed);
    this.state = next;
    this.ed.ui.setState({ tool: next.id });
    next.enter?.(this.ed);
  }

  down(input: PointerInput): void {
    this.state.down?.(this.ed, input);
  }

  move(input: PointerInput): void {
    this.state.move?.(this.ed, input);
  }

  up(input: PointerInput): void {
    this.state.up?.(this.ed, input);
  }

  /** Escape: the state cancels (a drag springs back); idle clears the selection. */
  cancel(): void {
    if (this.state.cancel) this.state.cancel(this.ed);
    else this.go(createIdle());
  }
}
