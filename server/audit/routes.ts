import { z } from 'zod';
import { route, type RouteDef } from '../http/route';
import { idParam } from '../../src/shared/schemas/common';
import { listAudit } from './repository';

export const auditRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/audit', access: 'audit.read', tag: 'Workspace',
    summary: 'The audit log: who changed what, when (newest first).',
    query: z.strictObject({ limit: z.coerce.number().int().min(1).max(500).default(100), cursor: idParam.optional() }),
    handler: async ({ auth, query, deps }) => {
      const rows = await listAudit(deps.db, auth.workspaceId, query.limit, query.cursor);
      return {
        items: rows.map((r) => ({ ...r, createdAt: new Date(r.createdAt).toISOString() })),
        nextCursor: rows.length === query.limit ? rows[rows.length - 1].id : null,
      };
    },
  }),
];
