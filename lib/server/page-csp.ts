/**
 * The Content-Security-Policy of the app's pages. Pure (no server imports): proxy.ts builds it with
 * a fresh nonce per request. The headers every answer carries (and the API's policy) are static and
 * live in next.config.mjs.
 *
 * What the pages need, measured in Chromium against a production build: Next's bootstrap and
 * flight-data scripts are inline (allowed by the nonce Next copies from this header onto them; the
 * chunks they load inherit trust through 'strict-dynamic'); the sheet-nesting worker is a script
 * of our own origin; wall photos load from and upload to the object storage's origin; fonts are
 * served from /fonts. Inline style attributes come from React and the 3D view's labels.
 */

export interface PagePolicyInput {
  nonce: string;
  /** The object storage's origin (photos are read from and uploaded to it), if any. */
  storageOrigin?: string | null;
  /** Development builds evaluate code for error overlays. */
  dev?: boolean;
  /** Served over https: ask the browser to upgrade any plain-http subresource. */
  https?: boolean;
}

/** The storage origin the browser talks to: S3_ENDPOINT's origin, or the hosted bucket's. */
export function storageOrigin(env: Record<string, string | undefined>): string | null {
  if (env.S3_ENDPOINT) {
    try {
      return new URL(env.S3_ENDPOINT).origin;
    } catch {
      return null;
    }
  }
  const bucket = env.S3_BUCKET ?? "benchwright-uploads";
  const region = env.S3_REGION ?? "us-east-1";
  return `https://${bucket}.s3.${region}.amazonaws.com`;
}

/** The page policy as one header value. */
export function pagePolicy({ nonce, storageOrigin, dev = false, https = false }: PagePolicyInput): string {
  const storage = storageOrigin ? ` ${storageOrigin}` : "";
  const directives = [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    `img-src 'self' data: blob:${storage}`,
    "font-src 'self'",
    `connect-src 'self'${storage}`,
    "worker-src 'self' blob:",
    "manifest-src 'self'",
    "media-src 'self'",
    "object-src 'none'",
    "frame-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    ...(https ? ["upgrade-insecure-requests"] : []),
  ];
  return directives.join("; ");
}
