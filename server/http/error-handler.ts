import type { Request, Response, NextFunction } from 'express';
import type { Logger } from 'pino';
import { HttpError, errors } from './errors';
import { mapPgError } from '../db/pg-errors';

interface BodyParserError {
  type?: string;
  status?: number;
}

/** Renders every failure in the API's error shape; clients never see a stack trace. */
export function errorHandler(logger: Logger) {
  return (err: unknown, req: Request, res: Response, _next: NextFunction): void => {
    let httpError: HttpError | null;
    const bp = err as BodyParserError;
    if (bp?.type === 'entity.parse.failed') {
      httpError = errors.validation('The request body is not valid JSON.', [{ path: 'body', message: 'malformed JSON' }]);
    } else if (bp?.type === 'entity.too.large') {
      httpError = errors.tooLarge('The request body is too large.');
    } else if (bp?.type === 'encoding.unsupported' || bp?.type === 'charset.unsupported') {
      httpError = errors.unsupported('The request body has an unsupported encoding.');
    } else {
      httpError = mapPgError(err);
    }
    if (!httpError) {
      logger.error({ err, method: req.method, url: req.originalUrl }, 'unhandled error');
      res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side; the error has been logged.' } });
      return;
    }
    if (httpError.code === 'database_unavailable') {
      logger.warn({ method: req.method, url: req.originalUrl }, 'database unavailable');
      res.setHeader('Retry-After', '3');
    }
    const body: { error: { code: string; message: string; details?: unknown } } = {
      error: { code: httpError.code, message: httpError.message },
    };
    if (httpError.details?.length) body.error.details = httpError.details;
    res.status(httpError.status).json(body);
  };
}
