import fs from 'node:fs';
import type { Knex } from 'knex';
import {
  REPORTED_ROWS,
  type ImportKind,
  type ImportMapping,
  type ImportResult,
  type ImportRowError,
} from '../../../shared/schemas/imports';
import { takeWriteLock } from '../../lib/db-engine';
import { auditRepository } from '../audit/audit.repository';
import { mapRepository } from '../map/map.repository';
import { importsRepository } from './imports.repository';
import { matchMeasurements, matchTapholes, matchTrees, type Matched } from './match-rows';
import {
  readRows,
  type ImportRow,
  type MeasurementRow,
  type ReadRows,
  type TapholeRow,
  type TreeRow,
} from './read-rows';
import type { ProgressStep } from './import-progress';
import { recordsImported } from './records-imported';

const auditEntity: Record<ImportKind, string> = {
  trees: 'tree',
  measurements: 'measurement',
  tapholes: 'taphole',
};

export interface ImportTask {
  of: ImportKind;
  bytes: Uint8Array;
  mapping: ImportMapping;
  dryRun: boolean;
  sugarbushId: number;
  userId: number;
  /** Crash tests only: a pause after each written batch (`IMPORT_WRITE_PAUSE_MS`). */
  writePauseMs?: number;
}

/**
 * What an import answers: the report, or a file that cannot be read at all (`fatal`, a 400), and
 * the seasons whose advice the caller brings current after the commit.
 */
export type ImportOutcome =
  | { fatal: string }
  | { result: ImportResult; seasons: number[]; /** Trees whose record changed. */ trees: number };

/**
 * One import, whole, in a worker thread with its own connection: read and checked, matched
 * against the record, then every row written in one transaction — or, when any row is wrong or it
 * is a dry run, nothing at all. Off the request thread, the statements building and running the
 * writes stall no other request, and on SQLite the server's one connection stays free for them
 * (readers go on beside the write; WAL).
 */
export async function runImport(
  db: Knex,
  task: ImportTask,
  step: (s: ProgressStep) => void = () => undefined,
): Promise<ImportOutcome> {
  const { of: kind, bytes, mapping, dryRun, sugarbushId, userId } = task;
  step({ phase: 'reading', done: 0, total: 0 });
  const boundary = kind === 'trees' ? await mapRepository(db).boundary(sugarbushId) : null;
  const read = readRows(kind, bytes, mapping, boundary, (done, total) =>
    step({ phase: 'checking', done, total }),
  );
  if (read.fatal) return { fatal: read.fatal };
  const result: ImportResult = {
    kind,
    dryRun,
    source: read.source,
    rows: read.rows,
    created: 0,
    unchanged: read.repeats,
    updated: 0,
    errors: read.errors,
    totalErrors: 0,
    rowsWithErrors: 0,
    warnings: read.warnings,
    totalWarnings: 0,
    truncated: false,
    defaults: {
      species: mapping.defaults.species ?? null,
      status: mapping.defaults.status ?? 'active',
    },
    columns: read.columns,
    preview: read.preview,
  };
  if (read.errors.length > 0 && read.records.length === 0)
    return { result: capped(result, read.waypoints), seasons: [], trees: 0 };

  let changed = 0;
  const seasons = await db.transaction(async (trx) => {
    // Reads, then writes, on the worker's own connection: the lock first (a dry run writes nothing).
    if (!dryRun) await takeWriteLock(trx, 'sugarbushes', sugarbushId);
    const repo = importsRepository(trx, { writePauseMs: task.writePauseMs });
    const trees = await repo.treesByTag(
      sugarbushId,
      read.records.map((r) => r.tag),
    );
    const matched = await match(kind, read, trees, repo, mapping);
    result.errors = [...result.errors, ...matched.errors].sort((a, b) => a.row - b.row);
    result.unchanged += matched.unchanged;
    result.created = matched.create.length;
    result.updated = matched.update.length;
    if (result.errors.length > 0 || dryRun) return [];
    if (matched.create.length + matched.update.length === 0) return [];

    const total = matched.create.length + matched.update.length;
    const written = (done: number) => {
      step({ phase: 'writing', done, total });
      if (task.writePauseMs) noteUncommitted(done, total);
    };
    written(0);
    let touched: number[];
    if (kind === 'trees') {
      const made = await repo.insertTrees(sugarbushId, matched.create as TreeRow[], written);
      const updates = matched.update as unknown as (TreeRow & { id: number })[];
      for (const [i, r] of updates.entries()) {
        await repo.updateTree(r.id, r);
        written(made.length + i + 1);
      }
      touched = [...made, ...matched.update.map((r) => r.id)];
    } else {
      const rows = matched.create as ((MeasurementRow | TapholeRow) & { treeId: number })[];
      if (kind === 'measurements')
        await repo.insertMeasurements(
          rows as (MeasurementRow & { treeId: number })[],
          userId,
          written,
        );
      else await repo.insertTapholes(rows as (TapholeRow & { treeId: number })[], userId, written);
      touched = rows.map((r) => r.treeId);
    }
    await auditRepository(trx).record({
      sugarbushId,
      userId,
      action: 'import',
      entity: auditEntity[kind],
      detail: { rows: result.rows, created: result.created, updated: result.updated },
    });
    changed = new Set(touched).size;
    return recordsImported(trx, sugarbushId, touched);
  });
  return { result: capped(result, read.waypoints), seasons, trees: changed };
}

/**
 * With the crash tests' pause on, a line on stderr after each written batch, straight from this
 * worker thread (the request thread may be waiting on the write lock): a test reads the log to
 * kill the server while the transaction is half written.
 */
function noteUncommitted(done: number, total: number) {
  fs.writeSync(2, `import: ${done} of ${total} rows written, not committed yet\n`);
}

/** Entries of the first `REPORTED_ROWS` rows that have one, in row order. */
function firstRows(entries: readonly ImportRowError[]): ImportRowError[] {
  const rows = new Set<number>();
  const out: ImportRowError[] = [];
  for (const e of entries) {
    if (!rows.has(e.row)) {
      if (rows.size === REPORTED_ROWS) break;
      rows.add(e.row);
    }
    out.push(e);
  }
  return out;
}

/**
 * The report as it crosses back to the request thread: every count, but the entries of the first
 * `REPORTED_ROWS` rows only; a GPX entry names its waypoint.
 */
function capped(result: ImportResult, waypoints: string[] | undefined): ImportResult {
  const byRow = (a: ImportRowError, b: ImportRowError) => a.row - b.row;
  const named = (e: ImportRowError): ImportRowError =>
    waypoints && e.row > 0 ? { ...e, waypoint: waypoints[e.row - 1] ?? '' } : e;
  const errors = [...result.errors].sort(byRow);
  const warnings = [...result.warnings].sort(byRow);
  const shownErrors = firstRows(errors);
  const shownWarnings = firstRows(warnings);
  return {
    ...result,
    errors: shownErrors.map(named),
    totalErrors: errors.length,
    rowsWithErrors: new Set(errors.map((e) => e.row)).size,
    warnings: shownWarnings.map(named),
    totalWarnings: warnings.length,
    truncated: shownErrors.length < errors.length || shownWarnings.length < warnings.length,
  };
}

async function match(
  kind: ImportKind,
  read: ReadRows,
  trees: Awaited<ReturnType<ReturnType<typeof importsRepository>['treesByTag']>>,
  repo: ReturnType<typeof importsRepository>,
  mapping: ImportMapping,
): Promise<Matched<ImportRow>> {
  const ids = [...trees.values()].map((t) => t.id);
  if (kind === 'trees')
    return matchTrees(read.records as TreeRow[], trees, read.columns, mapping.updateExisting);
  if (kind === 'measurements')
    return matchMeasurements(
      read.records as MeasurementRow[],
      trees,
      await repo.measurementsOf(ids),
      read.columns,
    );
  return matchTapholes(
    read.records as TapholeRow[],
    trees,
    await repo.tapholesOf(ids),
    read.columns,
  );
}
