import { Router, type Request, type Response } from 'express';
import type { PassportStatic } from 'passport';
import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { ensureAnonymousId } from '../../lib/anonymous-id';
import { currentUser, requireAuth } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import {
  loginSchema,
  registerConfirmSchema,
  registerSchema,
  resetConfirmSchema,
  resetRequestSchema,
  type LoginInput,
  type PublicUser,
  type RegisterConfirmInput,
  type RegisterInput,
  type ResetConfirmInput,
  type ResetRequestInput,
} from '../../../shared/schemas/auth';
import { authLimits } from './auth-limits';
import { authService } from './auth.service';
import { logIn } from './log-in';

export function authRoutes(
  ctx: AppContext,
  passport: PassportStatic,
  csrfToken: (req: Request, res: Response) => string,
) {
  const router = Router();
  const service = authService(ctx);
  const limits = authLimits(ctx.config, ctx.db);

  router.get('/csrf', (req, res) => {
    ensureAnonymousId(req, res, ctx.config.COOKIE_SECURE);
    res.json({ token: csrfToken(req, res) });
  });

  router.post('/login', ...limits.signIn, validate({ body: loginSchema }), async (req, res) => {
    const { email, password } = parsed<LoginInput>(res, 'body');
    const user = await new Promise<PublicUser | false>((resolve, reject) => {
      req.body = { email, password };
      passport.authenticate('local', { session: false }, (err: unknown, u: PublicUser | false) =>
        err ? reject(err) : resolve(u),
      )(req, res, () => undefined);
    });
    if (!user) throw new AppError(401, 'invalid-credentials', 'E-mail or password is wrong');
    await logIn(req, user);
    res.json(await service.me(user));
  });

  router.post('/logout', (req, res, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy((err2) => {
        if (err2) return next(err2);
        res.clearCookie('clearwood.sid');
        res.status(204).end();
      });
    });
  });

  router.get('/me', requireAuth, async (req, res) => {
    res.json(await service.me(currentUser(req)));
  });

  router.post(
    '/register',
    ...limits.signUp,
    validate({ body: registerSchema }),
    async (_req, res) => {
      res.status(202).json(await service.register(parsed<RegisterInput>(res, 'body')));
    },
  );

  router.post(
    '/register/confirm',
    ...limits.signUp,
    validate({ body: registerConfirmSchema }),
    async (req, res) => {
      const { token } = parsed<RegisterConfirmInput>(res, 'body');
      const user = await service.confirmRegistration(token);
      await logIn(req, user);
      res.status(201).json(await service.me(user));
    },
  );

  router.post(
    '/password-reset',
    ...limits.reset,
    validate({ body: resetRequestSchema }),
    async (_req, res) => {
      const { email } = parsed<ResetRequestInput>(res, 'body');
      res.status(202).json(await service.requestPasswordReset(email));
    },
  );

  router.post(
    '/password-reset/confirm',
    ...limits.signUp,
    validate({ body: resetConfirmSchema }),
    async (_req, res) => {
      const { token, password } = parsed<ResetConfirmInput>(res, 'body');
      await service.confirmPasswordReset(token, password);
      res.json({ ok: true });
    },
  );

  return router;
}
