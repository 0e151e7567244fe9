import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import type { Readable } from 'node:stream';
import type { PhotoStorageConfig } from '../../config';
import { s3PhotoStore } from './s3-photo-store';

/**
 * Where photo files live, by key (`<stand>/<uuid>.<ext>`): a folder on this machine by default,
 * or an S3 bucket. The database keeps only the keys.
 */
export interface PhotoStore {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  /** The stored bytes, or null when nothing is stored under the key. */
  get(key: string): Promise<Readable | null>;
  remove(key: string): Promise<void>;
  /** Let go of open connections (the S3 client's sockets). */
  close(): void;
}

export function createPhotoStore(config: PhotoStorageConfig): PhotoStore {
  return config.kind === 's3' ? s3PhotoStore(config) : diskPhotoStore(config.dir);
}

/** Photos as files under `dir`, written whole (a temporary name, then a rename) or not at all. */
export function diskPhotoStore(dir: string): PhotoStore {
  const root = path.resolve(dir);
  const fileOf = (key: string) => {
    const file = path.resolve(root, key);
    // Keys are made by the server; a key that climbs out of the folder is a bug, never served.
    if (!file.startsWith(`${root}${path.sep}`)) throw new Error(`photo key outside the store`);
    return file;
  };
  return {
    async put(key, body) {
      const file = fileOf(key);
      await fs.promises.mkdir(path.dirname(file), { recursive: true });
      const part = `${file}.${randomUUID()}.part`;
      try {
        await fs.promises.writeFile(part, body, { flag: 'wx' });
        await fs.promises.rename(part, file);
      } catch (err) {
        await fs.promises.rm(part, { force: true });
        throw err;
      }
    },
    async get(key) {
      const file = fileOf(key);
      try {
        await fs.promises.access(file, fs.constants.R_OK);
      } catch {
        return null;
      }
      return fs.createReadStream(file);
    },
    async remove(key) {
      await fs.promises.rm(fileOf(key), { force: true });
    },
    close() {},
  };
}
