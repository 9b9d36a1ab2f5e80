import type { Request, Response, NextFunction } from 'express';
import { errors } from '../http/errors';

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cross-site request rule: a state-changing request that relies on the session cookie
 * must carry `X-Requested-With: farthing`. A cross-site form cannot set a header, and
 * a cross-site script cannot either without a CORS preflight, which this server never
 * grants. The SameSite=Lax cookie is a second wall. Requests with a Bearer token carry
 * no ambient credentials and are exempt, as are routes that authenticate otherwise
 * (the payment webhook's signature).
 */
export function csrfGuard(exemptPaths: string[]) {
  return (req: Request, _res: Response, next: NextFunction) => {
    if (safeMethods.has(req.method)) return next();
    if (exemptPaths.some((p) => req.path === p || req.path.startsWith(p + '/'))) return next();
    if (req.headers.authorization?.startsWith('Bearer ')) return next();
    if (req.get('x-requested-with') !== 'farthing') {
      return next(errors.forbidden('Cross-site request refused: send the X-Requested-With: farthing header.'));
    }
    next();
  };
}
