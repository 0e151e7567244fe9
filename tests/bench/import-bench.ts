/**
 * A CSV import of 10,000 trees through HTTP, beside its floor — a bare prepared insert of the same
 * rows into a copy of the same file, one transaction, no checks — and the trivial route at 20
 * connections while the import runs (parsing in a worker, batched writes, the new trees advised),
 * its progress polled every 500 ms as the import page does.
 */
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import { performance } from 'node:perf_hooks';
import Database from 'better-sqlite3';
import { load, type LoadFigures, type Session } from './http';
import { busyWindow, type BusyWindow } from './machine';
import { CONNECTIONS, TRIVIAL } from './stand-bench';

export const IMPORT_ROWS = 10_000;
const CAP_SECONDS = 240;

export interface ImportFigures {
  rows: number;
  bytes: number;
  /** POST sent → answer read: read in a worker, matched, written, the new trees advised. */
  importMs: number;
  status: number;
  created: number;
  /** A bare prepared insert of the same rows in one transaction, on a copy of the file. */
  floorMs: number;
  trivial: LoadFigures;
  busy: BusyWindow;
  /** Progress polls answered while the POST was pending, and the steps they saw in order. */
  polls: number;
  steps: string[];
}

/** Poll the import's progress as the page does until `until` settles; the steps seen. */
async function pollProgress(
  s: Session,
  standId: number,
  importId: string,
  until: Promise<unknown>,
) {
  let settled = false;
  void until.finally(() => (settled = true));
  const steps: string[] = [];
  let polls = 0;
  while (!settled) {
    const res = await fetch(
      `${s.baseUrl}/api/sugarbushes/${standId}/imports/${importId}/progress`,
      {
        headers: { cookie: s.cookie },
      },
    );
    if (res.ok) {
      polls++;
      const { phase } = (await res.json()) as { phase: string };
      if (steps.at(-1) !== phase) steps.push(phase);
    }
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
  return { polls, steps };
}

interface Row {
  tag: string;
  species: string;
  lat: number;
  lng: number;
  status: string;
}

function rows(): Row[] {
  return Array.from({ length: IMPORT_ROWS }, (_, i) => ({
    tag: `IMP-${String(i + 1).padStart(5, '0')}`,
    species: i % 7 === 0 ? 'red-maple' : 'sugar-maple',
    lat: 44.1 + (i % 100) * 0.0001,
    lng: -72.5 + Math.floor(i / 100) * 0.0001,
    status: 'active',
  }));
}

const csvOf = (rs: readonly Row[]) =>
  `tag,species,lat,lng,status\n${rs.map((r) => `${r.tag},${r.species},${r.lat},${r.lng},${r.status}`).join('\n')}\n`;

/** The same rows straight into SQLite: what any import costs at least. */
function floorInsert(copyOf: string, scratch: string, standId: number, rs: readonly Row[]) {
  fs.copyFileSync(copyOf, scratch);
  const db = new Database(scratch);
  try {
    db.pragma('journal_mode = WAL');
    const insert = db.prepare(
      'insert into trees (sugarbush_id, tag, species, lat, lng, status) values (?, ?, ?, ?, ?, ?)',
    );
    const t0 = performance.now();
    db.transaction(() => {
      for (const r of rs) insert.run(standId, r.tag, r.species, r.lat, r.lng, r.status);
    })();
    return performance.now() - t0;
  } finally {
    db.close();
    for (const f of [scratch, `${scratch}-wal`, `${scratch}-shm`]) fs.rmSync(f, { force: true });
  }
}

export async function importBench(
  s: Session,
  standId: number,
  files: { cached: string; scratch: string },
): Promise<ImportFigures> {
  const rs = rows();
  const text = csvOf(rs);
  const floorMs = floorInsert(files.cached, files.scratch, standId, rs);

  const window = busyWindow();
  const form = new FormData();
  form.append('file', new Blob([text], { type: 'text/csv' }), 'trees.csv');
  const importId = randomUUID();
  const t0 = performance.now();
  const posted = fetch(`${s.baseUrl}/api/sugarbushes/${standId}/imports/trees`, {
    method: 'POST',
    headers: { cookie: s.cookie, 'x-csrf-token': s.csrf, 'x-import-id': importId },
    body: form,
    signal: AbortSignal.timeout(CAP_SECONDS * 1000),
  }).then(async (res) => ({
    status: res.status,
    body: (await res.json()) as { created?: number },
    ms: performance.now() - t0,
  }));
  const polled = pollProgress(s, standId, importId, posted);
  const trivial = await load(s, {
    connections: CONNECTIONS,
    seconds: CAP_SECONDS,
    capSeconds: CAP_SECONDS,
    paths: [TRIVIAL],
    until: posted,
  });
  const answer = await posted;
  const { polls, steps } = await polled;
  if (answer.status >= 300)
    throw new Error(`The import answered ${answer.status}: ${JSON.stringify(answer.body)}`);
  return {
    rows: rs.length,
    bytes: Buffer.byteLength(text),
    importMs: answer.ms,
    status: answer.status,
    created: answer.body.created ?? 0,
    floorMs,
    trivial,
    busy: window.end(),
    polls,
    steps,
  };
}
