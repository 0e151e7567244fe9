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

/**
 * Whether some connection holds SQLite's write lock now: a probe of our own asks for it without
 * waiting (`BEGIN IMMEDIATE`, busy timeout 0) and lets go at once.
 */
function writeLockHeld(probe: Database.Database): boolean {
  try {
    probe.exec('BEGIN IMMEDIATE');
    probe.exec('ROLLBACK');
    return false;
  } catch (err) {
    if ((err as { code?: string }).code === 'SQLITE_BUSY') return true;
    throw err;
  }
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe.skipIf(onPostgres)('crash safety of the SQLite file (SQLite only)', () => {
  it('when the server is killed in the middle of a large import and a burst of readings, then on restart the file is sound, every answered reading is there and the import is all there or not at all', async () => {
    const { standId, trees } = await prepare();
    server = await startBenchServer({ dbFile, logFile });
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
    const sentAt = Date.now();
    const imported = post(owner, `/api/sugarbushes/${standId}/imports/trees`, form).then(
      (res) => (importAnswer = res.status),
      () => null,
    );

    // Kill once the write lock has been held for a while (the import's one transaction, not a
    // reading's few milliseconds) — or, if that is never seen, as soon as the import answers.
    const probe = new Database(dbFile, { fileMustExist: true });
    probe.pragma('busy_timeout = 0');
    let heldFor = 0;
    let killedMidImport = false;
    for (;;) {
      if (importAnswer !== null || Date.now() - sentAt > 20_000) break;
      heldFor = writeLockHeld(probe) ? heldFor + 1 : 0;
      if (heldFor >= 4) {
        killedMidImport = true;
        break;
      }
      await sleep(25);
    }
    probe.close();
    process.kill(server.pid, 'SIGKILL');
    const killedAt = Date.now();
    stop = true;
    await Promise.all([...devices, imported]);
    await server.stop();
    console.log(
      `crash: killed ${killedAt - sentAt} ms after the import was sent ` +
        `(${killedMidImport ? 'while a write transaction was held' : `after the import answered ${importAnswer}`}); ` +
        `${acked.length} of ${sent} readings answered`,
    );
    expect(acked.length).toBeGreaterThan(0);
    // The killed server could not remove its lock file; it names a process that is gone.
    expect(fs.existsSync(serverLockFileOf(dbFile))).toBe(true);

    // Restarted on the same file, the server recovers the WAL and answers again.
    server = await startBenchServer({ dbFile, logFile });
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
    expect(check.missing).toEqual([]);
    expect(check.orphanMeasurements).toBe(0);
    expect(check.orphanAudits).toBe(0);
    expect(check.partialImports).toEqual([]);
    expect(check.importAudits).toBe(check.importsPresent);
    if (importAnswer === 201) expect(check.importsPresent).toBe(1);
  }, 90_000);
});
