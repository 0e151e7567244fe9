import { Router } from 'express';
import type { z } from 'zod';
import type { AppContext } from '../../context';
import {
  accessOf,
  currentUser,
  requireAuth,
  requireFieldPermissions,
  sugarbushAccess,
} from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { listQuerySchema, type ListQuery } from '../../../shared/schemas/list-query';
import { sugarbushInputSchema, sugarbushPatchSchema } from '../../../shared/schemas/sugarbush';
import { sugarbushesService } from './sugarbushes.service';

export function sugarbushesRoutes(ctx: AppContext) {
  const router = Router();
  const service = sugarbushesService(ctx);
  const member = sugarbushAccess(ctx.db);

  // Any signed-in person lists the stands they belong to, and may start one of their own.
  router.get(
    '/sugarbushes',
    requireAuth,
    validate({ query: listQuerySchema }),
    async (req, res) => {
      res.json(await service.list(currentUser(req).id, parsed<ListQuery>(res, 'query')));
    },
  );

  router.post(
    '/sugarbushes',
    requireAuth,
    validate({ body: sugarbushInputSchema }),
    async (req, res) => {
      const body = parsed<z.output<typeof sugarbushInputSchema>>(res, 'body');
      res.status(201).json(await service.create(currentUser(req).id, body));
    },
  );

  router.get('/sugarbushes/:id', member, async (_req, res) => {
    const access = accessOf(res);
    res.json(await service.get(access.userId, access.sugarbushId));
  });

  router.patch(
    '/sugarbushes/:id',
    member,
    requireFieldPermissions({
      name: 'manage-stand',
      sunnyAzimuthDeg: 'manage-stand',
      boundary: 'edit-boundary',
      profile: 'choose-guideline',
      customProfile: 'choose-guideline',
    }),
    validate({ body: sugarbushPatchSchema }),
    async (_req, res) => {
      const access = accessOf(res);
      const body = parsed<z.output<typeof sugarbushPatchSchema>>(res, 'body');
      res.json(await service.update(access.userId, access.sugarbushId, body));
    },
  );

  return router;
}
