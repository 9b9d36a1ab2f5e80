import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from '../helpers/app';
import { workspaceWithEveryRole, type RoleWorkspace } from '../helpers/roles';
import { makePart } from '../helpers/factories';

let t: TestApp;
let ws: RoleWorkspace;
let bomId: string;
let partId: string;

beforeAll(async () => {
  t = await startTestApp();
  ws = await workspaceWithEveryRole(t, 'Race Co');
  partId = (await makePart(ws.agents.owner, { internalPn: 'RACE-1', mpn: 'RACE-MPN' })).id;
  bomId = (await ws.agents.designer.post('/api/boms').send({ name: 'Race', reportingCurrency: 'USD' }).expect(201)).body.id;
});
afterAll(async () => t.close());

describe('lost updates', () => {
  it('two clients update the same line with the same version: exactly one wins, the other gets 409, nothing is lost', async () => {
    for (let round = 0; round < 10; round++) {
      const line = (await ws.agents.designer.post(`/api/boms/${bomId}/lines`).send({ partId, qtyPerUnit: '1' }).expect(201)).body;
      const [a, b] = await Promise.all([
        ws.agents.designer.patch(`/api/boms/${bomId}/lines/${line.id}`).send({ qtyPerUnit: '2', version: line.version }),
        ws.agents.owner.patch(`/api/boms/${bomId}/lines/${line.id}`).send({ note: 'owner edit', version: line.version }),
      ]);
      expect([a.status, b.status].sort()).toEqual([200, 409]);
      const winner = a.status === 200 ? a : b;
      const now = (await ws.agents.viewer.get(`/api/boms/${bomId}/lines`)).body.items.find((l: { id: string }) => l.id === line.id);
      expect(now.version).toBe(line.version + 1);
      // The winner's change is there in full; the loser's is nowhere.
      if (winner === a) expect(now).toMatchObject({ qtyPerUnit: '2', note: '' });
      else expect(now).toMatchObject({ qtyPerUnit: '1', note: 'owner edit' });
    }
  });

  it('two imports of the same BOM at once leave it consistent: both whole, positions unique', async () => {
    const csv = ['Designator,Qty,MPN', ...Array.from({ length: 200 }, (_, i) => `R${i + 1},1,RACE-MPN`)].join('\n');
    const target = (await ws.agents.designer.post('/api/boms').send({ name: 'Race import', reportingCurrency: 'USD' }).expect(201)).body.id;
    const [a, b] = await Promise.all([
      ws.agents.designer.post(`/api/boms/${target}/import`).query({ commit: 'true' }).attach('file', Buffer.from(csv), 'a.csv'),
      ws.agents.owner.post(`/api/boms/${target}/import`).query({ commit: 'true' }).attach('file', Buffer.from(csv), 'b.csv'),
    ]);
    expect([a.status, b.status]).toEqual([200, 200]);
    const lines = (await ws.agents.viewer.get(`/api/boms/${target}/lines`)).body.items as { position: number; refDes: string }[];
    expect(lines).toHaveLength(400);
    expect(new Set(lines.map((l) => l.position)).size).toBe(400);
    // Each import is contiguous: no interleaving of the two.
    const firstHalf = lines.slice(0, 200).map((l) => l.refDes);
    expect(firstHalf).toEqual(Array.from({ length: 200 }, (_, i) => `R${i + 1}`));
  });
});
