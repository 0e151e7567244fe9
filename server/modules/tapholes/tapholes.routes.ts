import { Router } from 'express';
import type { AppContext } from '../../context';
import { pageOf } from '../../lib/paging';
import { accessOf, requirePermission, treeAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { listQuerySchema, type ListQuery } from '../../../shared/schemas/list-query';
import { tapholeInputSchema, type TapholeInput } from '../../../shared/schemas/taphole';
import { tapholesRepository } from './tapholes.repository';
import { tapholesService } from './tapholes.service';

export function tapholesRoutes(ctx: AppContext) {
  const router = Router();
  const repo = tapholesRepository(ctx.db);
  const service = tapholesService(ctx);

  router.get(
    '/trees/:treeId/tapholes',
    treeAccess(ctx.db),
    validate({ query: listQuerySchema }),
    async (_req, res) => {
      const q = parsed<ListQuery>(res, 'query');
      res.json(await pageOf(q, (range) => repo.listForTree(res.locals.treeId, range)));
    },
  );

  router.post(
    '/trees/:treeId/tapholes',
    treeAccess(ctx.db),
    requirePermission('record-tapholes'),
    validate({ body: tapholeInputSchema }),
    async (_req, res) => {
      const { sugarbushId, userId } = accessOf(res);
      const treeId = res.locals.treeId as number;
      const input = parsed<TapholeInput>(res, 'body');
      const { entry, created } = await service.record(treeId, sugarbushId, userId, input);
      // A resend of an entry already stored answers 200 with it.
      res.status(created ? 201 : 200).json(entry);
    },
  );

  return router;
}
