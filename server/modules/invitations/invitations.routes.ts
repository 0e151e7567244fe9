import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../context';
import { accessOf, requirePermission, sugarbushAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import { logIn } from '../auth/log-in';
import { authService } from '../auth/auth.service';
import {
  acceptInvitationSchema,
  invitationInputSchema,
  type AcceptInvitationAnswer,
  type AcceptInvitationInput,
  type InvitationInput,
} from '../../../shared/schemas/invitation';
import { listQuerySchema, type ListQuery } from '../../../shared/schemas/list-query';
import { invitationsService } from './invitations.service';

const invitationParams = z.object({ invitationId: z.coerce.number().int().positive() });
const tokenParams = z.object({ token: z.string().min(10).max(200) });

/** The owner's side: list, invite, resend, revoke. Behind sign-in. */
export function invitationsRoutes(ctx: AppContext) {
  const router = Router();
  const service = invitationsService(ctx);
  const owner = [sugarbushAccess(ctx.db), requirePermission('manage-members')];

  router.get(
    '/sugarbushes/:id/invitations',
    ...owner,
    validate({ query: listQuerySchema }),
    async (_req, res) => {
      res.json(await service.list(accessOf(res).sugarbushId, parsed<ListQuery>(res, 'query')));
    },
  );

  router.post(
    '/sugarbushes/:id/invitations',
    ...owner,
    validate({ body: invitationInputSchema }),
    async (_req, res) => {
      const body = parsed<InvitationInput>(res, 'body');
      res.status(201).json(await service.invite(accessOf(res), body));
    },
  );

  router.post(
    '/sugarbushes/:id/invitations/:invitationId/resend',
    ...owner,
    validate({ params: invitationParams }),
    async (_req, res) => {
      const { invitationId } = parsed<{ invitationId: number }>(res, 'params');
      res.json(await service.resend(accessOf(res), invitationId));
    },
  );

  router.delete(
    '/sugarbushes/:id/invitations/:invitationId',
    ...owner,
    validate({ params: invitationParams }),
    async (_req, res) => {
      const { invitationId } = parsed<{ invitationId: number }>(res, 'params');
      await service.revoke(accessOf(res), invitationId);
      res.status(204).end();
    },
  );

  return router;
}

/** The invitee's side: the link works before sign-in (it may create the account). */
export function invitationLinkRoutes(ctx: AppContext) {
  const router = Router();
  const service = invitationsService(ctx);
  const auth = authService(ctx);

  router.get('/invitations/:token', validate({ params: tokenParams }), async (req, res) => {
    const { token } = parsed<{ token: string }>(res, 'params');
    res.json(await service.preview(token, req.user));
  });

  router.post(
    '/invitations/:token/accept',
    validate({ params: tokenParams, body: acceptInvitationSchema }),
    async (req, res) => {
      const { token } = parsed<{ token: string }>(res, 'params');
      const body = parsed<AcceptInvitationInput>(res, 'body');
      const result = await service.accept(token, req.user, body);
      if (!req.user) await logIn(req, result.user);
      const answer: AcceptInvitationAnswer = {
        sugarbushId: result.sugarbushId,
        role: result.role,
        me: await auth.me(result.user),
      };
      res.json(answer);
    },
  );

  return router;
}
