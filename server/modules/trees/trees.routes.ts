import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../context';
import { accessOf, requirePermission, sugarbushAccess, treeAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { speciesSchema, treeStatusSchema } from '../../../shared/schemas/enums';
import { listQuerySchema } from '../../../shared/schemas/list-query';
import { seasonSchema } from '../../../shared/schemas/plan';
import { treeInputSchema, treePatchSchema, type TreePatch } from '../../../shared/schemas/tree';
import { treesService } from './trees.service';

export const treeListQuerySchema = listQuerySchema.extend({
  sort: z
    .enum(['tag', '-tag', 'dbh', '-dbh', 'status', '-status', 'species', '-species'])
    .optional(),
  status: treeStatusSchema.optional(),
  species: speciesSchema.optional(),
  /** Trees whose crown rating falls in this 5 % class (the latest, or `diebackSeason`'s). */
  dieback: z.coerce.number().int().min(0).max(100).multipleOf(5).optional(),
  diebackSeason: seasonSchema.optional(),
});
export type TreeListQuery = z.output<typeof treeListQuerySchema>;

export function treesRoutes(ctx: AppContext) {
  const router = Router();
  const service = treesService(ctx);

  router.get(
    '/sugarbushes/:id/trees',
    sugarbushAccess(ctx.db),
    validate({ query: treeListQuerySchema }),
    async (_req, res) => {
      res.json(await service.list(accessOf(res).sugarbushId, parsed<TreeListQuery>(res, 'query')));
    },
  );

  router.post(
    '/sugarbushes/:id/trees',
    sugarbushAccess(ctx.db),
    requirePermission('edit-trees'),
    validate({ body: treeInputSchema }),
    async (_req, res) => {
      const { sugarbushId, userId } = accessOf(res);
      const body = parsed<z.output<typeof treeInputSchema>>(res, 'body');
      res.status(201).json(await service.create(sugarbushId, userId, body));
    },
  );

  router.get('/trees/:treeId', treeAccess(ctx.db), async (_req, res) => {
    res.json(await service.get(res.locals.treeId));
  });

  router.patch(
    '/trees/:treeId',
    treeAccess(ctx.db),
    requirePermission('edit-trees'),
    validate({ body: treePatchSchema }),
    async (_req, res) => {
      const { sugarbushId, userId } = accessOf(res);
      res.json(
        await service.update(
          res.locals.treeId,
          sugarbushId,
          userId,
          parsed<TreePatch>(res, 'body'),
        ),
      );
    },
  );

  return router;
}
