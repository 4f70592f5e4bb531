// POST /api/auth/sign-in, POST /api/auth/sign-out; "forgot password" (POST
// /api/auth/password-reset), the page an invitation or reset link opens (POST
// /api/auth/set-password/check, POST /api/auth/set-password) and the link that lifts a pause on
// sign-in (POST /api/auth/unlock).
import { randomUUID } from 'node:crypto';
import { Router } from 'express';
import type { Request, Response } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Sequelize } from 'sequelize';
import { unlockSignInRequestSchema } from '@heatpath/contracts';
import type { Config } from '../../config';
import type { User } from '../../db/models/index';
import { AppError } from '../../errors';
import type { Clock } from '../../lib/clock';
import { deviceCookieName } from '../../lib/device-token';
import type { DeviceSigner } from '../../lib/device-token';
import { PostgresRateLimitStore } from '../../lib/postgres-rate-limit-store';
import { sessionCookieName } from '../../lib/session-token';
import type { SessionSigner } from '../../lib/session-token';
import type { MailContext } from '../../lib/mail/mail-context';
import { unlockSignIn } from '../../services/accounts/unlock-sign-in';
import { endSession } from '../../services/auth/end-session';
import { rememberDevice } from '../../services/auth/remember-device';
import { SignInPaused } from '../../services/auth/sign-in-user';
import { startSession } from '../../services/auth/start-session';
import { findAccountToken } from '../../services/accounts/find-account-token';
import { requestPasswordReset } from '../../services/accounts/request-password-reset';
import { setPasswordWithToken } from '../../services/accounts/set-password-with-token';
import { typedRoute } from '../typed-route';
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

export const signInUnlockedMessage = 'The pause is lifted: you can sign in from any browser again.';

/** The one answer to "forgot password", whether or not an account uses the address. */
export const passwordResetAnswer = (ttlMinutes: number) =>
  `If an active account uses that address, a link to set a new password is on its way. It works once, for ${ttlMinutes} minutes.`;

export function authRouter(deps: {
  config: Config;
  sequelize: Sequelize;
  signer: SessionSigner;
  devices: DeviceSigner;
  clock: Clock;
  mail: MailContext;
}) {
  const { config, sequelize, signer, devices, clock } = deps;
  const windowMs = config.signInLimits.windowMinutes * 60_000;
  const handler = (_req: Request, _res: unknown, next: (error: unknown) => void) => next(tooMany);

  const router = Router();
  const cookieOptions = {
    httpOnly: true,
    sameSite: 'lax' as const,
    secure: config.cookieSecure,
    path: '/',
  };
  // The device cookie is only ever read by sign-in, so it goes nowhere else.
  const deviceCookieOptions = {
    httpOnly: true,
    sameSite: 'strict' as const,
    secure: config.cookieSecure,
    path: '/api/auth',
    maxAge: devices.ttlMs,
  };
  const cookiesOf = (req: Request) => req.cookies as Record<string, string | undefined>;

  /** Starts a session row and hands the browser its cookies. */
  async function signIn(res: Response, user: User, deviceId: string, now: Date) {
    const session = await startSession({
      userId: user.id,
      workshopId: user.workshopId,
      ttlMs: signer.ttlMs,
      now,
    });
    const token = await signer.sign(
      { userId: user.id, workshopId: user.workshopId, sessionId: session.id },
      session.expiresAt,
    );
    res.cookie(sessionCookieName, token, { ...cookieOptions, maxAge: signer.ttlMs });
    res.cookie(deviceCookieName, await devices.sign(deviceId), deviceCookieOptions);
  }

  router.post(
    '/sign-in',
    typedRoute({ body: signInRequestSchema }, async ({ body: input }, res, req) => {
      const now = clock();
      try {
        const { user, deviceId } = await signInUser({
          ...input,
          deviceId: await devices.verify(cookiesOf(req)[deviceCookieName]),
          address: ipKeyGenerator(req.ip ?? '0.0.0.0'),
          limits: config.signInLimits,
          now,
          mail: deps.mail,
          unlockTtlMinutes: config.accountTokens.passwordResetTtlMinutes,
        });
        await signIn(res, user, deviceId, now);
        res.json({ me: presentMe(user) });
      } catch (error) {
        if (error instanceof SignInPaused)
          res.set(
            'Retry-After',
            String(Math.max(1, Math.ceil((error.until.getTime() - now.getTime()) / 1000))),
          );
        throw error;
      }
    }),
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
    typedRoute({ body: passwordResetRequestSchema }, async ({ body: { email } }, res) => {
      const ttlMinutes = config.accountTokens.passwordResetTtlMinutes;
      await requestPasswordReset({ email, ttlMinutes, mail: deps.mail });
      res.status(202).json({ message: passwordResetAnswer(ttlMinutes) });
    }),
  );

  router.post(
    '/set-password/check',
    linkPerAddress,
    typedRoute({ body: accountTokenCheckRequestSchema }, async ({ body: { token } }, res) => {
      res.json(await findAccountToken({ token }));
    }),
  );

  router.post(
    '/set-password',
    linkPerAddress,
    typedRoute({ body: setPasswordRequestSchema }, async ({ body: input }, res, req) => {
      const user = await setPasswordWithToken(input);
      // The link proved the address and the new password ended every other session: the
      // person is signed in here at once, and this browser becomes one they have signed in on.
      const now = clock();
      const deviceId = (await devices.verify(cookiesOf(req)[deviceCookieName])) ?? randomUUID();
      await rememberDevice({ deviceId, user, now });
      await signIn(res, user, deviceId, now);
      res.json({ me: presentMe(user) });
    }),
  );

  router.post(
    '/unlock',
    linkPerAddress,
    typedRoute({ body: unlockSignInRequestSchema }, async ({ body: { token } }, res) => {
      await unlockSignIn({ token });
      res.json({ message: signInUnlockedMessage });
    }),
  );

  // Ends this browser's session for every API process; the device cookie stays, so the
  // browser is still one the person has signed in on.
  router.post('/sign-out', async (req, res) => {
    const claims = await signer.verify(cookiesOf(req)[sessionCookieName]);
    if (claims) await endSession({ sessionId: claims.sessionId, now: clock() });
    res.clearCookie(sessionCookieName, cookieOptions);
    res.status(204).end();
  });

  return router;
}
