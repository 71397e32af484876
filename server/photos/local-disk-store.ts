/// <reference types="node" />
import fs from 'node:fs/promises';
import path from 'node:path';
import crypto from 'node:crypto';
import { assertPhotoKey, type PhotoStore } from './photo-store';

/** Photo store on local disk under one root folder (by default .data/photos). */
export function createLocalDiskStore(root: string): PhotoStore {
  const base = path.resolve(root);
  const fileFor = (key: string) => {
    assertPhotoKey(key);
    const file = path.resolve(base, key);
    // Belt and braces beside the key pattern: never leave the root.
    if (!file.startsWith(base + path.sep)) throw new Error('Photo key escapes the photo folder');
    return file;
  };
  return {
    async put(key, data) {
      const file = fileFor(key);
      await fs.mkdir(path.dirname(file), { recursive: true });
      // Write then rename, so a crash never leaves half a photo under the real name.
      const tmp = `${file}.${crypto.randomBytes(6).toString('hex')}.part`;
      try {
        await fs.writeFile(tmp, data, { flag: 'wx' });
        await fs.rename(tmp, file);
      } catch (err) {
        await fs.rm(tmp, { force: true });
        throw err;
      }
    },
    async get(key) {
      try {
        return await fs.readFile(fileFor(key));
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
        throw err;
      }
    },
    async remove(key) {
      await fs.rm(fileFor(key), { force: true });
    },
  };
}
