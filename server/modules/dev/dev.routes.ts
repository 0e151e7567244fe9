import { Router, type Request } from 'express';
import type { AppContext } from '../../context';
import { notFoundHandler } from '../../middleware/errors';

const fromLoopback = (req: Request) => {
  // The peer's own address: `X-Forwarded-For` plays no part, so no header can fake loopback.
  const address = req.socket.remoteAddress ?? '';
  return address === '::1' || /^(::ffff:)?127\./.test(address);
};

/**
 * A development view of the local outbox. It shows mail only when `DEV_OUTBOX_VIEW=true`
 * (refused in production) and the request comes from this machine; every other request gets the
 * 404 of a route that does not exist, signed in or not.
 */
export function devRoutes(ctx: AppContext) {
  const router = Router();
  const on = ctx.config.DEV_OUTBOX_VIEW && ctx.config.MAIL_TRANSPORT === 'outbox';
  router.get('/dev/outbox', async (req, res, next) => {
    if (!on || !fromLoopback(req)) return notFoundHandler(req, res, next);
    const rows = await ctx.db('outbox').orderBy('id', 'desc').limit(100);
    const items = rows.map((r) => ({
      id: r.id,
      to: r.to_address,
      subject: r.subject,
      text: r.body,
      createdAt: r.created_at,
    }));
    res.json({ items, total: items.length, page: 1, pageSize: items.length });
  });
  return router;
}
