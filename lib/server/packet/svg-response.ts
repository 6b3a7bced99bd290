import { NextResponse } from "next/server";

/** An SVG drawing as a download; a sandboxing policy in case a browser opens it in place (it holds plan text). */
export function svgResponse(file: { filename: string; svg: string }): Response {
  return new NextResponse(file.svg, {
    headers: {
      "content-type": "image/svg+xml; charset=utf-8",
      "content-disposition": `attachment; filename="${file.filename}"`,
      "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'; sandbox",
      "x-content-type-options": "nosniff",
      "cache-control": "private, no-store",
    },
  });
}
