import type { RequestHandler } from 'express';
import { FakeApiError } from './errors';

/** `Authorization: Bearer <secret key>`, as the SDK sends it; anything else is a 401. */
export function requireSecretKey(secretKey: string): RequestHandler {
  return (req, _res, next) => {
    const header = req.get('authorization') ?? '';
    const given = /^Bearer\s+(.+)$/i.exec(header)?.[1]?.trim();
    if (given === secretKey) return next();
    const message = given
      ? `Invalid API key provided: ${given.slice(0, 8)}…${given.slice(-4)}`
      : 'No API key provided: send it as "Authorization: Bearer <secret key>".';
    next(new FakeApiError(401, { type: 'authentication_error', message }));
  };
}
