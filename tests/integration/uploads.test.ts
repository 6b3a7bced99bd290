import { describe, it, expect, beforeAll } from "vitest";
import sharp from "sharp";
import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import { hasServer } from "./helpers/client";
import { hasGpsPointer } from "./helpers/exif";
import { cast, planWithRoles, type Cast } from "./helpers/sharing";

// The server's limit (lib/server/services/image-check.ts): 12 MB, our own choice.
const MAX_BYTES = 12 * 1024 * 1024;

async function upload(c: Cast["editor"]["client"], planId: string, data: Buffer, contentType = "image/jpeg", bytes = data.length) {
  const start = await c.post(`/api/v1/plans/${planId}/photos`, { wallId: "north", contentType, bytes });
  if (start.status !== 201) return { start, confirm: null };
  const put = await fetch(start.body.upload.url, { method: "PUT", body: new Uint8Array(data), headers: start.body.upload.headers });
  expect(put.status).toBe(200);
  const confirm = await c.post(`/api/v1/plans/${planId}/photos/${start.body.photo.id}/confirm`);
  return { start, confirm };
}

describe.skipIf(!hasServer)("wall photo uploads: presigned PUT, checked by content, re-encoded without metadata", () => {
  let c: Cast;
  let planId: string;
  beforeAll(async () => {
    c = await cast();
    planId = await planWithRoles(c, "Photo wall");
  });

  it("strips EXIF including GPS from a JPEG, keeps only the clean copy and scales by two points", async () => {
    const input = await sharp({ create: { width: 1200, height: 800, channels: 3, background: "#8a6f4e" } })
      .jpeg()
      .withExif({ IFD0: { Make: "ShopCam", Artist: "Someone" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "45/1 30/1 0/1", GPSLongitudeRef: "W", GPSLongitude: "122/1 40/1 0/1" } })
      .toBuffer();
    // The fixture really carries a GPS block, so the test can fail.
    expect(hasGpsPointer((await sharp(input).metadata()).exif)).toBe(true);

    const { confirm } = await upload(c.editor.client, planId, input);
    expect(confirm?.status).toBe(200);
    const photo = confirm!.body.photo;
    expect(photo).toMatchObject({ status: "ready", widthPx: 1200, heightPx: 800, wallId: "north" });

    // A viewer sees the clean copy; it has no EXIF, XMP, IPTC or ICC block at all.
    const list = await c.viewer.client.get(`/api/v1/plans/${planId}/photos`);
    const seen = list.body.photos.find((p: { id: string }) => p.id === photo.id);
    const stored = Buffer.from(await (await fetch(seen.url)).arrayBuffer());
    const meta = await sharp(stored).metadata();
    expect(meta.format).toBe("jpeg");
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect(meta.iptc).toBeUndefined();
    expect(hasGpsPointer(meta.exif)).toBe(false);
    expect(stored.includes(Buffer.from("ShopCam"))).toBe(false);

    // The raw upload is gone from storage: only photos/<plan>/<photo>.jpg remains.
    const s3 = new S3Client({ region: "us-east-1", endpoint: process.env.S3_ENDPOINT, forcePathStyle: true, credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" } });
    const incoming = await s3.send(new ListObjectsV2Command({ Bucket: process.env.S3_BUCKET ?? "benchwright-uploads", Prefix: `incoming/${planId}/` }));
    expect(incoming.KeyCount ?? 0).toBe(0);

    // Scale: two points 600 px apart marked as 2438.4 mm (8 ft) gives 4.064 mm per pixel.
    const scaled = await c.editor.client.patch(`/api/v1/plans/${planId}/photos/${photo.id}`, { scale: { ax: 100, ay: 400, bx: 700, by: 400, distanceMm: 2438.4 } });
    expect(scaled.status).toBe(200);
    expect(scaled.body.photo.mmPerPx).toBeCloseTo(4.064, 6);
    expect((await c.viewer.client.patch(`/api/v1/plans/${planId}/photos/${photo.id}`, { scale: null })).status).toBe(403);
    expect((await c.editor.client.patch(`/api/v1/plans/${planId}/photos/${photo.id}`, { scale: { ax: 100, ay: 400, bx: 9000, by: 400, distanceMm: 100 } })).status).toBe(422);
  });

  it("refuses a file that is not an image even when named and declared as a JPEG", async () => {
    const fake = Buffer.from("%PDF-1.7\n% not a picture of a wall\n".repeat(50));
    const { confirm } = await upload(c.editor.client, planId, fake, "image/jpeg");
    expect(confirm?.status).toBe(422);
    expect(confirm?.body.error.fields.file).toMatch(/not a JPEG, PNG or WebP/);
    // Refused uploads never appear in the list.
    const list = await c.owner.client.get(`/api/v1/plans/${planId}/photos`);
    expect(list.body.photos.every((p: { status: string }) => p.status === "ready")).toBe(true);
  });

  it("refuses an oversized file: declared too large, or uploaded larger than declared", async () => {
    const declared = await c.editor.client.post(`/api/v1/plans/${planId}/photos`, { wallId: "north", contentType: "image/jpeg", bytes: MAX_BYTES + 1 });
    expect(declared.status).toBe(422);
    expect(declared.body.error.fields.bytes).toMatch(/12 MB/);

    // A lying client: declares 1 kB, sends 12 MB + 1 byte of JPEG-looking bytes.
    const big = Buffer.alloc(MAX_BYTES + 1, 0x20);
    big[0] = 0xff;
    big[1] = 0xd8;
    big[2] = 0xff;
    const { confirm } = await upload(c.editor.client, planId, big, "image/jpeg", 1000);
    expect(confirm?.status).toBe(422);
    expect(confirm?.body.error.fields.file).toMatch(/at most 12 MB/);
  });

  it("refuses an unknown wall and a non-image type; viewers cannot upload", async () => {
    expect((await c.editor.client.post(`/api/v1/plans/${planId}/photos`, { wallId: "nope", contentType: "image/jpeg", bytes: 10 })).status).toBe(422);
    expect((await c.editor.client.post(`/api/v1/plans/${planId}/photos`, { wallId: "north", contentType: "image/svg+xml", bytes: 10 })).status).toBe(422);
    expect((await c.viewer.client.post(`/api/v1/plans/${planId}/photos`, { wallId: "north", contentType: "image/jpeg", bytes: 10 })).status).toBe(403);
    expect((await c.stranger.client.get(`/api/v1/plans/${planId}/photos`)).status).toBe(404);
  });

  it("re-encodes a PNG to a clean JPEG", async () => {
    const png = await sharp({ create: { width: 300, height: 200, channels: 4, background: { r: 10, g: 120, b: 90, alpha: 0.5 } } }).png().toBuffer();
    const { confirm } = await upload(c.owner.client, planId, png, "image/png");
    expect(confirm?.body.photo).toMatchObject({ status: "ready", widthPx: 300, heightPx: 200 });
    expect((await c.owner.client.del(`/api/v1/plans/${planId}/photos/${confirm!.body.photo.id}`)).status).toBe(200);
  });
});
