import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import type { Access } from '../../middleware/auth';
import { zodFields } from '../../middleware/validate';
import {
  importMappingSchema,
  type ImportKind,
  type ImportMapping,
  type ImportResult,
} from '../../../shared/schemas/imports';
import type { ProgressStep } from './import-progress';
import { PROGRESS_EVERY_MS } from './progress-throttle';

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
 * An import, CSV or GPX: read, matched and written (all rows or none) by a worker thread with its
 * own connection (`runImport`); here only what follows the commit — the advice of many trees.
 */
export function importsService(ctx: AppContext) {
  return {
    async run(
      kind: ImportKind,
      access: Access,
      bytes: Uint8Array,
      mapping: ImportMapping,
      dryRun: boolean,
      /** Each step as the worker reports it; this thread only passes it on. */
      step: (s: ProgressStep) => void = () => undefined,
    ): Promise<ImportResult> {
      const outcome = await ctx.advice.importFile(
        {
          of: kind,
          bytes,
          mapping,
          dryRun,
          sugarbushId: access.sugarbushId,
          userId: access.userId,
          writePauseMs: ctx.config.IMPORT_WRITE_PAUSE_MS,
        },
        step,
      );
      if ('fatal' in outcome)
        throw new AppError(400, 'invalid-input', outcome.fatal, { file: outcome.fatal });
      // Many trees changed: the workers re-advise them before the answer, as a single write's
      // answer waits for its tree's advice.
      // Progress counts each changed tree once a season (a season's job may find a few more).
      const { seasons, trees } = outcome;
      const total = seasons.length * trees;
      for (const [i, season] of seasons.entries()) {
        const report = () => {
          const job = ctx.advice.running(access.sugarbushId, season);
          step({ phase: 'advising', done: i * trees + Math.min(job?.done ?? 0, trees), total });
        };
        report();
        const timer = setInterval(report, PROGRESS_EVERY_MS);
        try {
          await ctx.advice.ensure(access.sugarbushId, season, { recheck: true });
        } finally {
          clearInterval(timer);
        }
      }
      return outcome.result;
    },
  };
}
