import sharp from "sharp";

/** Upload limits: 12 MB a file, 50 megapixels (a phone photo is 12-48 MP). Our own limits. */
export const MAX_UPLOAD_BYTES = 12 * 1024 * 1024;
export const MAX_PIXELS = 50_000_000;
/** The clean copy is at most this many pixels on its long side: plenty to trace a wall. */
export const CLEAN_LONG_SIDE_PX = 4096;
export const ACCEPTED_TYPES = ["image/jpeg", "image/png", "image/webp"] as const;
export type AcceptedType = (typeof ACCEPTED_TYPES)[number];

/** The image type by its first bytes (never by name or declared type), or null. */
export function sniffImageType(buf: Buffer): AcceptedType | null {
  if (buf.length >= 3 && buf[0] === 0xff && buf[1] === 0xd8 && buf[2] === 0xff) return "image/jpeg";
  if (buf.length >= 8 && buf.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return "image/png";
  if (buf.length >= 12 && buf.toString("ascii", 0, 4) === "RIFF" && buf.toString("ascii", 8, 12) === "WEBP") return "image/webp";
  return null;
}

export interface CleanImage {
  data: Buffer;
  contentType: "image/jpeg";
  widthPx: number;
  heightPx: number;
}

/**
 * Decodes and re-encodes as a fresh JPEG. sharp writes no metadata unless asked (no EXIF, GPS,
 * XMP, IPTC or ICC); the pixels are turned upright first so dropping the orientation tag is safe.
 */
export async function reencode(buf: Buffer): Promise<CleanImage> {
  const out = await sharp(buf, { limitInputPixels: MAX_PIXELS, failOn: "error" })
    .rotate()
    .resize({ width: CLEAN_LONG_SIDE_PX, height: CLEAN_LONG_SIDE_PX, fit: "inside", withoutEnlargement: true })
    .flatten({ background: "#ffffff" })
    .jpeg({ quality: 85 })
    .toBuffer({ resolveWithObject: true });
  return { data: out.data, contentType: "image/jpeg", widthPx: out.info.width, heightPx: out.info.height };
}
