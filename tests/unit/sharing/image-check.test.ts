import { describe, it, expect } from "vitest";
import sharp from "sharp";
import { reencode, sniffImageType } from "@/lib/server/services/image-check";
import { mmPerPx } from "@/lib/server/services/photo-scale";
import { hasGpsPointer } from "../../integration/helpers/exif";

describe("image checks by content", () => {
  it("recognises JPEG, PNG and WebP by their signatures, nothing else", async () => {
    // Signatures: JPEG SOI FF D8 FF (ITU T.81), PNG 8-byte signature (RFC 2083), WebP RIFF....WEBP (RFC 9649).
    const img = sharp({ create: { width: 8, height: 8, channels: 3, background: "#777" } });
    expect(sniffImageType(await img.clone().jpeg().toBuffer())).toBe("image/jpeg");
    expect(sniffImageType(await img.clone().png().toBuffer())).toBe("image/png");
    expect(sniffImageType(await img.clone().webp().toBuffer())).toBe("image/webp");
    expect(sniffImageType(Buffer.from("GIF89a......"))).toBeNull();
    expect(sniffImageType(Buffer.from("<svg xmlns='http://www.w3.org/2000/svg'/>"))).toBeNull();
    expect(sniffImageType(Buffer.from([0xff, 0xd8]))).toBeNull();
  });

  it("re-encodes without EXIF or GPS and turns the pixels upright", async () => {
    // 60 x 20 stored, orientation 6 (rotate 90 degrees clockwise to display; EXIF 2.3 tag 0x0112).
    const input = await sharp({ create: { width: 60, height: 20, channels: 3, background: "#556b2f" } })
      .jpeg()
      .withMetadata({ orientation: 6 })
      .withExif({ IFD0: { Make: "PhoneCo" }, IFD3: { GPSLatitudeRef: "S", GPSLatitude: "33/1 52/1 0/1" } })
      .toBuffer();
    const before = await sharp(input).metadata();
    expect(hasGpsPointer(before.exif)).toBe(true);
    expect(before.orientation).toBe(6);
    const out = await reencode(input);
    const meta = await sharp(out.data).metadata();
    expect(meta.exif).toBeUndefined();
    expect(meta.icc).toBeUndefined();
    expect([out.widthPx, out.heightPx]).toEqual([20, 60]);
  });

  it("mm per pixel from two points: 500 px for 1219.2 mm (4 ft) is 2.4384", () => {
    expect(mmPerPx({ ax: 0, ay: 0, bx: 300, by: 400, distanceMm: 1219.2 })).toBeCloseTo(2.4384, 10);
  });
});
