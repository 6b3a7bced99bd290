/** Just enough EXIF reading to tell whether an image carries a GPS block (TIFF IFD0 tag 0x8825, per the EXIF 2.3 spec). */
export function hasGpsPointer(exif: Buffer | undefined): boolean {
  if (!exif) return false;
  const tiff = exif.subarray(exif.toString("latin1", 0, 4) === "Exif" ? 6 : 0);
  const le = tiff.toString("latin1", 0, 2) === "II";
  const u16 = (o: number) => (le ? tiff.readUInt16LE(o) : tiff.readUInt16BE(o));
  const u32 = (o: number) => (le ? tiff.readUInt32LE(o) : tiff.readUInt32BE(o));
  const ifd0 = u32(4);
  const n = u16(ifd0);
  for (let i = 0; i < n; i++) if (u16(ifd0 + 2 + i * 12) === 0x8825) return true;
  return false;
}
