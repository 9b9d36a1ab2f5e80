import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import passport from 'passport';
import { routeTable } from '../../server/routes';
import { can } from '../../src/shared/permissions';
import { roles } from '../../src/shared/schemas/common';
import { startTestApp, type TestApp } from '../helpers/app';
import { workspaceWithEveryRole, type RoleWorkspace } from '../helpers/roles';

// Generated from the route table: a new route is in this matrix the moment it exists.
const routes = routeTable(passport).filter((r) => r.access !== 'public');

let t: TestApp;
let ws: RoleWorkspace;
beforeAll(async () => {
  t = await startTestApp();
  ws = await workspaceWithEveryRole(t);
});
afterAll(async () => t.close());

const concretePath = (path: string) => path.replace(/:[A-Za-z]+/g, '999999999');

describe('every route × every role', () => {
  for (const r of routes) {
    for (const role of roles) {
      const allowed = r.access === 'signedIn' || (r.access !== 'public' && can(role, r.access));
      it(`${r.method.toUpperCase()} ${r.path} as ${role} → ${allowed ? 'allowed' : '403'}`, async () => {
        const res = await ws.agents[role][r.method](concretePath(r.path)).send(r.method === 'get' || r.method === 'delete' ? undefined : {});
        if (allowed) {
          expect(res.status, JSON.stringify(res.body)).not.toBe(403);
          expect(res.status).not.toBe(401);
          expect(res.status).toBeLessThan(500);
        } else {
          expect(res.status).toBe(403);
          expect(res.body.error.code).toBe('forbidden');
        }
      });
    }
  }

  it('signed-out callers get 401 on every non-public route', async () => {
    for (const r of routes) {
      const res = await t.agent()[r.method](concretePath(r.path)).send(r.method === 'get' || r.method === 'delete' ? undefined : {});
      expect(res.status, `${r.method} ${r.path}`).toBe(401);
    }
  });
});
