import { Router } from 'express';
import type { z } from 'zod';
import type { AppContext } from '../../context';
import { accessOf, requirePermission, sugarbushAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import {
  fieldSheetQuerySchema,
  issuePlanInputSchema,
  issuedPlanQuerySchema,
  issuedSeasonParamsSchema,
  seasonProgressQuerySchema,
  type FieldSheetQuery,
  type IssuePlanInput,
  type IssuedPlanQuery,
} from '../../../shared/schemas/issued-plan';
import { issuedPlansService } from './issued-plans.service';

export function issuedPlansRoutes(ctx: AppContext) {
  const router = Router();
  const service = issuedPlansService(ctx);
  // Every member reads the issued plan, its progress and the field sheet, as they read the plan.
  const member = sugarbushAccess(ctx.db);

  router.post(
    '/sugarbushes/:id/issued-plans',
    member,
    requirePermission('issue-plan'),
    validate({ body: issuePlanInputSchema }),
    async (_req, res) => {
      const { sugarbushId, userId } = accessOf(res);
      const { season } = parsed<IssuePlanInput>(res, 'body');
      res.status(201).json(await service.issue(sugarbushId, userId, season));
    },
  );

  router.get('/sugarbushes/:id/issued-plans', member, async (_req, res) => {
    res.json(await service.versions(accessOf(res).sugarbushId));
  });

  router.get(
    '/sugarbushes/:id/issued-plans/:season',
    member,
    validate({ params: issuedSeasonParamsSchema, query: issuedPlanQuerySchema }),
    async (_req, res) => {
      const { season } = parsed<z.output<typeof issuedSeasonParamsSchema>>(res, 'params');
      const q = parsed<IssuedPlanQuery>(res, 'query');
      res.json(await service.read(accessOf(res).sugarbushId, season, q));
    },
  );

  router.get(
    '/sugarbushes/:id/plan/progress',
    member,
    validate({ query: seasonProgressQuerySchema }),
    async (_req, res) => {
      const { season } = parsed<z.output<typeof seasonProgressQuerySchema>>(res, 'query');
      res.json(await service.progress(accessOf(res).sugarbushId, season));
    },
  );

  router.get(
    '/sugarbushes/:id/plan/field-sheet',
    member,
    validate({ query: fieldSheetQuerySchema }),
    async (_req, res) => {
      res.json(
        await service.fieldSheet(accessOf(res).sugarbushId, parsed<FieldSheetQuery>(res, 'query')),
      );
    },
  );

  return router;
}
