import fs from 'node:fs';
import Database from 'better-sqlite3';

/** A backup or restore that cannot go on; the message says why and what to do. */
export class BackupError extends Error {}

/** The tables a manifest counts: the record, its people and its trail. */
export const COUNTED_TABLES = [
  'users',
  'sugarbushes',
  'memberships',
  'trees',
  'measurements',
  'tapholes',
  'notes',
  'photos',
  'basemaps',
  'audit_events',
] as const;

export interface DatabaseCheck {
  /** `ok`, or the first problems `PRAGMA integrity_check` found. */
  integrity: string;
  /** The migrations the file has run, in order. */
  migrations: string[];
  rows: Record<string, number>;
}

/**
 * An online copy through SQLite's backup API. All pages go in one step, so the copy is one
 * consistent snapshot (a single read transaction): the server's writes go on beside it in the
 * WAL, and a write committed before the step began is in the copy.
 */
export async function copyDatabase(source: string, destination: string): Promise<void> {
  if (!fs.existsSync(source))
    throw new BackupError(`There is no database at ${source} (DATABASE_FILE) to back up.`);
  const db = new Database(source, { fileMustExist: true });
  try {
    db.pragma('busy_timeout = 10000');
    await db.backup(destination, { progress: () => 0x7fffffff });
  } finally {
    db.close();
  }
  // The copy stands alone: a rollback journal, so it is one file with no WAL beside it.
  const copy = new Database(destination, { fileMustExist: true });
  try {
    copy.pragma('journal_mode = DELETE');
  } finally {
    copy.close();
  }
}

/**
 * Opens a file as SQLite and checks it whole (`PRAGMA integrity_check`), then reads its migrations
 * and row counts. A file that is not SQLite at all, or too damaged to open, is a BackupError
 * naming `name` (the file the user gave, when `file` is a working copy of it).
 */
export function checkDatabase(file: string, name = file): DatabaseCheck {
  let db: Database.Database | undefined;
  try {
    db = new Database(file, { fileMustExist: true });
    const problems = (db.pragma('integrity_check(20)') as { integrity_check: string }[]).map(
      (r) => r.integrity_check,
    );
    const integrity = problems.length === 1 && problems[0] === 'ok' ? 'ok' : problems.join('; ');
    if (integrity !== 'ok') return { integrity, migrations: [], rows: {} };
    const tables = new Set(
      (
        db.prepare("select name from sqlite_master where type = 'table'").all() as {
          name: string;
        }[]
      ).map((r) => r.name),
    );
    const migrations = tables.has('knex_migrations')
      ? (
          db.prepare('select name from knex_migrations order by id').all() as { name: string }[]
        ).map((r) => r.name)
      : [];
    const rows: Record<string, number> = {};
    for (const table of COUNTED_TABLES)
      if (tables.has(table))
        rows[table] = (db.prepare(`select count(*) as n from "${table}"`).get() as { n: number }).n;
    return { integrity, migrations, rows };
  } catch (err) {
    throw new BackupError(
      `${name} is not a sound SQLite database (${(err as Error).message}); nothing was changed.`,
    );
  } finally {
    db?.close();
  }
}

/** Fold the WAL into the main file, so the file alone holds every committed write. */
export function checkpoint(file: string): void {
  const db = new Database(file, { fileMustExist: true });
  try {
    db.pragma('busy_timeout = 10000');
    db.pragma('wal_checkpoint(TRUNCATE)');
  } finally {
    db.close();
  }
}
