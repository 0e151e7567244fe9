import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { loadConfig } from '../../server/config';
import { createDb, migrateLatest } from '../../server/db';
import { serverLockFileOf } from '../../server/lib/server-lock';
import { restoreBackup } from '../../server/modules/backups/restore-backup';
import { signIn, type Session } from '../bench/http';
import { startBenchServer, type BenchServer } from '../bench/server-process';
import { PASSWORD, addMember, addSugarbush, addTree, addUser, recordsWritten } from './test-app';
import { onPostgres } from './test-database';
import { checkConsistent, treesCsv, type AckedWrite } from './write-traffic';

const IMPORT_TREES = 20_000;
/**
 * The server pauses this long after each batch of 400 rows it writes (a setting for tests only),
 * so the import's transaction is open for some 50 × 20 ms, and the kill lands inside it.
 */
const WRITE_PAUSE_MS = 20;
/** Killed once this many of the import's rows are written (and not committed). */
const KILL_AFTER_ROWS = IMPORT_TREES / 2;
const OWNER = 'owner@crash.example';
const scratch = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-crash-'));
const dbFile = path.join(scratch, 'data', 'clearwood.sqlite');
const logFile = path.join(scratch, 'server.log');
let server: BenchServer | undefined;

afterAll(async () => {
  await server?.stop();
  fs.rmSync(scratch, { recursive: true, force: true });
});

/** A stand with an owner and a few trees, written before any server runs. */
async function prepare(): Promise<{ standId: number; trees: number[] }> {
  const db = createDb(dbFile);
  try {
    await migrateLatest(db);
    const standId = await addSugarbush(db, 'Crash Hollow');
    await addMember(db, await addUser(db, OWNER), standId, 'owner');
    const trees: number[] = [];
    for (let i = 1; i <= 6; i++) trees.push(await addTree(db, standId, `K-${i}`));
    await recordsWritten(db, standId, trees);
    return { standId, trees };
  } finally {
    await db.destroy();
  }
}

const post = (s: Session, url: string, body: FormData | object) =>
  fetch(`${s.baseUrl}${url}`, {
    method: 'POST',
    headers: {
      cookie: s.cookie,
      'x-csrf-token': s.csrf,
      ...(body instanceof FormData ? {} : { 'content-type': 'application/json' }),
    },
    body: body instanceof FormData ? body : JSON.stringify(body),
    signal: AbortSignal.timeout(60_000),
  });

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

const env = { NODE_ENV: 'test', IMPORT_WRITE_PAUSE_MS: String(WRITE_PAUSE_MS) };

/**
 * Rows the import has written inside its open transaction, as its last note in the server's log
 * says (the pause setting makes the worker note each batch straight to stderr); 0 before any.
 */
function rowsWrittenUncommitted(fromOffset: number): number {
  const log = fs.readFileSync(logFile, 'utf8').slice(fromOffset);
  const notes = [...log.matchAll(/import: (\d+) of (\d+) rows written, not committed yet/g)];
  return notes.length ? Number(notes[notes.length - 1][1]) : 0;
}

describe.skipIf(onPostgres)('crash safety of the SQLite file (SQLite only)', () => {
  it('when the server is killed in the middle of a large import and a burst of readings, then on restart the file is sound, every answered reading is there and the import is all there or not at all', async () => {
    const { standId, trees } = await prepare();
    server = await startBenchServer({ dbFile, logFile, env });
    const owner = await signIn(server.url, OWNER, PASSWORD);

    // A burst of readings from three field devices at once, each answer remembered.
    const acked: AckedWrite[] = [];
    let stop = false;
    let sent = 0;
    const device = async (d: number) => {
      for (let n = 0; !stop; n++) {
        const note = `d${d}-${n}`;
        sent++;
        try {
          const res = await post(
            owner,
            `/api/trees/${trees[(d + n) % trees.length]}/measurements`,
            {
              measuredOn: '2026-10-01',
              dbhCm: 38.5,
              note,
            },
          );
          if (res.status === 201) acked.push({ kind: 'measurement', key: note, at: Date.now() });
        } catch {
          return; // the server is gone
        }
      }
    };
    const devices = [0, 1, 2].map(device);
    await sleep(500);

    const form = new FormData();
    form.append('file', new Blob([treesCsv('C-', IMPORT_TREES)], { type: 'text/csv' }), 'big.csv');
    let importAnswer: number | null = null;
    const logFrom = fs.statSync(logFile).size;
    const sentAt = Date.now();
    const imported = post(owner, `/api/sugarbushes/${standId}/imports/trees`, form).then(
      (res) => (importAnswer = res.status),
      () => null,
    );

    // Kill once the import has written half its rows inside its one transaction, as the worker's
    // notes in the log tell (its progress route cannot: readings waiting for the write lock hold
    // the request thread) — or, if that is never seen, as soon as it answers.
    let killedAfterRows = 0;
    for (;;) {
      if (importAnswer !== null || Date.now() - sentAt > 30_000) break;
      killedAfterRows = rowsWrittenUncommitted(logFrom);
      if (killedAfterRows >= KILL_AFTER_ROWS) break;
      await sleep(5);
    }
    process.kill(server.pid, 'SIGKILL');
    const killedAt = Date.now();
    stop = true;
    await Promise.all([...devices, imported]);
    await server.stop();
    console.log(
      `crash: killed ${killedAt - sentAt} ms after the import was sent ` +
        `(${importAnswer === null ? `with ${killedAfterRows} of its rows written` : `after it answered ${importAnswer}`}); ` +
        `${acked.length} of ${sent} readings answered`,
    );
    expect(acked.length).toBeGreaterThan(0);
    // The kill landed inside the import's transaction, not before or after it.
    expect(importAnswer).toBeNull();
    expect(killedAfterRows).toBeGreaterThanOrEqual(KILL_AFTER_ROWS);
    expect(killedAfterRows).toBeLessThan(IMPORT_TREES);
    // The killed server could not remove its lock file; it names a process that is gone.
    expect(fs.existsSync(serverLockFileOf(dbFile))).toBe(true);

    // Restarted on the same file, the server recovers the WAL and answers again.
    server = await startBenchServer({ dbFile, logFile, env });
    const again = await signIn(server.url, OWNER, PASSWORD);
    const list = await fetch(`${again.baseUrl}/api/trees/${trees[0]}/measurements?pageSize=1`, {
      headers: { cookie: again.cookie },
    });
    expect(list.status).toBe(200);
    // While it runs, a restore refuses to touch its file.
    await expect(
      restoreBackup(loadConfig({ NODE_ENV: 'test', DATABASE_FILE: dbFile }), dbFile),
    ).rejects.toThrow(/Stop it first/);
    await server.stop();
    server = undefined;

    const check = checkConsistent(dbFile, {
      acked,
      prefixes: ['C-'],
      perImport: [IMPORT_TREES],
    });
    console.log(
      `crash: after the restart the import is ${check.importsPresent ? 'all there' : 'not there'}` +
        `${check.partialImports.length ? ', in part (!)' : ''}; ${check.measurements} readings stored`,
    );
    expect(check.integrity).toEqual(['ok']);
    // What made recovery possible: the file keeps its write-ahead log. Without a journal a kill
    // cannot show the damage unless it lands inside a commit's page writes or a transaction
    // outgrows the page cache (16 MB; these 20,000 trees take some 2.3 MB), so it is read here.
    const file = new Database(dbFile, { readonly: true, fileMustExist: true });
    expect(file.pragma('journal_mode', { simple: true })).toBe('wal');
    file.close();
    expect(check.missing).toEqual([]);
    expect(check.orphanMeasurements).toBe(0);
    expect(check.orphanAudits).toBe(0);
    expect(check.partialImports).toEqual([]);
    expect(check.importAudits).toBe(check.importsPresent);
    // Killed before its commit, the import left nothing behind: no tree, no audit entry.
    expect(check.importsPresent).toBe(0);
    expect(check.importAudits).toBe(0);
  }, 90_000);
});
