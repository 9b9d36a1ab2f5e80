import type { NextFunction, Request, Response } from 'express';

export type ErrorType = 'invalid_request_error' | 'authentication_error' | 'card_error' | 'idempotency_error' | 'api_error';

export interface ErrorBody {
  type: ErrorType;
  message: string;
  code?: string;
  param?: string;
  decline_code?: string;
}

/** An error answered in the service's shape, `{error: {type, message, code?, param?}}`; the SDK picks its class by status. */
export class FakeApiError extends Error {
  constructor(
    readonly status: number,
    readonly body: ErrorBody,
  ) {
    super(body.message);
  }
}

const names: Record<string, string> = {
  cus: 'customer', prod: 'product', price: 'price', cs: 'checkout.session', bps: 'billing_portal.session',
  sub: 'subscription', in: 'invoice', si: 'subscription_item', evt: 'event',
};

export function noSuch(id: string, param = 'id'): FakeApiError {
  const kind = names[id.split('_')[0]] ?? 'object';
  return new FakeApiError(404, { type: 'invalid_request_error', code: 'resource_missing', param, message: `No such ${kind}: '${id}'` });
}

export function invalid(message: string, param?: string, code?: string): FakeApiError {
  return new FakeApiError(400, { type: 'invalid_request_error', message, ...(param ? { param } : {}), ...(code ? { code } : {}) });
}

/** The last handler of the JSON routes: every failure leaves in the service's error shape. */
export function jsonErrorHandler(err: unknown, _req: Request, res: Response, _next: NextFunction): void {
  if (err instanceof FakeApiError) {
    res.status(err.status).json({ error: err.body });
    return;
  }
  // body-parser's own errors (a body too large, a bad encoding) carry a 4xx status.
  const status = (err as { status?: number }).status;
  if (typeof status === 'number' && status >= 400 && status < 500) {
    res.status(400).json({ error: { type: 'invalid_request_error', message: (err as Error).message } });
    return;
  }
  res.status(500).json({ error: { type: 'api_error', message: `The local payment fake failed: ${(err as Error)?.message ?? String(err)}` } });
}
