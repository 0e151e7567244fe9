import { Router } from 'express';
import type { AppContext } from '../../context';
import { accessOf, sugarbushAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { adviceStatusQuerySchema } from '../../../shared/schemas/advice-status';
import { upcomingSeason } from '../../../shared/schemas/plan';

export function adviceRoutes(ctx: AppContext) {
  const router = Router();
  router.get(
    '/sugarbushes/:id/advice-status',
    sugarbushAccess(ctx.db),
    validate({ query: adviceStatusQuerySchema }),
    async (_req, res) => {
      const { season } = parsed<{ season?: number }>(res, 'query');
      res.json(await ctx.advice.status(accessOf(res).sugarbushId, season ?? upcomingSeason()));
    },
  );
  return router;
}
