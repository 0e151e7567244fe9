import { Router } from 'express';
import type { AppContext } from '../../context';
import { accessOf, requirePermission, treeAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import {
  measurementInputSchema,
  measurementListQuerySchema,
  type MeasurementInput,
  type MeasurementListQuery,
} from '../../../shared/schemas/measurement';
import { measurementsService } from './measurements.service';

export function measurementsRoutes(ctx: AppContext) {
  const router = Router();
  const service = measurementsService(ctx);

  router.get(
    '/trees/:treeId/measurements',
    treeAccess(ctx.db),
    validate({ query: measurementListQuerySchema }),
    async (_req, res) => {
      res.json(await service.list(res.locals.treeId, parsed<MeasurementListQuery>(res, 'query')));
    },
  );

  router.post(
    '/trees/:treeId/measurements',
    treeAccess(ctx.db),
    requirePermission('record-measurements'),
    validate({ body: measurementInputSchema }),
    async (_req, res) => {
      const { sugarbushId, userId } = accessOf(res);
      const { entry, created } = await service.record(
        res.locals.treeId,
        sugarbushId,
        userId,
        parsed<MeasurementInput>(res, 'body'),
      );
      // A resend of an entry already stored answers 200 with it.
      res.status(created ? 201 : 200).json(entry);
    },
  );

  return router;
}
