import { Router } from 'express';
import type { AppContext } from '../../context';
import { accessOf, sugarbushAccess } from '../../middleware/auth';
import { trendsService } from './trends.service';

export function trendsRoutes(ctx: AppContext) {
  const router = Router();
  const service = trendsService(ctx);

  // Every member reads the stand's trends, as they read its plan.
  router.get('/sugarbushes/:id/trends', sugarbushAccess(ctx.db), async (_req, res) => {
    res.json(await service.trends(accessOf(res).sugarbushId));
  });

  return router;
}
