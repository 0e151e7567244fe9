import { Router } from 'express';
import type { AppContext } from '../../context';
import { accessOf, sugarbushAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { mapQuerySchema, type MapQuery } from '../../../shared/schemas/map';
import { mapService } from './map.service';

export function mapRoutes(ctx: AppContext) {
  const router = Router();
  const service = mapService(ctx);
  const member = sugarbushAccess(ctx.db);

  router.get(
    '/sugarbushes/:id/map',
    member,
    validate({ query: mapQuerySchema }),
    async (_req, res) => {
      const { season } = parsed<MapQuery>(res, 'query');
      res.json(await service.map(accessOf(res).sugarbushId, season));
    },
  );

  router.get(
    '/sugarbushes/:id/figures',
    member,
    validate({ query: mapQuerySchema }),
    async (_req, res) => {
      const { season } = parsed<MapQuery>(res, 'query');
      res.json(await service.figures(accessOf(res).sugarbushId, season));
    },
  );

  return router;
}
