import { Router } from 'express';
import type { z } from 'zod';
import type { AppContext } from '../../context';
import { accessOf, requirePermission, sugarbushAccess, treeAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { adviceQuerySchema, planQuerySchema, type PlanQuery } from '../../../shared/schemas/plan';
import {
  guidelinePreviewInputSchema,
  type GuidelinePreviewInput,
} from '../../../shared/schemas/guideline-preview';
import { plansService } from './plans.service';

export function plansRoutes(ctx: AppContext) {
  const router = Router();
  const service = plansService(ctx);

  router.get(
    '/trees/:treeId/advice',
    treeAccess(ctx.db),
    validate({ query: adviceQuerySchema }),
    async (_req, res) => {
      const { season } = parsed<z.output<typeof adviceQuerySchema>>(res, 'query');
      res.json(await service.adviceForTree(accessOf(res).sugarbushId, res.locals.treeId, season));
    },
  );

  router.get(
    '/sugarbushes/:id/plan',
    sugarbushAccess(ctx.db),
    validate({ query: planQuerySchema }),
    async (_req, res) => {
      res
        .type('json')
        .send(
          await service.planForStandJson(
            accessOf(res).sugarbushId,
            parsed<PlanQuery>(res, 'query'),
          ),
        );
    },
  );

  router.post(
    '/sugarbushes/:id/guideline-preview',
    sugarbushAccess(ctx.db),
    requirePermission('choose-guideline'),
    validate({ body: guidelinePreviewInputSchema }),
    async (_req, res) => {
      const body = parsed<GuidelinePreviewInput>(res, 'body');
      res.json(await service.previewGuideline(accessOf(res).sugarbushId, body));
    },
  );

  return router;
}
