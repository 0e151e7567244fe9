import { Router } from 'express';
import type { AppContext } from '../../context';
import { pageOf } from '../../lib/paging';
import { accessOf, requirePermission, sugarbushAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { auditQuerySchema, type AuditPage, type AuditQuery } from '../../../shared/schemas/audit';
import { auditRepository } from './audit.repository';

export function auditRoutes(ctx: AppContext) {
  const router = Router();
  const repo = auditRepository(ctx.db);

  router.get(
    '/sugarbushes/:id/audit',
    sugarbushAccess(ctx.db),
    requirePermission('read-audit'),
    validate({ query: auditQuerySchema }),
    async (_req, res) => {
      const { sugarbushId } = accessOf(res);
      const q = parsed<AuditQuery>(res, 'query');
      const [page, people] = await Promise.all([
        pageOf(q, (range) => repo.list(sugarbushId, { kind: q.kind, userId: q.userId, ...range })),
        repo.people(sugarbushId),
      ]);
      res.json({ ...page, people } satisfies AuditPage);
    },
  );

  return router;
}
