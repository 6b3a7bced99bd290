import QRCode from "qrcode";

/**
 * A QR code of `text` as one path of its dark modules (one unit square each), for the packet's
 * cover: error correction M survives a smudged print.
 */
export function qrPath(text: string): { size: number; path: string } {
  const qr = QRCode.create(text, { errorCorrectionLevel: "M" });
  const { size, data } = qr.modules;
  const parts: string[] = [];
  for (let y = 0; y < size; y++) {
    for (let x = 0; x < size; x++) {
      // A run of dark modules in a row becomes one rectangle.
      if (!data[y * size + x]) continue;
      let run = 1;
      while (x + run < size && data[y * size + x + run]) run++;
      parts.push(`M${x} ${y}h${run}v1h${-run}z`);
      x += run - 1;
    }
  }
  return { size, path: parts.join("") };
}
