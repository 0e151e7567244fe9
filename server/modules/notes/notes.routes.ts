import { Router } from 'express';
import type { AppContext } from '../../context';
import {
  accessOf,
  noteAccess,
  requirePermission,
  rowOf,
  sugarbushAccess,
  treeAccess,
} from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import {
  noteChangeSchema,
  noteInputSchema,
  noteListQuerySchema,
  type NoteChange,
  type NoteInput,
  type NoteListQuery,
} from '../../../shared/schemas/note';
import { attentionQuerySchema, type AttentionQuery } from '../../../shared/schemas/attention';
import { attentionService } from './attention.service';
import { notesService } from './notes.service';

export function notesRoutes(ctx: AppContext) {
  const router = Router();
  const service = notesService(ctx);
  const attention = attentionService(ctx);

  router.get(
    '/sugarbushes/:id/attention',
    sugarbushAccess(ctx.db),
    validate({ query: attentionQuerySchema }),
    async (_req, res) => {
      const q = parsed<AttentionQuery>(res, 'query');
      res.json(await attention.queue(accessOf(res).sugarbushId, q));
    },
  );

  router.get(
    '/trees/:treeId/notes',
    treeAccess(ctx.db),
    validate({ query: noteListQuerySchema }),
    async (_req, res) => {
      const q = parsed<NoteListQuery>(res, 'query');
      res.json(await service.list({ treeId: res.locals.treeId }, q));
    },
  );

  router.get(
    '/sugarbushes/:id/notes',
    sugarbushAccess(ctx.db),
    validate({ query: noteListQuerySchema }),
    async (_req, res) => {
      const q = parsed<NoteListQuery>(res, 'query');
      res.json(await service.list({ sugarbushId: accessOf(res).sugarbushId }, q));
    },
  );

  router.post(
    '/trees/:treeId/notes',
    treeAccess(ctx.db),
    requirePermission('write-notes'),
    validate({ body: noteInputSchema }),
    async (_req, res) => {
      const input = parsed<NoteInput>(res, 'body');
      res.status(201).json(await service.create(accessOf(res), res.locals.treeId, input));
    },
  );

  router.post(
    '/sugarbushes/:id/notes',
    sugarbushAccess(ctx.db),
    requirePermission('write-notes'),
    validate({ body: noteInputSchema }),
    async (_req, res) => {
      const input = parsed<NoteInput>(res, 'body');
      res.status(201).json(await service.create(accessOf(res), null, input));
    },
  );

  router.patch(
    '/notes/:noteId',
    noteAccess(ctx.db),
    requirePermission('write-notes'),
    validate({ body: noteChangeSchema }),
    async (_req, res) => {
      const change = parsed<NoteChange>(res, 'body');
      res.json(await service.change(accessOf(res), rowOf(res).id, change));
    },
  );

  return router;
}
