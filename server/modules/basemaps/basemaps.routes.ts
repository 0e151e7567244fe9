import { Router } from 'express';
import type { AppContext } from '../../context';
import {
  accessOf,
  currentUser,
  requirePermission,
  sugarbushAccess,
  withAccess,
} from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { listQuerySchema, type ListQuery } from '../../../shared/schemas/list-query';
import { basemapMimeTypes, type Basemap } from '../../../shared/schemas/map';
import { basemapsService } from './basemaps.service';
import { receiveBasemap } from './receive-upload';
import { parseTileCoords } from './tile-coords';
import { tileStore, type TileStore } from './tile-store';

const CACHE_CONTROL = 'private, max-age=86400';

/** Upload, list and serve offline basemaps; `tiles` holds the open read-only files. */
export function basemapsRoutes(ctx: AppContext, tiles: TileStore = tileStore()) {
  const router = Router();
  const service = basemapsService(ctx, tiles);
  const member = sugarbushAccess(ctx.db);
  /** A member of the stand the basemap belongs to, or 404 for the basemap. */
  const basemapMember = withAccess(
    async (req, res, next) => {
      res.locals.basemap = await service.visible(currentUser(req).id, req.params.basemapId);
      next();
    },
    { scope: 'basemap', param: 'basemapId' },
  );

  router.get(
    '/sugarbushes/:id/basemaps',
    member,
    validate({ query: listQuerySchema }),
    async (_req, res) => {
      res.json(await service.list(accessOf(res).sugarbushId, parsed<ListQuery>(res, 'query')));
    },
  );

  router.post(
    '/sugarbushes/:id/basemaps',
    member,
    requirePermission('upload-basemaps'),
    receiveBasemap(ctx.config),
    async (req, res) => {
      res.status(201).json(await service.upload(accessOf(res), req.file!, req.body));
    },
  );

  router.get('/basemaps/:basemapId/:z/:x/:y', basemapMember, async (req, res) => {
    const basemap = res.locals.basemap as Basemap;
    const answer = service.tile(
      basemap,
      parseTileCoords(req.params as Record<string, string>),
      req.get('if-none-match'),
    );
    res.set('Cache-Control', CACHE_CONTROL);
    if (answer.status === 204) return res.status(204).end();
    res.set('ETag', answer.etag);
    if (answer.status === 304) return res.status(304).end();
    res.type(basemapMimeTypes[basemap.format]).send(answer.data);
  });

  return router;
}
