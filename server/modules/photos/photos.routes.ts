import { pipeline } from 'node:stream/promises';
import { Router } from 'express';
import type { AppContext } from '../../context';
import {
  accessOf,
  noteAccess,
  photoAccess,
  requirePermission,
  rowOf,
  treeAccess,
} from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { listQuerySchema, type ListQuery } from '../../../shared/schemas/list-query';
import { photoQuerySchema, type PhotoQuery } from '../../../shared/schemas/photo';
import { photosService } from './photos.service';
import { receivePhoto } from './receive-photo';

/** A photo's bytes never change under its id: the browser may keep it for a day. */
const CACHE_CONTROL = 'private, max-age=86400';

export function photosRoutes(ctx: AppContext) {
  const router = Router();
  const service = photosService(ctx);
  const receive = receivePhoto(ctx.config);

  router.get(
    '/trees/:treeId/photos',
    treeAccess(ctx.db),
    validate({ query: listQuerySchema }),
    async (_req, res) => {
      res.json(await service.ofTree(res.locals.treeId, parsed<ListQuery>(res, 'query')));
    },
  );

  router.post(
    '/trees/:treeId/photos',
    treeAccess(ctx.db),
    requirePermission('write-notes'),
    receive,
    async (req, res) => {
      const on = { treeId: res.locals.treeId as number, noteId: null };
      res.status(201).json(await service.upload(accessOf(res), on, req.file!.buffer));
    },
  );

  router.post(
    '/notes/:noteId/photos',
    noteAccess(ctx.db),
    requirePermission('write-notes'),
    receive,
    async (req, res) => {
      const note = rowOf(res);
      const on = { treeId: note.treeId, noteId: note.id };
      res.status(201).json(await service.upload(accessOf(res), on, req.file!.buffer));
    },
  );

  router.get(
    '/photos/:photoId',
    photoAccess(ctx.db),
    validate({ query: photoQuerySchema }),
    async (req, res) => {
      const { size } = parsed<PhotoQuery>(res, 'query');
      const photo = await service.open(rowOf(res).id, size);
      res.set('Cache-Control', CACHE_CONTROL);
      res.set('ETag', photo.etag);
      if (req.get('if-none-match') === photo.etag) {
        photo.body.destroy();
        return res.status(304).end();
      }
      res.type(photo.contentType);
      res.set('Content-Disposition', 'inline');
      try {
        await pipeline(photo.body, res);
      } catch (err) {
        // A reader who goes away mid-image is no error of ours; once bytes are out, stop quietly.
        if (!res.headersSent) throw err;
        res.destroy();
      }
    },
  );

  return router;
}
