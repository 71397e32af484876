/// <reference types="node" />
// A tiny EXIF reader for tests: finds the GPS IFD (tag 0x8825) in a TIFF-structured
// EXIF block and reads its latitude, so tests can prove a position was there and is gone.

/** GPS latitude in degrees from an EXIF block (sharp's metadata().exif), or null when absent. */
export function gpsLatitude(exif: Buffer | undefined): number | null {
  if (!exif) return null;
  let tiff = exif.indexOf('Exif\0\0', 0, 'latin1');
  tiff = tiff >= 0 ? tiff + 6 : 0;
  const little = exif.toString('latin1', tiff, tiff + 2) === 'II';
  const u16 = (o: number) => (little ? exif.readUInt16LE(tiff + o) : exif.readUInt16BE(tiff + o));
  const u32 = (o: number) => (little ? exif.readUInt32LE(tiff + o) : exif.readUInt32BE(tiff + o));
  const entries = (ifd: number) => Array.from({ length: u16(ifd) }, (_, i) => ifd + 2 + i * 12);
  const gpsEntry = entries(u32(4)).find((e) => u16(e) === 0x8825);
  if (gpsEntry === undefined) return null;
  const lat = entries(u32(gpsEntry + 8)).find((e) => u16(e) === 0x0002);
  if (lat === undefined) return null;
  const at = u32(lat + 8);
  const [d, m, s] = [0, 1, 2].map((i) => u32(at + i * 8) / u32(at + i * 8 + 4));
  return d + m / 60 + s / 3600;
}
