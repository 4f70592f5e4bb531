// Where uploaded bytes live. One interface so a single machine keeps files on disk and a scaled
// deployment can put them in object storage, chosen by configuration.
import type { Readable } from 'node:stream';

export interface FileStore {
  put(key: string, bytes: Buffer, mediaType: string): Promise<void>;
  get(key: string): Promise<Readable>;
  remove(key: string): Promise<void>;
}
