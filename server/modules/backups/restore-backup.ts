import fs from 'node:fs';
import path from 'node:path';
import type { Config } from '../../config';
import { createDb, migrateLatest, migrationsDir } from '../../db';
import { serverHolding, serverLockFileOf } from '../../lib/server-lock';
import { DATABASE_COPY } from './backup-manifest';
import { BackupError, checkDatabase, checkpoint } from './sqlite-file';
import { copyFiles, storedFiles } from './stored-files';

export interface RestoreOptions {
  /** Restore although a live process holds the server lock (the operator knows better). */
  force?: boolean;
  now?: Date;
}

export interface RestoreDone {
  database: string;
  /** Where the database that was there before now lies (null when there was none). */
  setAside: string | null;
  /** Migrations run after the restore to bring the copy up to this build. */
  migrated: number;
  files: string[];
}

/** A backup folder (its `clearwood.sqlite`) or a database file itself. */
function locate(target: string): { file: string; folder: string | null } {
  const resolved = path.resolve(target);
  if (!fs.existsSync(resolved)) throw new BackupError(`There is no backup at ${resolved}.`);
  if (fs.statSync(resolved).isDirectory()) {
    const file = path.join(resolved, DATABASE_COPY);
    if (!fs.existsSync(file))
      throw new BackupError(`${resolved} holds no ${DATABASE_COPY}: is it a backup folder?`);
    return { file, folder: resolved };
  }
  const folder = path.dirname(resolved);
  const besideIt = storedFolderNames.some((n) => fs.existsSync(path.join(folder, n)));
  return { file: resolved, folder: besideIt ? folder : null };
}

const storedFolderNames = ['photos', 'basemaps'];

const stampOf = (at: Date) =>
  at
    .toISOString()
    .replace(/[-:]/g, '')
    .replace(/\.\d{3}Z$/, 'Z');

/** The migrations this build knows, by name. */
const knownMigrations = () =>
  new Set(fs.readdirSync(migrationsDir).filter((f) => /^\d{14}_[\w-]+\.ts$/.test(f)));

/**
 * Put a backup in place of the SQLite database. In order: refuse while a server holds the file;
 * copy the backup beside the database and check the copy (integrity, and migrations no newer
 * than this build); set the current database (with its WAL) aside as
 * `<file>.before-restore-<UTC instant>`; move the copy in and migrate it forward; then the
 * uploaded files, the current folders set aside the same way. Nothing is deleted.
 */
export async function restoreBackup(
  config: Config,
  target: string,
  opts: RestoreOptions = {},
): Promise<RestoreDone> {
  if (config.database.client !== 'sqlite')
    throw new BackupError(
      'DATABASE_URL names a PostgreSQL server: `npm run restore` restores the SQLite file only. ' +
        'Restore PostgreSQL with its own tools (pg_restore or psql).',
    );
  const database = path.resolve(config.database.filename);
  const holder = serverHolding(database);
  if (holder && !opts.force)
    throw new BackupError(
      `The Clearwood server (process ${holder.pid}, started ${holder.startedAt}) is using ` +
        `${database}. Stop it first, then restore. If no server runs, the lock file ` +
        `${serverLockFileOf(database)} is left over: pass --force.`,
    );

  const { file, folder } = locate(target);
  const stamp = stampOf(opts.now ?? new Date());
  fs.mkdirSync(path.dirname(database), { recursive: true });
  const staging = `${database}.restoring-${stamp}`;
  fs.copyFileSync(file, staging);
  try {
    const check = checkDatabase(staging, file);
    if (check.integrity !== 'ok')
      throw new BackupError(
        `${file} fails its integrity check (${check.integrity}); nothing was changed.`,
      );
    if (check.migrations.length === 0)
      throw new BackupError(
        `${file} is not a Clearwood database (no migrations); nothing was changed.`,
      );
    const known = knownMigrations();
    const newer = check.migrations.filter((m) => !known.has(m));
    if (newer.length > 0)
      throw new BackupError(
        `${file} was made by a newer Clearwood (migration ${newer[0]} is unknown here): ` +
          'restore it with that version or a later one; nothing was changed.',
      );

    const setAside = fs.existsSync(database) ? putAside(database, stamp) : null;
    fs.renameSync(staging, database);
    const db = createDb(database);
    try {
      await migrateLatest(db);
    } finally {
      await db.destroy();
    }
    const migrated = [...known].filter((m) => !check.migrations.includes(m)).length;
    return { database, setAside, migrated, files: restoreFiles(config, folder, stamp) };
  } finally {
    fs.rmSync(staging, { force: true });
  }
}

/**
 * The current database, renamed with its WAL and shared-memory files, so SQLite opens the
 * set-aside file with every write it had. The WAL is folded in first where it can be.
 */
function putAside(database: string, stamp: string): string {
  try {
    checkpoint(database);
  } catch {
    // A damaged file is set aside as it is, WAL and all.
  }
  const aside = `${database}.before-restore-${stamp}`;
  for (const suffix of ['-wal', '-shm', ''])
    if (fs.existsSync(`${database}${suffix}`))
      fs.renameSync(`${database}${suffix}`, `${aside}${suffix}`);
  return aside;
}

function restoreFiles(config: Config, folder: string | null, stamp: string): string[] {
  const said: string[] = [];
  if (!folder) {
    said.push('No photos or basemaps beside this file: the uploaded files were left as they are.');
    return said;
  }
  for (const kind of storedFiles(config)) {
    const from = path.join(folder, kind.name);
    if (!fs.existsSync(from)) {
      said.push(`The backup has no ${kind.name}: ${kind.dir} was left as it is.`);
      continue;
    }
    let aside = '';
    if (fs.existsSync(kind.dir) && fs.readdirSync(kind.dir).length > 0) {
      aside = `${kind.dir.replace(/[/\\]+$/, '')}.before-restore-${stamp}`;
      fs.renameSync(kind.dir, aside);
    }
    const copied = copyFiles(from, kind.dir, { keep: kind.keep, link: false });
    said.push(
      `${kind.name}: ${copied.count} files copied to ${kind.dir}` +
        (aside ? ` (the folder that was there is now ${aside})` : ''),
    );
  }
  if (config.photos.kind === 's3') said.push('Photos are kept in an S3 bucket: not restored.');
  return said;
}
