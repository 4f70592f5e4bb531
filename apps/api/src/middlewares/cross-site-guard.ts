// Cross-site request guard for mutating requests: besides the SameSite=Lax cookie, every
// non-GET request must carry Heatpath's client header, which a cross-site form cannot set and a
// cross-site script cannot send without a CORS pre-flight that Heatpath never grants.
import type { RequestHandler } from 'express';
import { AppError } from '../errors';

export const clientHeader = 'x-heatpath-client';
const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

export const crossSiteGuard: RequestHandler = (req, _res, next) => {
  if (safeMethods.has(req.method)) return next();
  if (!req.get(clientHeader)) {
    return next(
      new AppError(
        'forbidden',
        'This request did not come from the Heatpath app (missing X-Heatpath-Client header).',
      ),
    );
  }
  next();
};
