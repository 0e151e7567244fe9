import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../context';
import { accessOf, requirePermission, sugarbushAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { listQuerySchema } from '../../../shared/schemas/list-query';
import { memberPatchSchema, type MemberPatch } from '../../../shared/schemas/members';
import { membersService, type MemberListQuery } from './members.service';

const memberListQuerySchema = listQuerySchema.extend({
  sort: z.enum(['name', '-name', 'email', '-email', 'role', '-role', 'since', '-since']).optional(),
});
const memberParams = z.object({ userId: z.coerce.number().int().positive() });

export function membersRoutes(ctx: AppContext) {
  const router = Router();
  const service = membersService(ctx);
  const member = sugarbushAccess(ctx.db);

  router.get(
    '/sugarbushes/:id/members',
    member,
    validate({ query: memberListQuerySchema }),
    async (_req, res) => {
      res.json(
        await service.list(accessOf(res).sugarbushId, parsed<MemberListQuery>(res, 'query')),
      );
    },
  );

  router.patch(
    '/sugarbushes/:id/members/:userId',
    member,
    requirePermission('manage-members'),
    validate({ params: memberParams, body: memberPatchSchema }),
    async (_req, res) => {
      const { userId } = parsed<{ userId: number }>(res, 'params');
      res.json(await service.changeRole(accessOf(res), userId, parsed<MemberPatch>(res, 'body')));
    },
  );

  router.delete(
    '/sugarbushes/:id/members/:userId',
    member,
    requirePermission('manage-members'),
    validate({ params: memberParams }),
    async (_req, res) => {
      const { userId } = parsed<{ userId: number }>(res, 'params');
      await service.remove(accessOf(res), userId);
      res.status(204).end();
    },
  );

  return router;
}
