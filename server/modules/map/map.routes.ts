import { Router } from 'express';
import type { AppContext } from '../../context';
import { accessOf, sugarbushAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { mapQuerySchema, type MapQuery } from '../../../shared/schemas/map';
import { upcomingSeason } from '../../../shared/schemas/plan';
import { mapService } from './map.service';

export function mapRoutes(ctx: AppContext) {
  const router = Router();
  const service = mapService(ctx);
  const member = sugarbushAccess(ctx.db);

  router.get(
    '/sugarbushes/:id/map',
    member,
    validate({ query: mapQuerySchema }),
    async (req, res) => {
      const { season = upcomingSeason() } = parsed<MapQuery>(res, 'query');
      const { sugarbushId } = accessOf(res);
      const { etag, adviceVersion } = await service.mapVersion(sugarbushId, season);
      // Revalidated on every use; unchanged, the answer is a bodiless 304.
      res.set({ ETag: etag, 'Cache-Control': 'private, no-cache' });
      if (req.fresh) {
        res.status(304).end();
        return;
      }
      res.json(await service.map(sugarbushId, season, adviceVersion));
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
