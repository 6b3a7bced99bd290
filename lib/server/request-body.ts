import "server-only";
import { AppError } from "./errors";

const kB = (n: number) => `${Math.round(n / 1000)} kB`;
const tooLarge = (maxBytes: number) => new AppError(413, "too_large", `The body is larger than ${kB(maxBytes)}.`);

/** application/json or any application/*+json, with or without parameters (charset). */
export function isJsonContentType(value: string | null): boolean {
  if (!value) return false;
  const type = value.split(";")[0].trim().toLowerCase();
  return type === "application/json" || (type.startsWith("application/") && type.endsWith("+json"));
}

/**
 * Reads a request body as UTF-8 text, stopping as soon as it passes `maxBytes` (413), so an
 * oversized or endless chunked body is never held whole. Invalid UTF-8 answers 422 rather than
 * being silently replaced.
 */
export async function readBodyText(req: Request, maxBytes: number): Promise<string> {
  const declared = req.headers.get("content-length");
  if (declared !== null && Number(declared) > maxBytes) throw tooLarge(maxBytes);
  if (!req.body) return "";
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      void reader.cancel().catch(() => undefined);
      throw tooLarge(maxBytes);
    }
    chunks.push(value);
  }
  const bytes = Buffer.concat(chunks, total);
  try {
    return new TextDecoder("utf-8", { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    throw new AppError(422, "invalid_encoding", "The body is not valid UTF-8 text.");
  }
}
