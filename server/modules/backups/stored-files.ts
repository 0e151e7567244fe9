import fs from 'node:fs';
import path from 'node:path';
import type { Config } from '../../config';

/**
 * The uploaded files that live beside the database: photos (when kept on disk) and basemaps.
 * Each is written whole under its final name (a temporary name, then a rename) and never changed
 * or deleted afterwards, so a hard link is as good as a copy. `keep` leaves out the temporary
 * files of uploads still arriving.
 */
export interface StoredFiles {
  name: 'photos' | 'basemaps';
  dir: string;
  keep: (relativePath: string) => boolean;
}

export function storedFiles(config: Config): StoredFiles[] {
  const kinds: StoredFiles[] = [];
  if (config.photos.kind === 'disk')
    kinds.push({ name: 'photos', dir: config.photos.dir, keep: (f) => !f.endsWith('.part') });
  kinds.push({
    name: 'basemaps',
    dir: config.BASEMAP_DIR,
    keep: (f) => /^\d+\.mbtiles$/.test(f),
  });
  return kinds;
}

export interface FileCount {
  count: number;
  bytes: number;
}

/** Every file under `from` that `keep` accepts goes to the same place under `to`. */
export function copyFiles(
  from: string,
  to: string,
  opts: { keep?: (relativePath: string) => boolean; link: boolean },
): FileCount {
  const total: FileCount = { count: 0, bytes: 0 };
  if (!fs.existsSync(from)) return total;
  const walk = (relative: string) => {
    for (const entry of fs.readdirSync(path.join(from, relative), { withFileTypes: true })) {
      const rel = path.join(relative, entry.name);
      if (entry.isDirectory()) {
        walk(rel);
        continue;
      }
      if (!entry.isFile() || (opts.keep && !opts.keep(rel))) continue;
      const source = path.join(from, rel);
      const target = path.join(to, rel);
      fs.mkdirSync(path.dirname(target), { recursive: true });
      if (!opts.link || !tryLink(source, target)) fs.copyFileSync(source, target);
      total.count += 1;
      total.bytes += fs.statSync(target).size;
    }
  };
  walk('');
  return total;
}

/** A hard link where the file system allows one (same device); false otherwise. */
function tryLink(source: string, target: string): boolean {
  try {
    fs.linkSync(source, target);
    return true;
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    if (code === 'EXDEV' || code === 'EPERM' || code === 'ENOTSUP' || code === 'EMLINK')
      return false;
    throw err;
  }
}
