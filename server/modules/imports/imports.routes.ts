import { Router, type RequestHandler } from 'express';
import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { accessOf, requirePermission, sugarbushAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import {
  IMPORT_ID_HEADER,
  importIdSchema,
  importKinds,
  importPermission,
  importProgressParamsSchema,
  importQuerySchema,
  type ImportKind,
  type ImportQuery,
} from '../../../shared/schemas/imports';
import { importProgressStore, type ImportProgressStore } from './import-progress';
import { importsService, readMapping } from './imports.service';
import { receiveCsv } from './receive-csv';

/**
 * With an `x-import-id` header, the import's steps are kept from here on (before the file is
 * received) until a minute after the answer; without one, none are.
 */
function keepProgress(store: ImportProgressStore, kind: ImportKind): RequestHandler {
  return (req, res, next) => {
    const raw = req.get(IMPORT_ID_HEADER);
    if (raw === undefined) return next();
    const id = importIdSchema.safeParse(raw);
    if (!id.success)
      return next(
        new AppError(400, 'invalid-input', 'The import id is not a UUID', {
          importId: 'The import id is not a UUID',
        }),
      );
    const { sugarbushId, userId } = accessOf(res);
    const { dryRun = false } = parsed<ImportQuery>(res, 'query');
    const started = store.start({ sugarbushId, userId, importId: id.data }, { kind, dryRun });
    if (started === 'running')
      return next(new AppError(409, 'import-running', 'An import with this id is still running'));
    if (started === 'too-many')
      return next(
        new AppError(429, 'too-many-imports', 'Several imports are running: wait for one to end'),
      );
    res.locals.importId = id.data;
    // A report with rows to fix (422) is a finished check; anything else is a stop.
    res.once('close', () =>
      store.finish(
        sugarbushId,
        id.data,
        res.writableFinished && (res.statusCode < 300 || res.statusCode === 422),
      ),
    );
    next();
  };
}

export function importsRoutes(ctx: AppContext) {
  const router = Router();
  const service = importsService(ctx);
  const receive = receiveCsv(ctx.config);
  const progress = importProgressStore();

  for (const kind of importKinds)
    router.post(
      `/sugarbushes/:id/imports/${kind}`,
      sugarbushAccess(ctx.db),
      requirePermission(importPermission[kind]),
      validate({ query: importQuerySchema }),
      keepProgress(progress, kind),
      receive,
      async (req, res) => {
        const { dryRun = false } = parsed<ImportQuery>(res, 'query');
        const mapping = readMapping((req.body as Record<string, unknown> | undefined)?.mapping);
        const access = accessOf(res);
        const importId = res.locals.importId as string | undefined;
        const result = await service.run(
          kind,
          access,
          req.file!.buffer,
          mapping,
          dryRun,
          importId ? (step) => progress.step(access.sugarbushId, importId, step) : undefined,
        );
        if (dryRun || result.totalErrors === 0)
          return res.status(!dryRun && result.created > 0 ? 201 : 200).json(result);
        // Nothing was written: the report goes with the one error shape, row by row.
        const n = result.rowsWithErrors;
        res.status(422).json({
          error: {
            code: 'rows-rejected',
            message: `${n === 1 ? 'One row needs' : `${n.toLocaleString('en-US')} rows need`} attention: nothing was imported`,
          },
          ...result,
        });
      },
    );

  // Only the user who started the import reads its steps; a member of another stand gets 404
  // from `sugarbushAccess`, anyone else (or an id not known here) 404 too.
  router.get(
    '/sugarbushes/:id/imports/:importId/progress',
    sugarbushAccess(ctx.db),
    validate({ params: importProgressParamsSchema }),
    (_req, res) => {
      const { sugarbushId, userId } = accessOf(res);
      const { importId } = parsed<{ importId: string }>(res, 'params');
      const state = progress.read(sugarbushId, importId, userId);
      if (!state) throw new AppError(404, 'not-found', 'No import with this id is running');
      res.set('Cache-Control', 'no-store').json(state);
    },
  );

  return router;
}
