import "server-only";
import { EnginePool } from "../engine-pool/pool";
import { poolErrors } from "../engine-pool/pool";
import { ensureWorkerFile, PACKET_WORKER_FILE_NAME, workerFilePath } from "../engine-pool/worker-file";
import { logError } from "../log";
import type { PacketInput } from "./types";

/** Longest a packet may take, queue wait included, ms: the largest plan's packet takes seconds; this leaves room for a busy machine. */
export const PACKET_TIME_LIMIT_MS = 60_000;

const g = globalThis as unknown as { __bwPacketPool?: EnginePool };

/**
 * The process's packet pool: at most two threads (a PDF render is memory-hungry and the machine
 * has two cores), none kept when idle, a short queue, its own heap cap; started on first use.
 */
export function packetPool(): EnginePool {
  if (g.__bwPacketPool) return g.__bwPacketPool;
  let filename: string;
  try {
    filename = ensureWorkerFile(workerFilePath(PACKET_WORKER_FILE_NAME));
  } catch (e) {
    logError("packet worker bundle missing and could not be built", e);
    throw poolErrors.unavailable();
  }
  g.__bwPacketPool = new EnginePool({ filename, minThreads: 0, maxThreads: 2, maxQueue: 8, heapMb: 768 });
  return g.__bwPacketPool;
}

/** The build packet's PDF, rendered in the packet worker thread. */
export async function packetInWorker(input: PacketInput, opts: { signal?: AbortSignal; timeLimitMs?: number } = {}): Promise<Buffer> {
  const bytes = await packetPool().run<PacketInput, Uint8Array>("packet", input, { timeLimitMs: opts.timeLimitMs ?? PACKET_TIME_LIMIT_MS, signal: opts.signal, doing: "turn into a build packet" });
  return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}
