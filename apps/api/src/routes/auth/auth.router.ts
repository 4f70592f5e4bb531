// POST /api/auth/sign-in, POST /api/auth/sign-out; "forgot password" (POST
// /api/auth/password-reset) and the page an invitation or reset link opens (POST
// /api/auth/set-password/check, POST /api/auth/set-password).
import { Router } from 'express';
import type { Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Sequelize } from 'sequelize';
import type { SetPasswordRequest, SignInRequest } from '@heatpath/contracts';
import type { Config } from '../../config';
import { AppError } from '../../errors';
import { PostgresRateLimitStore } from '../../lib/postgres-rate-limit-store';
import { sessionCookieName } from '../../lib/session-token';
import type { SessionSigner } from '../../lib/session-token';
import type { MailContext } from '../../lib/mail/mail-context';
import { findAccountToken } from '../../services/accounts/find-account-token';
import { requestPasswordReset } from '../../services/accounts/request-password-reset';
import { setPasswordWithToken } from '../../services/accounts/set-password-with-token';
import { validate } from '../../middlewares/validate';
import { presentMe } from '../../presenters/me.presenter';
import { signInUser } from '../../services/auth/sign-in-user';
import {
  accountTokenCheckRequestSchema,
  passwordResetRequestSchema,
  setPasswordRequestSchema,
  signInRequestSchema,
} from './auth.schema';

const tooMany = new AppError(
  'rate_limited',
  'Too many sign-in attempts. Wait a few minutes and try again.',
);

function emailOf(req: Request): string {
  const body = req.body as { email?: unknown } | undefined;
  return typeof body?.email === 'string' ? body.email.trim().toLowerCase().slice(0, 254) : '-';
}

const tooManyResets = new AppError(
  'rate_limited',
  'Too many requests for a new password. Wait a few minutes and try again.',
);

/** The one answer to "forgot password", whether or not an account uses the address. */
export const passwordResetAnswer = (ttlMinutes: number) =>
  `If an active account uses that address, a link to set a new password is on its way. It works once, for ${ttlMinutes} minutes.`;

export function authRouter(deps: {
  config: Config;
  sequelize: Sequelize;
  signer: SessionSigner;
  mail: MailContext;
}) {
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

  // "Forgot password" is limited like sign-in, per address and per account; the account count
  // runs whether or not the account exists, so even a 429 reveals nothing.
  const resetWindowMs = config.passwordResetLimits.windowMinutes * 60_000;
  const resetHandler = (_req: Request, _res: unknown, next: (error: unknown) => void) =>
    next(tooManyResets);
  const resetPerAddress = rateLimit({
    windowMs: resetWindowMs,
    limit: config.passwordResetLimits.perAddress,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: new PostgresRateLimitStore(sequelize, 'reset-address'),
    keyGenerator: (req) => ipKeyGenerator(req.ip ?? '0.0.0.0'),
    handler: resetHandler,
  });
  const resetPerAccount = rateLimit({
    windowMs: resetWindowMs,
    limit: config.passwordResetLimits.perAccount,
    standardHeaders: false,
    legacyHeaders: false,
    store: new PostgresRateLimitStore(sequelize, 'reset-account'),
    keyGenerator: emailOf,
    handler: resetHandler,
  });
  // Links carry 256 random bits; the limit only keeps a script from hammering the endpoint.
  const linkPerAddress = rateLimit({
    windowMs,
    limit: config.signInLimits.perAddress,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: new PostgresRateLimitStore(sequelize, 'link-address'),
    keyGenerator: (req) => ipKeyGenerator(req.ip ?? '0.0.0.0'),
    handler,
  });

  router.post(
    '/password-reset',
    resetPerAddress,
    resetPerAccount,
    validate('body', passwordResetRequestSchema),
    async (_req, res) => {
      const { email } = res.locals.body as { email: string };
      const ttlMinutes = config.accountTokens.passwordResetTtlMinutes;
      await requestPasswordReset({ email, ttlMinutes, mail: deps.mail });
      res.status(202).json({ message: passwordResetAnswer(ttlMinutes) });
    },
  );

  router.post(
    '/set-password/check',
    linkPerAddress,
    validate('body', accountTokenCheckRequestSchema),
    async (_req, res) => {
      const { token } = res.locals.body as { token: string };
      res.json(await findAccountToken({ token }));
    },
  );

  router.post(
    '/set-password',
    linkPerAddress,
    validate('body', setPasswordRequestSchema),
    async (_req, res) => {
      const input = res.locals.body as SetPasswordRequest;
      const user = await setPasswordWithToken(input);
      // The link proved the address: the person is signed in at once.
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
