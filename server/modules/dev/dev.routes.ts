import { Router } from 'express';
import type { AppContext } from '../../context';
import { AppError } from '../../errors';

/** Mail held by the local outbox transport; absent (404) with real SMTP or in production. */
export function devRoutes(ctx: AppContext) {
  const router = Router();
  router.get('/dev/outbox', async (_req, res) => {
    const mails = ctx.config.NODE_ENV === 'production' ? null : await ctx.mailer.outbox();
    if (!mails) throw new AppError(404, 'not-found', 'The local outbox is off');
    res.json({ items: mails, total: mails.length, page: 1, pageSize: mails.length });
  });
  return router;
}
