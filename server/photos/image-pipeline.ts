import sharp from 'sharp';
import { AppError } from '../errors';

/** Upload size cap (bytes): a phone photo is 2–8 MB. */
export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;
/** Pixel cap: covers 48–50 megapixel phone cameras, refuses decompression bombs before decoding. */
export const MAX_PHOTO_PIXELS = 64_000_000;
/** Stored photos are scaled down to fit this box; the long side of a thumbnail is THUMB_SIZE. */
export const STORED_MAX_SIDE = 2560;
export const THUMB_SIZE = 320;

export type PhotoType = 'image/jpeg' | 'image/png' | 'image/webp';
export const EXTENSION: Record<PhotoType, 'jpg' | 'png' | 'webp'> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' };

/** The real type from the first bytes (magic numbers), whatever the file name or header claimed. */
export function sniffPhotoType(bytes: Buffer): PhotoType | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'image/jpeg';
  if (bytes.length >= 8 && bytes.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'image/png';
  if (bytes.length >= 12 && bytes.toString('latin1', 0, 4) === 'RIFF' && bytes.toString('latin1', 8, 12) === 'WEBP') return 'image/webp';
  return null;
}

export interface EncodedImage {
  data: Buffer;
  contentType: PhotoType;
  width: number;
  height: number;
}

const unreadable = () => new AppError(400, 'photo_unreadable', 'That photo could not be read; the file may be damaged. Take or choose it again.');

/**
 * Checks and re-encodes an uploaded photo: type from the bytes, pixel cap,
 * turned upright, scaled to fit, and written fresh so no metadata (GPS
 * position, camera serial, time) survives. Also makes a JPEG thumbnail (the
 * PDF report can embed JPEG). Throws an AppError a person can act on.
 */
export async function preparePhoto(bytes: Buffer): Promise<{ photo: EncodedImage; thumb: EncodedImage }> {
  if (bytes.length === 0) throw new AppError(400, 'photo_empty', 'The photo file is empty. Take or choose it again.');
  if (bytes.length > MAX_PHOTO_BYTES) throw tooLarge();
  const type = sniffPhotoType(bytes);
  if (!type) {
    throw new AppError(415, 'photo_type', 'That file is not a JPEG, PNG or WebP photo (its contents were checked, not its name). Choose a photo.');
  }
  const input = () => sharp(bytes, { limitInputPixels: MAX_PHOTO_PIXELS, failOn: 'error', pages: 1 });

  let meta: sharp.Metadata;
  try {
    meta = await sharp(bytes, { limitInputPixels: false }).metadata();
  } catch {
    throw unreadable();
  }
  const { width = 0, height = 0 } = meta;
  if (!width || !height || `image/${meta.format}` !== type) throw unreadable();
  // Checked on the header before any decoding: a tiny file can declare billions of pixels.
  if (width * height > MAX_PHOTO_PIXELS) {
    throw new AppError(
      413,
      'photo_too_many_pixels',
      `That image is ${width} × ${height} pixels; Baywalk takes up to ${MAX_PHOTO_PIXELS / 1_000_000} megapixels. Use the camera's normal photo size.`,
    );
  }

  try {
    // rotate() with no angle turns the image upright from its EXIF orientation;
    // sharp writes no metadata unless asked to (withMetadata/keepExif), so all of it is dropped.
    const upright = input().rotate().resize({ width: STORED_MAX_SIDE, height: STORED_MAX_SIDE, fit: 'inside', withoutEnlargement: true });
    const encoded =
      type === 'image/jpeg' ? upright.jpeg({ quality: 85, mozjpeg: true }) : type === 'image/png' ? upright.png({ compressionLevel: 9 }) : upright.webp({ quality: 85 });
    const main = await encoded.toBuffer({ resolveWithObject: true });
    const thumb = await input()
      .rotate()
      .resize({ width: THUMB_SIZE, height: THUMB_SIZE, fit: 'inside', withoutEnlargement: true })
      .flatten({ background: '#ffffff' })
      .jpeg({ quality: 75 })
      .toBuffer({ resolveWithObject: true });
    return {
      photo: { data: main.data, contentType: type, width: main.info.width, height: main.info.height },
      thumb: { data: thumb.data, contentType: 'image/jpeg', width: thumb.info.width, height: thumb.info.height },
    };
  } catch (err) {
    if (err instanceof AppError) throw err;
    throw unreadable();
  }
}

/** The 413 for a file over the size cap (also used by the upload middleware). */
export function tooLarge() {
  return new AppError(413, 'photo_too_large', `That photo is larger than ${MAX_PHOTO_BYTES / 1024 / 1024} MB. Use the camera's normal photo size, or send a smaller copy.`);
}
