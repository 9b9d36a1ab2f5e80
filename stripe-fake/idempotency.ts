import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { FakeApiError } from './errors';

interface Stored {
  fingerprint: string;
  status: number;
  body: unknown;
  at: number;
}

/** How long the service remembers a key. */
const keyLifetimeMs = 24 * 3600_000;

function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value ?? null);
}

/**
 * `Idempotency-Key` on POST: the first answer under a key (status and body; errors below
 * 500 too, except a refusal of the parameters) is stored and replayed for a repeat with
 * the same path and parameters; a repeat with different ones is refused with
 * `idempotency_error`. The SDK sends a key on every POST, so this runs on nearly every write.
 */
export function idempotency(now: () => number): RequestHandler {
  const store = new Map<string, Stored>();
  return (req: Request, res: Response, next: NextFunction) => {
    const key = req.get('idempotency-key');
    if (req.method !== 'POST' || !key) return next();
    const fingerprint = `${req.method} ${req.originalUrl.split('?')[0]} ${canonical(req.body ?? {})}`;
    const hit = store.get(key);
    if (hit && now() - hit.at < keyLifetimeMs) {
      if (hit.fingerprint !== fingerprint) {
        throw new FakeApiError(400, {
          type: 'idempotency_error',
          message: `The idempotency key '${key}' was first used with other parameters or another path; use a new key for a different request.`,
        });
      }
      res.set('Idempotent-Replayed', 'true');
      res.status(hit.status).json(hit.body);
      return;
    }
    const send = res.json.bind(res);
    res.json = (body: unknown) => {
      // As the service does, a request refused by parameter validation never ran: nothing is kept.
      const code = (body as { error?: { code?: string } } | null)?.error?.code;
      if (res.statusCode < 500 && !code?.startsWith('parameter_')) store.set(key, { fingerprint, status: res.statusCode, body, at: now() });
      return send(body);
    };
    next();
  };
}
