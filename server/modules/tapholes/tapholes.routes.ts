import { Router } from 'express';
import type { AppContext } from '../../context';
import { pageOf } from '../../lib/paging';
import { accessOf, requirePermission, treeAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { auditRepository } from '../audit/audit.repository';
import { listQuerySchema, type ListQuery } from '../../../shared/schemas/list-query';
import { tapholeInputSchema, type TapholeInput } from '../../../shared/schemas/taphole';
import { refreshTrees } from '../advice/refresh-trees';
import { tapholesRepository } from './tapholes.repository';

export function tapholesRoutes(ctx: AppContext) {
  const router = Router();
  const repo = tapholesRepository(ctx.db);

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
      const hole = await ctx.db.transaction(async (trx) => {
        const made = await tapholesRepository(trx).create(treeId, userId, input);
        await auditRepository(trx).record({
          sugarbushId,
          userId,
          action: 'create',
          entity: 'taphole',
          entityId: made.id,
          detail: input,
        });
        await refreshTrees(trx, sugarbushId, [treeId]);
        return made;
      });
      res.status(201).json(hole);
    },
  );

  return router;
}
