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
      const version = await service.mapVersion(sugarbushId, season);
      // Revalidated on every use; unchanged, the answer is a bodiless 304.
      res.set({ ETag: version.etag, 'Cache-Control': 'private, no-cache' });
      res.vary('Accept-Encoding');
      if (req.fresh) {
        res.status(304).end();
        return;
      }
      // Serialised and gzipped in a worker: the compression middleware leaves it as it is.
      const gzip = req.acceptsEncodings('gzip', 'identity') === 'gzip';
      const bytes = await service.mapBytes(sugarbushId, season, version, gzip);
      const body = gzip && bytes.gzip ? bytes.gzip : bytes.json;
      res.locals.encoded = true;
      res.type('application/json');
      if (body === bytes.gzip) res.set('Content-Encoding', 'gzip');
      res.send(Buffer.from(body.buffer, body.byteOffset, body.byteLength));
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
