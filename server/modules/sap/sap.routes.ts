import { Router } from 'express';
import type { AppContext } from '../../context';
import {
  accessOf,
  requirePermission,
  rowOf,
  sapEntryAccess,
  sugarbushAccess,
} from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import {
  sapCorrectionSchema,
  sapEntryInputSchema,
  sapListQuerySchema,
  type SapCorrection,
  type SapEntryInput,
  type SapListQuery,
} from '../../../shared/schemas/sap';
import { sapService } from './sap.service';

export function sapRoutes(ctx: AppContext) {
  const router = Router();
  const service = sapService(ctx);

  router.get(
    '/sugarbushes/:id/sap',
    sugarbushAccess(ctx.db),
    validate({ query: sapListQuerySchema.strict() }),
    async (_req, res) => {
      res.json(await service.list(accessOf(res).sugarbushId, parsed<SapListQuery>(res, 'query')));
    },
  );

  router.post(
    '/sugarbushes/:id/sap',
    sugarbushAccess(ctx.db),
    requirePermission('record-season-log'),
    validate({ body: sapEntryInputSchema }),
    async (_req, res) => {
      const { sugarbushId, userId } = accessOf(res);
      const input = parsed<SapEntryInput>(res, 'body');
      const { entry, created } = await service.record(sugarbushId, userId, input);
      res.status(created ? 201 : 200).json(entry);
    },
  );

  router.patch(
    '/sap/:entryId',
    sapEntryAccess(ctx.db),
    requirePermission('record-season-log'),
    validate({ body: sapCorrectionSchema }),
    async (_req, res) => {
      const { sugarbushId, userId } = accessOf(res);
      res.json(
        await service.correct(
          rowOf(res).id,
          sugarbushId,
          userId,
          parsed<SapCorrection>(res, 'body'),
        ),
      );
    },
  );

  return router;
}
