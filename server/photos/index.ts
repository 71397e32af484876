import type { Config } from '../config';
import { createLocalDiskStore } from './local-disk-store';
import type { PhotoStore } from './photo-store';

export type { PhotoStore } from './photo-store';

/** The photo store for this configuration: local disk under config.photosDir. */
export function createPhotoStore(config: Pick<Config, 'photosDir'>): PhotoStore {
  // An S3-compatible store would be chosen here from its own settings; it needs only put/get/remove.
  return createLocalDiskStore(config.photosDir);
}
