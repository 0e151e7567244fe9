import { Router } from 'express';
import type { AppContext } from '../../context';
import { accessOf, requirePermission, sugarbushAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import {
  importKinds,
  importPermission,
  importQuerySchema,
  type ImportQuery,
} from '../../../shared/schemas/imports';
import { importsService, readMapping } from './imports.service';
import { receiveCsv } from './receive-csv';

export function importsRoutes(ctx: AppContext) {
  const router = Router();
  const service = importsService(ctx);
  const receive = receiveCsv(ctx.config);

  for (const kind of importKinds)
    router.post(
      `/sugarbushes/:id/imports/${kind}`,
      sugarbushAccess(ctx.db),
      requirePermission(importPermission[kind]),
      validate({ query: importQuerySchema }),
      receive,
      async (req, res) => {
        const { dryRun = false } = parsed<ImportQuery>(res, 'query');
        const mapping = readMapping((req.body as Record<string, unknown> | undefined)?.mapping);
        const result = await service.run(kind, accessOf(res), req.file!.buffer, mapping, dryRun);
        if (dryRun || result.errors.length === 0)
          return res.status(!dryRun && result.created > 0 ? 201 : 200).json(result);
        // Nothing was written: the report goes with the one error shape, row by row.
        const n = new Set(result.errors.map((e) => e.row)).size;
        res.status(422).json({
          error: {
            code: 'rows-rejected',
            message: `${n === 1 ? 'One row needs' : `${n} rows need`} attention: nothing was imported`,
          },
          ...result,
        });
      },
    );

  return router;
}
