// POST /api/auth/sign-in, POST /api/auth/sign-out.
import { Router } from 'express';
import type { Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Sequelize } from 'sequelize';
import type { SignInRequest } from '@heatpath/contracts';
import type { Config } from '../../config';
import { AppError } from '../../errors';
import { PostgresRateLimitStore } from '../../lib/postgres-rate-limit-store';
import { sessionCookieName } from '../../lib/session-token';
import type { SessionSigner } from '../../lib/session-token';
import { validate } from '../../middlewares/validate';
import { presentMe } from '../../presenters/me.presenter';
import { signInUser } from '../../services/auth/sign-in-user';
import { signInRequestSchema } from './auth.schema';

const tooMany = new AppError(
  'rate_limited',
  'Too many sign-in attempts. Wait a few minutes and try again.',
);

function emailOf(req: Request): string {
  const body = req.body as { email?: unknown } | undefined;
  return typeof body?.email === 'string' ? body.email.trim().toLowerCase().slice(0, 254) : '-';
}

export function authRouter(deps: { config: Config; sequelize: Sequelize; signer: SessionSigner }) {
  const { config, sequelize, signer } = deps;
  const windowMs = config.signInLimits.windowMinutes * 60_000;
  const handler = (_req: Request, _res: unknown, next: (error: unknown) => void) => next(tooMany);
  const perAddress = rateLimit({
    windowMs,
    limit: config.signInLimits.perAddress,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: new PostgresRateLimitStore(sequelize, 'sign-in-address'),
    keyGenerator: (req) => ipKeyGenerator(req.ip ?? '0.0.0.0'),
    handler,
  });
  // Failed attempts per account: a correct password clears nothing but does not count.
  const perAccount = rateLimit({
    windowMs,
    limit: config.signInLimits.perAccount,
    standardHeaders: false,
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    store: new PostgresRateLimitStore(sequelize, 'sign-in-account'),
    keyGenerator: emailOf,
    handler,
  });

  const router = Router();
  const cookieOptions = {
    httpOnly: true,
    sameSite: 'lax' as const,
    secure: config.cookieSecure,
    path: '/',
  };

  router.post(
    '/sign-in',
    perAddress,
    perAccount,
    validate('body', signInRequestSchema),
    async (_req, res) => {
      const input = res.locals.body as SignInRequest;
      const user = await signInUser(input);
      const token = await signer.sign({ userId: user.id, workshopId: user.workshopId });
      res.cookie(sessionCookieName, token, { ...cookieOptions, maxAge: signer.ttlMs });
      res.json({ me: presentMe(user) });
    },
  );

  router.post('/sign-out', (_req, res) => {
    res.clearCookie(sessionCookieName, cookieOptions);
    res.status(204).end();
  });

  return router;
}
