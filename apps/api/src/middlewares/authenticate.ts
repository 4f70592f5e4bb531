// Reads the session cookie, checks its session row and loads the person afresh, and puts the
// actor on res.locals.
import type { RequestHandler, Response } from 'express';
import type { User } from '../db/models/index';
import { AppError } from '../errors';
import type { Clock } from '../lib/clock';
import { sessionCookieName } from '../lib/session-token';
import type { SessionSigner } from '../lib/session-token';
import type { Actor } from '../policies/permissions';
import { findSessionUser } from '../services/auth/find-session-user';

export interface AuthLocals {
  actor: Actor;
  user: User;
}

export function authenticate(signer: SessionSigner, clock: Clock): RequestHandler {
  return async (req, res, next) => {
    const cookies = req.cookies as Record<string, string | undefined>;
    const claims = await signer.verify(cookies[sessionCookieName]);
    if (!claims) throw new AppError('unauthenticated', 'Please sign in to continue.');
    const user = await findSessionUser({ ...claims, now: clock() });
    if (!user)
      throw new AppError('unauthenticated', 'Your session has ended. Please sign in again.');
    res.locals.user = user;
    res.locals.actor = {
      userId: user.id,
      workshopId: claims.workshopId,
      role: user.role,
    } satisfies Actor;
    next();
  };
}

export function actorOf(res: Response): Actor {
  const actor = res.locals.actor as Actor | undefined;
  if (!actor) throw new AppError('unauthenticated', 'Please sign in to continue.');
  return actor;
}

export function userOf(res: Response): User {
  const user = res.locals.user as User | undefined;
  if (!user) throw new AppError('unauthenticated', 'Please sign in to continue.');
  return user;
}
