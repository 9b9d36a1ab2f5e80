import { Router, type Request, type Response, type NextFunction } from 'express';
import { can } from '../../src/shared/permissions';
import type { Deps } from '../deps';
import { errors } from './errors';
import type { RouteDef } from './route';
import { parseInput } from './validate';
import { readUpload } from './upload';
import { RawJson } from './raw-json';

type Middleware = (req: Request, res: Response, next: NextFunction) => void;

// An empty object is what the JSON parser leaves when nothing was sent; anything else is a body.
const hasBody = (body: unknown) =>
  body !== undefined && !(body !== null && typeof body === 'object' && !Array.isArray(body) && Object.keys(body).length === 0);

/**
 * Mounts the route table: for each route, access first (401, then 403), then input
 * validation (400), then the handler. A handler's return value is the JSON body (a
 * `RawJson` is sent as the text it holds); `undefined` answers 204.
 */
export function buildRouter(routes: RouteDef[], deps: Deps, limiters: { auth: Middleware }): Router {
  const router = Router();
  for (const def of routes) {
    const chain: Middleware[] = [];
    if (def.rateLimit === 'auth') chain.push(limiters.auth);
    router[def.method](def.path, ...chain, async (req: Request, res: Response, next: NextFunction) => {
      try {
        const auth = req.auth ?? null;
        if (def.access !== 'public') {
          if (!auth) throw errors.unauthenticated();
          if (def.access !== 'signedIn' && !can(auth.role, def.access)) throw errors.forbidden();
        }
        const params = def.params ? parseInput(def.params, req.params, 'params') : req.params;
        const query = def.query ? parseInput(def.query, req.query, 'query') : {};
        let body: unknown = undefined;
        let upload: Awaited<ReturnType<typeof readUpload>> | undefined;
        if (def.bodyKind === 'multipart') upload = await readUpload(req, res, def.maxUploadBytes ?? 10 * 1024 * 1024);
        else if (def.bodyKind === 'raw') body = req.body;
        else if (def.body) body = parseInput(def.body, req.body ?? {}, 'body');
        else if (hasBody(req.body)) throw errors.validation('This request takes no body.', [{ path: 'body', message: 'must be empty' }]);
        const result = await def.handler({ req, res, body, params, query, auth, deps, upload } as never);
        if (auth && def.method !== 'get' && res.statusCode < 400) deps.afterWrite?.(auth.workspaceId);
        if (res.headersSent) return;
        if (result === undefined) res.status(def.status ?? 204).end();
        else if (result instanceof RawJson && result.compressed) {
          res.vary('Accept-Encoding');
          res.status(def.status ?? 200).type('application/json').set('Content-Encoding', result.compressed.encoding).send(result.compressed.bytes);
        } else if (result instanceof RawJson) res.status(def.status ?? 200).type('application/json').send(result.text);
        else res.status(def.status ?? 200).json(result);
      } catch (err) {
        next(err);
      }
    });
  }
  return router;
}
