// Refuses a wrong role before the handler runs; services check again themselves.
import type { RequestHandler } from 'express';
import { forbidden } from '../errors';
import { can } from '../policies/permissions';
import type { Permission } from '../policies/permissions';
import { actorOf } from './authenticate';

export function requirePermission(permission: Permission): RequestHandler {
  return (_req, res, next) => {
    if (!can(actorOf(res), permission)) return next(forbidden());
    next();
  };
}
