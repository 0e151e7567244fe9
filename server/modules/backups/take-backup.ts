import fs from 'node:fs';
import path from 'node:path';
import type { Config } from '../../config';
import {
  BACKUP_NAME,
  DATABASE_COPY,
  MANIFEST_FILE,
  backupName,
  type BackupManifest,
} from './backup-manifest';
import { BackupError, checkDatabase, copyDatabase } from './sqlite-file';
import { copyFiles, storedFiles } from './stored-files';

export const POSTGRES_REFUSAL =
  'DATABASE_URL names a PostgreSQL server: `npm run backup` backs up the SQLite file only. ' +
  'Back PostgreSQL up with its own tools (pg_dump, or the server’s continuous archiving), and ' +
  'copy BASEMAP_DIR and the photo store beside it.';

export interface BackupDone {
  dir: string;
  manifest: BackupManifest;
  /** Older backups removed to keep BACKUP_KEEP. */
  removed: string[];
}

/**
 * An online backup into `BACKUP_DIR/clearwood-<UTC instant>/`: the database through SQLite's
 * backup API, checked, then the uploaded files (hard links where possible) and a manifest. The
 * folder is built under a hidden name and renamed when whole, so a folder with a backup's name
 * is always a finished, checked backup. Then only the newest `BACKUP_KEEP` are kept.
 */
export async function takeBackup(config: Config, now: Date = new Date()): Promise<BackupDone> {
  if (config.database.client !== 'sqlite') throw new BackupError(POSTGRES_REFUSAL);
  const source = path.resolve(config.database.filename);
  const name = backupName(now);
  const root = path.resolve(config.BACKUP_DIR);
  const dir = path.join(root, name);
  if (fs.existsSync(dir)) throw new BackupError(`A backup named ${name} exists already.`);
  const partial = path.join(root, `.${name}.partial`);
  fs.rmSync(partial, { recursive: true, force: true });
  fs.mkdirSync(partial, { recursive: true });
  try {
    const copy = path.join(partial, DATABASE_COPY);
    await copyDatabase(source, copy);
    const check = checkDatabase(copy);
    if (check.integrity !== 'ok')
      throw new BackupError(`The copy failed its integrity check: ${check.integrity}`);
    // After the database: every file a copied row names was stored before its row committed.
    const files: BackupManifest['files'] = { photos: null, basemaps: { count: 0, bytes: 0 } };
    const notes: string[] = [];
    for (const kind of storedFiles(config))
      files[kind.name] = copyFiles(kind.dir, path.join(partial, kind.name), {
        keep: kind.keep,
        link: true,
      });
    if (config.photos.kind === 's3')
      notes.push('Photos are kept in an S3 bucket and are not in this backup.');
    const manifest: BackupManifest = {
      format: 'clearwood-backup/1',
      takenAt: now.toISOString(),
      source: {
        database: source,
        photos: config.photos.kind === 'disk' ? path.resolve(config.photos.dir) : null,
        basemaps: path.resolve(config.BASEMAP_DIR),
      },
      database: {
        file: DATABASE_COPY,
        bytes: fs.statSync(copy).size,
        integrity: check.integrity,
        migration: check.migrations.at(-1) ?? null,
        migrations: check.migrations.length,
      },
      rows: check.rows,
      files,
      notes,
    };
    fs.writeFileSync(path.join(partial, MANIFEST_FILE), `${JSON.stringify(manifest, null, 2)}\n`);
    fs.renameSync(partial, dir);
    return { dir, manifest, removed: rotate(root, config.BACKUP_KEEP) };
  } catch (err) {
    fs.rmSync(partial, { recursive: true, force: true });
    throw err;
  }
}

/** The finished backups in a folder, oldest first. */
export function listBackups(root: string): string[] {
  if (!fs.existsSync(root)) return [];
  return fs
    .readdirSync(root, { withFileTypes: true })
    .filter((e) => e.isDirectory() && BACKUP_NAME.test(e.name))
    .map((e) => e.name)
    .sort();
}

/** Remove all but the newest `keep` backups; returns the folders removed. */
export function rotate(root: string, keep: number): string[] {
  const all = listBackups(root);
  const old = all.slice(0, Math.max(0, all.length - keep));
  for (const name of old) fs.rmSync(path.join(root, name), { recursive: true, force: true });
  return old.map((name) => path.join(root, name));
}
