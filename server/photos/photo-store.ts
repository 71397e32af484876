/**
 * Where photo bytes live. Keys are opaque names chosen by the server
 * (`<shop>/<uuid>.jpg`), never anything a client sent. Local disk is the
 * default; an S3-compatible store implements the same three calls
 * (PutObject, GetObject, DeleteObject) and is chosen in createPhotoStore.
 */
export interface PhotoStore {
  /** Stores bytes under a key, replacing nothing: keys are fresh uuids. */
  put(key: string, data: Buffer, contentType: string): Promise<void>;
  /** The bytes under a key, or null when nothing is stored there. */
  get(key: string): Promise<Buffer | null>;
  /** Removes a key; removing a missing key is not an error. */
  remove(key: string): Promise<void>;
}

/** Keys the server makes: shop id, a uuid, an optional "-thumb", and the extension. */
export const PHOTO_KEY = /^[0-9]+\/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}(-thumb)?\.(jpg|png|webp)$/;

/** Refuses any key the server would not have made (no "..", no absolute paths). */
export function assertPhotoKey(key: string): void {
  if (!PHOTO_KEY.test(key)) throw new Error(`Refusing photo key ${JSON.stringify(key)}`);
}
