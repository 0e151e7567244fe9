import { Router } from 'express';
import type { AppContext } from '../../context';
import { accessOf, sugarbushAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { complianceQuerySchema, type ComplianceQuery } from '../../../shared/schemas/compliance';
import { complianceCsv, complianceFileName } from './compliance-csv';
import { complianceService } from './compliance.service';

export function complianceRoutes(ctx: AppContext) {
  const router = Router();
  const service = complianceService(ctx);
  // Every member reads how the tapping kept to a guideline, as they read the plan.
  const member = sugarbushAccess(ctx.db);

  router.get(
    '/sugarbushes/:id/compliance',
    member,
    validate({ query: complianceQuerySchema }),
    async (_req, res) => {
      const q = parsed<ComplianceQuery>(res, 'query');
      res.json(await service.report(accessOf(res).sugarbushId, q));
    },
  );

  router.get(
    '/sugarbushes/:id/compliance.csv',
    member,
    validate({ query: complianceQuerySchema }),
    async (_req, res) => {
      const q = parsed<ComplianceQuery>(res, 'query');
      const report = await service.rows(accessOf(res).sugarbushId, q);
      const name = complianceFileName(report.standName, report.season, report.profileKey);
      res
        .type('text/csv; charset=utf-8')
        .attachment(name)
        .set('Cache-Control', 'private, no-store')
        .send(complianceCsv(report));
    },
  );

  return router;
}
