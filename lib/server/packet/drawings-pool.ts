import "server-only";
import type { DrawingFile, DrawingFileInput } from "./drawing-file";
import { packetPool } from "./pool";

/** A drawing as an SVG file, made in the packet worker (React renders the same SVG mapping the pages use). */
export function drawingFileInWorker(input: DrawingFileInput, opts: { signal?: AbortSignal } = {}): Promise<DrawingFile | null> {
  return packetPool().run("drawingFile", input, { timeLimitMs: 20_000, signal: opts.signal, doing: "draw" });
}
