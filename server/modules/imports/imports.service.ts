import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import type { Access } from '../../middleware/auth';
import { zodFields } from '../../middleware/validate';
import { auditRepository } from '../audit/audit.repository';
import {
  importMappingSchema,
  type ImportKind,
  type ImportMapping,
  type ImportResult,
} from '../../../shared/schemas/imports';
import { mapRepository } from '../map/map.repository';
import { importsRepository } from './imports.repository';
import { matchMeasurements, matchTapholes, matchTrees, type Matched } from './match-rows';
import type { ImportRow, MeasurementRow, ReadRows, TapholeRow, TreeRow } from './read-rows';
import { recordsImported } from './records-imported';

const auditEntity: Record<ImportKind, string> = {
  trees: 'tree',
  measurements: 'measurement',
  tapholes: 'taphole',
};

/** The form field `mapping`: JSON, checked by the shared schema; absent means "as the headers say". */
export function readMapping(raw: unknown): ImportMapping {
  if (raw === undefined || raw === '') return importMappingSchema.parse({});
  let json: unknown;
  try {
    json = JSON.parse(String(raw));
  } catch {
    throw new AppError(400, 'invalid-input', 'The mapping is not valid JSON', {
      mapping: 'The mapping is not valid JSON',
    });
  }
  const result = importMappingSchema.safeParse(json);
  if (!result.success) {
    const fields = zodFields(result.error);
    throw new AppError(400, 'invalid-input', 'The mapping needs attention', {
      mapping: Object.entries(fields)
        .map(([k, v]) => `${k}: ${v}`)
        .join('; '),
    });
  }
  return result.data;
}

/**
 * A CSV import: read and checked in a worker, matched against the record, then every row written
 * in one transaction — or, when any row is wrong or it is a dry run, nothing at all.
 */
export function importsService(ctx: AppContext) {
  return {
    async run(
      kind: ImportKind,
      access: Access,
      bytes: Uint8Array,
      mapping: ImportMapping,
      dryRun: boolean,
    ): Promise<ImportResult> {
      const boundary =
        kind === 'trees' ? await mapRepository(ctx.db).boundary(access.sugarbushId) : null;
      const read = await ctx.advice.readImport(kind, bytes, mapping, boundary);
      if (read.fatal) throw new AppError(400, 'invalid-input', read.fatal, { file: read.fatal });
      const result: ImportResult = {
        kind,
        dryRun,
        source: read.source,
        rows: read.rows,
        created: 0,
        unchanged: read.repeats,
        updated: 0,
        errors: read.errors,
        warnings: read.warnings,
        defaults: {
          species: mapping.defaults.species ?? null,
          status: mapping.defaults.status ?? 'active',
        },
        columns: read.columns,
        preview: read.preview,
      };
      if (read.errors.length > 0 && read.records.length === 0) return result;
      const { sugarbushId, userId } = access;

      const seasons = await ctx.db.transaction(async (trx) => {
        const repo = importsRepository(trx);
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

        let touched: number[];
        if (kind === 'trees') {
          await repo.insertTrees(sugarbushId, matched.create as TreeRow[]);
          for (const r of matched.update as unknown as (TreeRow & { id: number })[])
            await repo.updateTree(r.id, r);
          const made = await repo.treesByTag(
            sugarbushId,
            matched.create.map((r) => r.tag),
          );
          touched = [...[...made.values()].map((t) => t.id), ...matched.update.map((r) => r.id)];
        } else {
          const rows = matched.create as ((MeasurementRow | TapholeRow) & { treeId: number })[];
          if (kind === 'measurements')
            await repo.insertMeasurements(rows as (MeasurementRow & { treeId: number })[], userId);
          else await repo.insertTapholes(rows as (TapholeRow & { treeId: number })[], userId);
          touched = rows.map((r) => r.treeId);
        }
        await auditRepository(trx).record({
          sugarbushId,
          userId,
          action: 'import',
          entity: auditEntity[kind],
          detail: { rows: result.rows, created: result.created, updated: result.updated },
        });
        return recordsImported(trx, sugarbushId, touched);
      });
      // Many trees changed: the workers re-advise them before the answer, as a single write's
      // answer waits for its tree's advice.
      for (const season of seasons) await ctx.advice.ensure(sugarbushId, season, { recheck: true });
      return result;
    },
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
