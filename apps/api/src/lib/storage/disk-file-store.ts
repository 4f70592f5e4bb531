// Files on the local disk, outside the web root, under generated keys only.
import { createReadStream } from 'node:fs';
import { mkdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import { dirname, join, resolve, sep } from 'node:path';
import type { Readable } from 'node:stream';
import { AppError } from '../../errors';
import type { FileStore } from './file-store';

const keyPattern = /^[a-z0-9-]+(\/[a-z0-9.-]+)*$/;

export function createDiskFileStore(rootDir: string): FileStore {
  const root = resolve(rootDir);
  const pathOf = (key: string) => {
    if (!keyPattern.test(key) || key.includes('..')) throw new Error(`invalid storage key ${key}`);
    const path = resolve(join(root, key));
    if (!path.startsWith(root + sep)) throw new Error(`storage key escapes the store: ${key}`);
    return path;
  };
  return {
    async put(key, bytes) {
      const path = pathOf(key);
      await mkdir(dirname(path), { recursive: true });
      // Write then rename, so a reader never sees half a file.
      const partial = `${path}.partial`;
      await writeFile(partial, bytes, { flag: 'wx' });
      await rename(partial, path);
    },
    async get(key) {
      const path = pathOf(key);
      try {
        await stat(path);
      } catch {
        throw new AppError('not_found', 'That file is no longer in storage.');
      }
      return createReadStream(path) as Readable;
    },
    async remove(key) {
      await rm(pathOf(key), { force: true });
    },
  };
}
