import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deflateRawSync } from 'node:zlib';
import ExcelJS from 'exceljs';
import { startTestApp, type TestApp } from '../helpers/app';
import { snapshot } from '../helpers/db';
import { workspaceWithEveryRole, type RoleWorkspace } from '../helpers/roles';
import { makePart, makeSupplier, tinyPdf } from '../helpers/factories';

let t: TestApp;
let ws: RoleWorkspace;
let bomId: string;
let partId: string;

beforeAll(async () => {
  t = await startTestApp();
  ws = await workspaceWithEveryRole(t, 'Upload Co');
  partId = (await makePart(ws.agents.owner, { internalPn: 'UP-1', mpn: 'UP-MPN' })).id;
  await makeSupplier(ws.agents.owner, { name: 'Upload supplier' });
  bomId = (await ws.agents.designer.post('/api/boms').send({ name: 'Uploads', reportingCurrency: 'USD' }).expect(201)).body.id;
});
afterAll(async () => t.close());

/** A ZIP whose one entry inflates from a few kB to 200 MB. */
function zipBomb(): Buffer {
  const name = Buffer.from('xl/worksheets/sheet1.xml');
  const raw = Buffer.alloc(200 * 1024 * 1024, 0x20);
  const data = deflateRawSync(raw, { level: 9 });
  const local = Buffer.alloc(30);
  local.writeUInt32LE(0x04034b50, 0); local.writeUInt16LE(20, 4); local.writeUInt16LE(8, 8);
  local.writeUInt32LE(0, 14); local.writeUInt32LE(data.length, 18); local.writeUInt32LE(raw.length, 22); local.writeUInt16LE(name.length, 26);
  const central = Buffer.alloc(46);
  central.writeUInt32LE(0x02014b50, 0); central.writeUInt16LE(20, 4); central.writeUInt16LE(20, 6); central.writeUInt16LE(8, 10);
  central.writeUInt32LE(data.length, 20); central.writeUInt32LE(raw.length, 24); central.writeUInt16LE(name.length, 28);
  const cdOffset = local.length + name.length + data.length;
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0); end.writeUInt16LE(1, 8); end.writeUInt16LE(1, 10);
  end.writeUInt32LE(central.length + name.length, 12); end.writeUInt32LE(cdOffset, 16);
  return Buffer.concat([local, name, data, central, name, end]);
}

const routes = () => [
  { name: 'BOM import', post: (buf: Buffer, filename: string) => ws.agents.designer.post(`/api/boms/${bomId}/import`).query({ commit: 'true' }).attach('file', buf, filename) },
  { name: 'quote import', post: (buf: Buffer, filename: string) => ws.agents.buyer.post('/api/quotes/import').query({ commit: 'true' }).attach('file', buf, filename) },
];

describe('upload abuse gets a clear 4xx, writes nothing, and the server stays responsive', () => {
  it('every abusive file, on every import route', async () => {
    const good = new ExcelJS.Workbook();
    good.addWorksheet('S').addRow(['MPN', 'Qty']);
    const goodXlsx = Buffer.from(await good.xlsx.writeBuffer());
    const cases: { what: string; buf: Buffer; filename: string; status: number }[] = [
      { what: 'oversized file', buf: Buffer.alloc(11 * 1024 * 1024, 'a'), filename: 'big.csv', status: 413 },
      { what: 'PDF with a .csv name', buf: tinyPdf, filename: 'lines.csv', status: 415 },
      { what: 'binary with a .xlsx name', buf: Buffer.from([0x7f, 0x45, 0x4c, 0x46, 0, 1, 2, 3]), filename: 'lines.xlsx', status: 415 },
      { what: 'truncated XLSX', buf: goodXlsx.subarray(0, goodXlsx.length - 200), filename: 'cut.xlsx', status: 422 },
      { what: 'corrupt XLSX', buf: Buffer.concat([goodXlsx.subarray(0, 30), Buffer.alloc(500, 7), goodXlsx.subarray(530)]), filename: 'bad.xlsx', status: 422 },
      { what: 'zip bomb posing as XLSX', buf: zipBomb(), filename: 'bomb.xlsx', status: 413 },
      { what: 'CSV with 200,000 rows', buf: Buffer.from('MPN,Qty\n' + 'UP-MPN,1\n'.repeat(200_000)), filename: 'huge.csv', status: 413 },
      { what: 'path tricks in the name', buf: Buffer.from('not,a\nreal,file\n\u0000'), filename: '../../../../etc/passwd', status: 415 },
    ];
    const before = await snapshot(t.database.db);
    for (const route of routes()) {
      for (const c of cases) {
        const res = await route.post(c.buf, c.filename);
        expect(res.status, `${route.name}: ${c.what} → ${JSON.stringify(res.body)}`).toBe(c.status);
        expect(res.body.error.message.length, c.what).toBeGreaterThan(10);
        // Still responsive after each.
        await ws.agents.viewer.get('/api/auth/me').expect(200);
      }
    }
    expect(await snapshot(t.database.db)).toEqual(before);
  }, 120_000);

  it('formula-looking cells stay text in the stored data', async () => {
    const csv = ['Designator,Qty,MPN,Note', '=1+1,1,UP-MPN,"=HYPERLINK(""http://x"",""y"")"', '@SUM(A1),1,UP-MPN,+cmd'].join('\n');
    await ws.agents.designer.post(`/api/boms/${bomId}/import`).query({ commit: 'true' }).attach('file', Buffer.from(csv), 'f.csv').expect(400);
    const ok = ['Designator,Qty,MPN,Note', 'R1,1,UP-MPN,"=HYPERLINK(""http://x"",""y"")"', 'R2,1,UP-MPN,+cmd'].join('\n');
    await ws.agents.designer.post(`/api/boms/${bomId}/import`).query({ commit: 'true' }).attach('file', Buffer.from(ok), 'f.csv').expect(200);
    const notes = (await ws.agents.viewer.get(`/api/boms/${bomId}/lines`)).body.items.map((l: { note: string }) => l.note);
    expect(notes).toEqual(['=HYPERLINK("http://x","y")', '+cmd']);
    void partId;
  });
});
