import { Router } from 'express';
import type { AppContext } from './context';
import { requireAuth } from './middleware/auth';
import { adviceRoutes } from './modules/advice/advice.routes';
import { auditRoutes } from './modules/audit/audit.routes';
import { basemapsRoutes } from './modules/basemaps/basemaps.routes';
import { complianceRoutes } from './modules/compliance/compliance.routes';
import { issuedPlansRoutes } from './modules/issued-plans/issued-plans.routes';
import { exportsRoutes } from './modules/exports/exports.routes';
import { importsRoutes } from './modules/imports/imports.routes';
import { invitationsRoutes } from './modules/invitations/invitations.routes';
import { membersRoutes } from './modules/members/members.routes';
import { mapRoutes } from './modules/map/map.routes';
import { measurementsRoutes } from './modules/measurements/measurements.routes';
import { notesRoutes } from './modules/notes/notes.routes';
import { photosRoutes } from './modules/photos/photos.routes';
import { plansRoutes } from './modules/plans/plans.routes';
import { roundRoutes } from './modules/round/round.routes';
import { sugarbushesRoutes } from './modules/sugarbushes/sugarbushes.routes';
import { tapholesRoutes } from './modules/tapholes/tapholes.routes';
import { treesRoutes } from './modules/trees/trees.routes';
import { trendsRoutes } from './modules/trends/trends.routes';

/** Every API route behind sign-in (the auth routes are mounted before this). */
export function apiRoutes(ctx: AppContext) {
  const router = Router();
  router.use(requireAuth);
  router.use(sugarbushesRoutes(ctx));
  router.use(treesRoutes(ctx));
  router.use(measurementsRoutes(ctx));
  router.use(tapholesRoutes(ctx));
  router.use(notesRoutes(ctx));
  router.use(photosRoutes(ctx));
  router.use(plansRoutes(ctx));
  router.use(issuedPlansRoutes(ctx));
  router.use(adviceRoutes(ctx));
  router.use(mapRoutes(ctx));
  router.use(roundRoutes(ctx));
  router.use(trendsRoutes(ctx));
  router.use(complianceRoutes(ctx));
  router.use(auditRoutes(ctx));
  router.use(basemapsRoutes(ctx));
  router.use(membersRoutes(ctx));
  router.use(invitationsRoutes(ctx));
  router.use(importsRoutes(ctx));
  router.use(exportsRoutes(ctx));
  return router;
}
