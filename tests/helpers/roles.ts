import { hashPassword } from '../../server/auth/passwords';
import { seedStressPolicies } from '../../server/stress/seed-policies';
import { roles, type Role } from '../../src/shared/schemas/common';
import type { Agent, TestApp } from './app';

export interface RoleWorkspace {
  workspaceId: string;
  agents: Record<Role, Agent>;
  userIds: Record<Role, string>;
}

let n = 0;
/** A workspace with one signed-in member per role, made directly in the database. */
export async function workspaceWithEveryRole(t: TestApp, name = 'Role Co'): Promise<RoleWorkspace> {
  const db = t.database.db;
  const password = 'role password 123';
  const passwordHash = await hashPassword(password);
  const [ws] = await db('workspaces').insert({ name, plan: 'factory', billingStatus: 'active' }).returning('id');
  // What sign-up gives every workspace.
  await seedStressPolicies(db, ws.id);
  const agents = {} as Record<Role, Agent>;
  const userIds = {} as Record<Role, string>;
  n++;
  for (const role of roles) {
    const email = `${role}-${n}-${Date.now()}@tinbell.example`;
    const [u] = await db('users').insert({ email, name: `${role} ${n}`, passwordHash }).returning('id');
    await db('memberships').insert({ workspaceId: ws.id, userId: u.id, role });
    const agent = t.agent();
    const res = await agent.post('/api/auth/login').send({ email, password });
    if (res.status !== 200) throw new Error(`login as ${role} failed: ${res.status}`);
    agents[role] = agent;
    userIds[role] = u.id;
  }
  return { workspaceId: ws.id, agents, userIds };
}
