import { Router } from 'express';
import type { AppContext } from '../../context';
import { pageOf } from '../../lib/paging';
import { accessOf, requirePermission, sugarbushAccess, treeAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { auditRepository } from '../audit/audit.repository';
import { listQuerySchema, type ListQuery } from '../../../shared/schemas/list-query';
import { noteInputSchema, type NoteInput } from '../../../shared/schemas/note';
import { notesRepository } from './notes.repository';

export function notesRoutes(ctx: AppContext) {
  const router = Router();
  const repo = notesRepository(ctx.db);
  const audit = auditRepository(ctx.db);

  router.get(
    '/trees/:treeId/notes',
    treeAccess(ctx.db),
    validate({ query: listQuerySchema }),
    async (_req, res) => {
      const q = parsed<ListQuery>(res, 'query');
      res.json(await pageOf(q, (range) => repo.list({ treeId: res.locals.treeId }, range)));
    },
  );

  router.get(
    '/sugarbushes/:id/notes',
    sugarbushAccess(ctx.db),
    validate({ query: listQuerySchema }),
    async (_req, res) => {
      const q = parsed<ListQuery>(res, 'query');
      res.json(
        await pageOf(q, (range) => repo.list({ sugarbushId: accessOf(res).sugarbushId }, range)),
      );
    },
  );

  router.post(
    '/trees/:treeId/notes',
    treeAccess(ctx.db),
    requirePermission('write-notes'),
    validate({ body: noteInputSchema }),
    async (_req, res) => {
      const { sugarbushId, userId } = accessOf(res);
      const note = await repo.create({
        sugarbushId,
        treeId: res.locals.treeId,
        authorId: userId,
        ...parsed<NoteInput>(res, 'body'),
      });
      await audit.record({
        sugarbushId,
        userId,
        action: 'create',
        entity: 'note',
        entityId: note.id,
      });
      res.status(201).json(note);
    },
  );

  return router;
}
