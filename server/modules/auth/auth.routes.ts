import { Router, type Request, type Response } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { PassportStatic } from 'passport';
import { z } from 'zod';
import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { currentUser, requireAuth } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import {
  loginSchema,
  registerSchema,
  type LoginInput,
  type PublicUser,
  type RegisterInput,
} from '../../../shared/schemas/auth';
import { authService } from './auth.service';

const resetRequestSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter an e-mail address'),
});
const resetConfirmSchema = z.object({
  token: z.string().min(10),
  password: registerSchema.shape.password,
});

const logIn = (req: Request, user: PublicUser) =>
  new Promise<void>((resolve, reject) => req.login(user, (err) => (err ? reject(err) : resolve())));

export function authRoutes(
  ctx: AppContext,
  passport: PassportStatic,
  csrfToken: (req: Request, res: Response) => string,
) {
  const router = Router();
  const service = authService(ctx);
  const loginLimiter = rateLimit({
    windowMs: 15 * 60_000,
    limit: ctx.config.LOGIN_RATE_LIMIT,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) =>
      next(new AppError(429, 'too-many-attempts', 'Too many sign-in attempts: wait a few minutes')),
  });

  router.get('/csrf', (req, res) => {
    // Mark the session so it is stored and its id stays stable for the token.
    (req.session as unknown as { csrf?: boolean }).csrf = true;
    res.json({ token: csrfToken(req, res) });
  });

  router.post('/login', loginLimiter, validate({ body: loginSchema }), async (req, res) => {
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

  router.post('/register', loginLimiter, validate({ body: registerSchema }), async (req, res) => {
    const user = await service.register(parsed<RegisterInput>(res, 'body'));
    await logIn(req, user);
    res.status(201).json(await service.me(user));
  });

  router.post(
    '/password-reset',
    loginLimiter,
    validate({ body: resetRequestSchema }),
    async (_req, res) => {
      await service.requestPasswordReset(parsed<{ email: string }>(res, 'body').email);
      res.status(202).json({ ok: true });
    },
  );

  router.post(
    '/password-reset/confirm',
    validate({ body: resetConfirmSchema }),
    async (_req, res) => {
      const { token, password } = parsed<z.infer<typeof resetConfirmSchema>>(res, 'body');
      await service.confirmPasswordReset(token, password);
      res.json({ ok: true });
    },
  );

  return router;
}
