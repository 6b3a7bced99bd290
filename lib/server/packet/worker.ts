/**
 * The packet worker's entry: scripts/build-worker.ts bundles this file (our code only; packages stay
 * in node_modules) into an ES module in the build folder, which the packet pool loads in a worker
 * thread, so building a PDF never runs on the web process's main thread. Each named export is a task.
 */
import { buildPacket } from "./render";
import type { PacketInput } from "./types";

/** The build packet's PDF bytes. */
export async function packet(input: PacketInput): Promise<Uint8Array> {
  const buf = await buildPacket(input);
  return new Uint8Array(buf.buffer, buf.byteOffset, buf.byteLength);
}

/** Answers at once: a probe that the pool still serves. */
export function ping(): string {
  return "pong";
}

/** The plan view or a wall elevation as an SVG file, or null when there is no such drawing. */
export { drawingFile } from "./drawing-file";
