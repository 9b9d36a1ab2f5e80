import { z } from 'zod';
import { permissions } from '../../src/shared/permissions';
import type { RouteDef } from './route';

const toJson = (schema: z.ZodType, io: 'input' | 'output') =>
  z.toJSONSchema(schema, { io, unrepresentable: 'any', target: 'draft-2020-12' });

const errorSchema = {
  type: 'object',
  properties: {
    error: {
      type: 'object',
      required: ['code', 'message'],
      properties: {
        code: { type: 'string' },
        message: { type: 'string' },
        details: { type: 'array', items: { type: 'object', properties: { path: { type: 'string' }, message: { type: 'string' } } } },
      },
    },
  },
};

/** The OpenAPI 3.1 document, generated from the same route table and zod schemas the server validates with. */
export function buildOpenApi(routes: RouteDef[]): Record<string, unknown> {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const r of routes) {
    const path = r.path.replace(/:([A-Za-z]+)/g, '{$1}');
    const parameters: unknown[] = [];
    for (const [where, schema] of [['path', r.params], ['query', r.query]] as const) {
      if (!schema) continue;
      const json = toJson(schema, 'input') as { properties?: Record<string, unknown>; required?: string[] };
      for (const [name, s] of Object.entries(json.properties ?? {})) {
        parameters.push({ name, in: where, required: where === 'path' || (json.required ?? []).includes(name), schema: s });
      }
    }
    const roles = r.access === 'public' ? 'anyone' : r.access === 'signedIn' ? 'any member' : permissions[r.access].join(', ');
    const success = String(r.status ?? (r.response ? 200 : 204));
    const op: Record<string, unknown> = {
      tags: [r.tag],
      summary: r.summary,
      description: `Who may call it: ${roles}.`,
      'x-access': r.access,
      parameters,
      responses: {
        [success]: r.response
          ? { description: 'Success', content: { 'application/json': { schema: toJson(r.response, 'output') } } }
          : { description: 'Success' },
        default: { description: 'Error', content: { 'application/json': { schema: errorSchema } } },
      },
    };
    if (r.body) op.requestBody = { required: true, content: { 'application/json': { schema: toJson(r.body, 'input') } } };
    if (r.bodyKind === 'multipart') op.requestBody = { required: true, content: { 'multipart/form-data': { schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' } } } } } };
    (paths[path] ??= {})[r.method] = op;
  }
  return {
    openapi: '3.1.0',
    info: {
      title: 'Farthing API',
      version: '1',
      description:
        'BOM costing, supplier quotes, landed cost and stress checks. Scripts authenticate with `Authorization: Bearer <API token>`; browsers use the session cookie and must send `X-Requested-With: farthing` on every state-changing request.',
    },
    components: {
      securitySchemes: {
        bearer: { type: 'http', scheme: 'bearer' },
        session: { type: 'apiKey', in: 'cookie', name: 'farthing.sid' },
      },
    },
    security: [{ bearer: [] }, { session: [] }],
    paths,
  };
}
