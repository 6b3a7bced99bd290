import { createHash } from "node:crypto";

/** Most bytes of finished packets kept in memory per process. */
const MAX_BYTES = 64 * 1024 * 1024;

interface Entry {
  key: string;
  pdf: Buffer;
}

/**
 * Finished packets by the hash of everything they are made from (document, revision, names, prices,
 * QR target), so downloading again while the plan is unchanged sends the same file without
 * rebuilding it; two requests for the same packet at once share one build. Oldest out first.
 */
export class PacketCache {
  private readonly done = new Map<string, Entry>();
  private readonly running = new Map<string, Promise<Buffer>>();
  private bytes = 0;

  constructor(private readonly maxBytes = MAX_BYTES) {}

  /** The packet for `key`, from memory or from `build` (whose result is kept). */
  async get(key: string, build: () => Promise<Buffer>): Promise<Buffer> {
    const hit = this.done.get(key);
    if (hit) {
      // Refresh its place: the most recently used go last.
      this.done.delete(key);
      this.done.set(key, hit);
      return hit.pdf;
    }
    const run = this.running.get(key);
    if (run) return run;
    const p = build().then((pdf) => {
      this.put(key, pdf);
      return pdf;
    });
    this.running.set(key, p);
    try {
      return await p;
    } finally {
      this.running.delete(key);
    }
  }

  has(key: string): boolean {
    return this.done.has(key);
  }

  private put(key: string, pdf: Buffer): void {
    if (pdf.length > this.maxBytes) return;
    this.done.set(key, { key, pdf });
    this.bytes += pdf.length;
    for (const [k, e] of this.done) {
      if (this.bytes <= this.maxBytes) break;
      this.done.delete(k);
      this.bytes -= e.pdf.length;
    }
  }
}

/** A key for a packet's inputs: SHA-256 of their JSON, hex (also the download's ETag). */
export function packetKey(input: unknown): string {
  return createHash("sha256").update(JSON.stringify(input)).digest("hex").slice(0, 32);
}
