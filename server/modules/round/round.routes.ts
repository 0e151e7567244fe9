import { Router } from 'express';
import type { AppContext } from '../../context';
import { accessOf, sugarbushAccess, treeAccess } from '../../middleware/auth';
import { roundSeason } from '../../../shared/schemas/round';
import { roundService } from './round.service';

export function roundRoutes(ctx: AppContext) {
  const router = Router();
  const service = roundService(ctx);

  router.get('/sugarbushes/:id/round', sugarbushAccess(ctx.db), async (_req, res) => {
    res.json(await service.round(accessOf(res).sugarbushId, roundSeason()));
  });

  router.get('/trees/:treeId/record', treeAccess(ctx.db), async (_req, res) => {
    res.json(await service.record(accessOf(res).sugarbushId, res.locals.treeId));
  });

  return router;
}
