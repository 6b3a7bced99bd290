import { NextResponse } from "next/server";
import type { PacketFile } from "../services/packet";

/** The packet as a download: private, never stored by caches (the server keeps the finished file while the plan is unchanged). */
export function packetResponse(file: PacketFile, extra: Record<string, string> = {}): Response {
  return new NextResponse(new Uint8Array(file.pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${file.filename}"`,
      "cache-control": "private, no-store",
      "x-packet-tag": file.tag,
      "x-packet-cache": file.cached ? "hit" : "miss",
      ...extra,
    },
  });
}
