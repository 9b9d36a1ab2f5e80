import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import Decimal from 'decimal.js';
import currencyCodes from 'currency-codes';
import { startTestApp, signUp, type Agent, type TestApp } from '../helpers/app';
import { workspaceWithEveryRole, type RoleWorkspace } from '../helpers/roles';
import { makePart, makeProfile, makeQuote, makeSupplier } from '../helpers/factories';
import { seedStressPolicies } from '../../server/stress/seed-policies';

const XLSX_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';
const DATE = '2024-07-01';
const NOTE = '=HYPERLINK("http://tinbell.example/x","open")';

let t: TestApp;
let ws: RoleWorkspace;
let bomId: string;
let jpyBomId: string;
let profileId: string;

/** The workbook download, its body as bytes. */
function download(agent: Agent, id: string, query: Record<string, string | number> = { date: DATE }) {
  return agent.get(`/api/boms/${id}/export.xlsx`).query(query).buffer(true).parse((res, cb) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => cb(null, Buffer.concat(chunks)));
  });
}

async function readBook(buffer: Buffer) {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(buffer as unknown as ArrayBuffer);
  return wb;
}

/** Column numbers of a header row, by header text. */
function headerIndex(ws: ExcelJS.Worksheet, rowNumber = 1): Map<string, number> {
  const map = new Map<string, number>();
  ws.getRow(rowNumber).eachCell((cell, col) => map.set(String(cell.value), col));
  return map;
}

function rowWhere(ws: ExcelJS.Worksheet, col: number, value: string): ExcelJS.Row {
  for (let r = 1; r <= ws.rowCount; r++) if (ws.getRow(r).getCell(col).value === value) return ws.getRow(r);
  throw new Error(`no row with ${value} in ${ws.name}`);
}

beforeAll(async () => {
  t = await startTestApp();
  ws = await workspaceWithEveryRole(t, 'Tinbell Gadgets (export)');
  await seedStressPolicies(t.database.db, ws.workspaceId);
  const o = ws.agents.owner;
  // ECB euro reference rates of 2024-06-28 [ECB-FMT; confirmed]: CNY → USD goes through the EUR pivot.
  for (const [quote, rate] of [['USD', '1.0705'], ['CNY', '7.7748'], ['JPY', '171.94']]) {
    await ws.agents.buyer.post('/api/fx-rates').send({ date: '2024-06-28', base: 'EUR', quote, rate }).expect(201);
  }
  const shenzhen = await makeSupplier(o, { name: 'Demo Shenzhen Passives', currency: 'CNY', defaultIncoterm: 'FOB' });
  const rotterdam = await makeSupplier(o, { name: 'Demo Rotterdam Caps', country: 'NL', currency: 'EUR', defaultIncoterm: 'EXW' });
  const dongguan = await makeSupplier(o, { name: 'Demo Dongguan Magnetics', currency: 'USD', defaultIncoterm: 'CIF' });
  const profile = await makeProfile(o, {
    name: 'Sea freight to the US (demo)', currency: 'USD', originPct: '1.5', freightPct: '4', freightPerShipment: '80', freightCurrency: 'EUR',
    shipments: 2, insurancePct: '0.5', dutyBasis: 'CIF', dutyRates: [{ hsPrefix: '8533', ratePct: '2.7' }], defaultDutyPct: '3.7',
    feesPerShipment: '120', destinationPct: '1.2', smtRatePerPlacement: '0.002',
  });
  profileId = profile.id;
  const bleeder = await makePart(o, { internalPn: 'R-22M-1206', mpn: 'TB-RC1206-22M', manufacturer: 'Demo Ohm', hsCode: '8533.21', ratings: { resistanceOhm: '22M', powerW: '1/4W', levV: '200V' } });
  const disc = await makePart(o, { internalPn: 'C-1N-2KV', mpn: 'TB-HV102-2K', manufacturer: 'Demo Disc', category: 'capacitor', hsCode: '8532.24', ratings: { capacitanceF: '1n', ratedVoltageV: '2kV', dielectric: 'hv_ceramic' } });
  const coil = await makePart(o, { internalPn: 'T-ARC-01', mpn: 'TB-ARC-XFMR', manufacturer: 'Demo Coil', category: 'transformer', mount: 'hand', hsCode: '8504.31', ratings: {} });
  const orphan = await makePart(o, { internalPn: 'U-555-NOQ', mpn: 'TB-555', category: 'other', ratings: {} });
  await makeQuote(o, bleeder.id, shenzhen.id, { currency: 'CNY', incoterm: 'FOB', orderMultiple: 5000, priceBreaks: [{ minQty: 5000, unitPrice: '0.0123' }, { minQty: 20000, unitPrice: '0.0098' }] });
  await makeQuote(o, bleeder.id, rotterdam.id, { currency: 'EUR', incoterm: 'EXW', validUntil: '2024-03-31', priceBreaks: [{ minQty: 1, unitPrice: '0.0009' }] });
  await makeQuote(o, disc.id, rotterdam.id, { currency: 'EUR', incoterm: 'EXW', moq: 1000, priceBreaks: [{ minQty: 1000, unitPrice: '0.0214' }, { minQty: 10000, unitPrice: '0.0188' }] });
  await makeQuote(o, coil.id, dongguan.id, { currency: 'USD', incoterm: 'CIF', priceBreaks: [{ minQty: 1, unitPrice: '0.1375' }] });
  await makeQuote(o, coil.id, shenzhen.id, { currency: 'CNY', incoterm: 'DDP', priceBreaks: [{ minQty: 500, unitPrice: '1.02' }] });

  const d = ws.agents.designer;
  const bom = await d.post('/api/boms').send({ name: 'Arc lighter: "Spark" 2/3', reportingCurrency: 'USD', profileId: profile.id, plannedQty: 2000, targetUnitCost: '0.35', ambientC: '40' }).expect(201);
  bomId = bom.body.id;
  const line = (body: Record<string, unknown>) => d.post(`/api/boms/${bomId}/lines`).send(body).expect(201);
  await line({ refDes: '-R1 R2 R3 R4', partId: bleeder.id, qtyPerUnit: '4', attritionPct: '2', operatingPoint: { voltageV: '160V' } });
  await line({ refDes: 'C1', partId: disc.id, qtyPerUnit: '1', operatingPoint: { voltageV: '1.5kV' }, note: NOTE });
  await line({ refDes: 'T1', partId: coil.id, qtyPerUnit: '1' });
  await line({ refDes: 'U1', partId: orphan.id, qtyPerUnit: '1' });
  await line({ refDes: 'R99', partId: bleeder.id, qtyPerUnit: '1', dnp: true });
  await line({ kind: 'labour', qtyPerUnit: '1', unitCost: '0.35', currency: 'CNY', note: '@CM: hand soldering and test' });
  await line({ kind: 'tooling', qtyPerUnit: '1', oneTimeCost: '1200', currency: 'EUR', note: '+HV housing mould' });

  const jpy = await d.post('/api/boms').send({ name: 'Book light', reportingCurrency: 'JPY', plannedQty: 1000 }).expect(201);
  jpyBomId = jpy.body.id;
  await d.post(`/api/boms/${jpyBomId}/lines`).send({ refDes: 'T1', partId: coil.id, qtyPerUnit: '1' }).expect(201);
});
afterAll(async () => t.close());

describe('the costed BOM workbook', () => {
  it('downloads as an attachment named after the BOM and revision, for every role', async () => {
    const res = await download(ws.agents.viewer, bomId);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe(XLSX_TYPE);
    // Quotes, the colon and the slash of the BOM's name cannot go into a file name.
    expect(res.headers['content-disposition']).toBe('attachment; filename="Arc lighter Spark 2 3 rev 1 costed BOM.xlsx"');
    expect((res.body as Buffer).subarray(0, 2).toString()).toBe('PK');
    const other = await signUp(t);
    await download(other.agent, bomId).then((r) => expect(r.status).toBe(404));
    await ws.agents.viewer.get(`/api/boms/${bomId}/export.xlsx`).query({ qty: 0 }).expect(400);
  });

  it('has the five sheets, frozen headers, autofilters, formats and live formulas', async () => {
    const wb = await readBook((await download(ws.agents.buyer, bomId)).body);
    expect(wb.worksheets.map((s) => s.name)).toEqual(['Summary', 'Lines', 'Offers', 'Stress', 'Notes']);
    expect(wb.creator).toBe('Farthing');
    expect(wb.title).toBe('Arc lighter: "Spark" 2/3 rev 1 costed BOM');
    expect(wb.created).toBeInstanceOf(Date);
    for (const sheet of wb.worksheets) expect(sheet.views[0]?.state, sheet.name).toBe('frozen');

    const lines = wb.getWorksheet('Lines')!;
    const col = headerIndex(lines);
    expect(lines.autoFilter).toBe('A1:AN8');
    expect(lines.rowCount).toBe(8);
    const r1 = rowWhere(lines, col.get('Ref designators')!, '-R1 R2 R3 R4');
    const cell = (row: ExcelJS.Row, header: string) => row.getCell(col.get(header)!);
    // Number formats: prices to 6 decimals, USD totals to its 2-digit minor unit, per-unit to 4 [ISO-NPM].
    expect(cell(r1, 'Unit price (quote currency)').numFmt).toBe('#,##0.000000');
    expect(cell(r1, 'Unit price (USD)').numFmt).toBe('#,##0.000000');
    expect(cell(r1, 'Goods value (USD)').numFmt).toBe('#,##0.00');
    expect(cell(r1, 'Landed cost (USD)').numFmt).toBe('#,##0.00');
    expect(cell(r1, 'Landed per unit (USD)').numFmt).toBe('#,##0.0000');
    expect(cell(r1, 'Freight %').numFmt).toBe('0.00##%');
    expect(cell(r1, 'Freight %').value).toBeCloseTo(0.04, 12);
    // Goods, each adder and the landed cost are formulas of the row's own cells.
    const n = r1.number;
    expect(cell(r1, 'Goods value (USD)').formula).toBe(`J${n}*Q${n}`);
    expect(cell(r1, 'Origin (USD)').formula).toBe(`T${n}*R${n}`);
    expect(cell(r1, 'Freight (USD)').formula).toBe(`V${n}*R${n}+W${n}`);
    expect(cell(r1, 'Insurance (USD)').formula).toBe(`Y${n}*1.1*(R${n}+U${n}+X${n})`);
    // FOB quote into a CIF-basis profile: customs value = goods + freight + insurance.
    expect(cell(r1, 'Customs value (USD)').formula).toBe(`R${n}+X${n}+Z${n}`);
    expect(cell(r1, 'Duty (USD)').formula).toBe(`AB${n}*AA${n}`);
    expect(cell(r1, 'Duty %').value).toBeCloseTo(0.027, 12);
    expect(cell(r1, 'Landed cost (USD)').formula).toBe(`R${n}+U${n}+X${n}+Z${n}+AC${n}+AD${n}+AF${n}+AG${n}`);
    expect(cell(r1, 'Landed per unit (USD)').formula).toBe(`AJ${n}/Summary!$B$5`);
    // CNY → USD through the EUR pivot, as a formula over the Summary's FX table.
    expect(cell(r1, 'FX rate to USD').formula).toMatch(/^Summary!\$D\$\d+\/Summary!\$D\$\d+$/);
    const fees = cell(r1, 'Fees per-shipment share (USD)');
    expect(fees.formula).toBeUndefined();
    expect(Number(fees.value)).toBeGreaterThan(0);

    // User text that looks like a formula stays text.
    for (const [row, header, expected] of [
      [r1, 'Ref designators', '-R1 R2 R3 R4'],
      [rowWhere(lines, col.get('Ref designators')!, 'C1'), 'Note', NOTE],
    ] as const) {
      const c = cell(row, header);
      expect(c.type).toBe(ExcelJS.ValueType.String);
      expect(c.formula).toBeUndefined();
      expect(c.value).toBe(expected);
    }
    const labour = rowWhere(lines, col.get('Kind')!, 'labour');
    expect(cell(labour, 'Note').type).toBe(ExcelJS.ValueType.String);
    expect(cell(labour, 'Note').value).toBe('@CM: hand soldering and test');
    expect(cell(labour, 'Cost per unit, cost lines (USD)').formula).toBe(`H${labour.number}*Q${labour.number}`);
    const tooling = rowWhere(lines, col.get('Kind')!, 'tooling');
    expect(cell(tooling, 'Note').value).toBe('+HV housing mould');
    expect(cell(tooling, 'Landed cost (USD)').formula).toBe(`AH${tooling.number}*Summary!$B$5+AI${tooling.number}*Summary!$B$5/Summary!$B$6`);
    // The line without a quote is listed at zero with its reason.
    const u1 = rowWhere(lines, col.get('Ref designators')!, 'U1');
    expect(cell(u1, 'Status').value).toBe('left out');
    expect(cell(u1, 'Landed cost (USD)').value).toBe(0);
    expect(cell(u1, 'Warnings').value).toBe('no_quote');
    const dnp = rowWhere(lines, col.get('Ref designators')!, 'R99');
    expect(cell(dnp, 'Status').value).toBe('DNP');
    expect(cell(dnp, 'Category').value).toBe('resistor');
    expect(cell(dnp, 'Landed cost (USD)').value).toBe(0);

    const summary = wb.getWorksheet('Summary')!;
    const landed = rowWhere(summary, 1, 'Landed cost');
    expect(landed.getCell(2).formula).toBe('SUM(Lines!$AJ$2:$AJ$8)');
    expect(landed.getCell(2).numFmt).toBe('#,##0.00');
    expect(landed.getCell(3).formula).toBe(`B${landed.number}/$B$5`);
    expect(landed.getCell(3).numFmt).toBe('#,##0.0000');
    expect(rowWhere(summary, 1, 'Goods').getCell(2).formula).toBe('SUM(Lines!$R$2:$R$8)');
    expect(rowWhere(summary, 1, 'Gap to target (per unit − target; positive is over)').getCell(3).formula).toMatch(/^C\d+-C\d+$/);
    expect(rowWhere(summary, 1, 'Build quantity').getCell(2).value).toBe(2000);
    expect(rowWhere(summary, 1, 'State').getCell(2).value).toBe('Draft');

    const offers = wb.getWorksheet('Offers')!;
    const oc = headerIndex(offers);
    expect(offers.autoFilter).toMatch(/^A1:S\d+$/);
    const r1Offers: ExcelJS.Row[] = [];
    offers.eachRow((row) => {
      if (row.getCell(oc.get('Ref designators')!).value === '-R1 R2 R3 R4') r1Offers.push(row);
    });
    // Both quotes for the bleeder at 8,160 pieces; the expired one is shown, not chosen.
    expect(r1Offers).toHaveLength(2);
    const chosen = r1Offers.filter((r) => r.getCell(oc.get('Chosen for the line')!).value === 'chosen');
    expect(chosen).toHaveLength(1);
    expect(chosen[0].getCell(oc.get('Supplier')!).value).toBe('Demo Shenzhen Passives');
    const expired = r1Offers.find((r) => r !== chosen[0])!;
    expect(expired.getCell(oc.get('Why not eligible')!).value).toBe('expired');
    expect(expired.getCell(oc.get('Unit price (quote currency)')!).numFmt).toBe('#,##0.000000');

    const stress = wb.getWorksheet('Stress')!;
    expect(String(stress.getCell('A1').value)).toMatch(/High voltage can injure/);
    const sc = headerIndex(stress, 2);
    const cap = rowWhere(stress, sc.get('Ref designators')!, 'C1');
    // 1.5 kV across a 2 kV disc: 75 % against the Shelf-grade 70 % limit for HV ceramics.
    expect(cap.getCell(sc.get('Applied')!).value).toBe(1500);
    expect(cap.getCell(sc.get('Rated')!).value).toBe(2000);
    expect(cap.getCell(sc.get('Ratio')!).value).toBeCloseTo(0.75, 12);
    expect(cap.getCell(sc.get('Limit')!).value).toBeCloseTo(0.7, 12);
    expect(cap.getCell(sc.get('Check status')!).value).toBe('Beyond policy');

    const notes = wb.getWorksheet('Notes')!;
    const texts: string[] = [];
    notes.eachRow((row) => texts.push(`${row.getCell(1).value}: ${row.getCell(2).value}`));
    expect(texts.some((s) => /^Safety: High voltage can injure/.test(s))).toBe(true);
    expect(texts.some((s) => /qualified engineer/.test(s))).toBe(true);
    expect(texts).toContain('Left out of totals: U1 (line 4): no eligible quote');
    expect(texts.filter((s) => s.startsWith('Written as values'))).toEqual([]);
  });

  it('formats JPY totals with no decimals, its ISO 4217 minor unit [ISO-NPM]; a BOM with no rated lines says so on Stress', async () => {
    expect(currencyCodes.code('JPY')?.digits).toBe(0);
    const wb = await readBook((await download(ws.agents.viewer, jpyBomId)).body);
    const lines = wb.getWorksheet('Lines')!;
    const col = headerIndex(lines);
    expect(lines.getRow(2).getCell(col.get('Goods value (JPY)')!).numFmt).toBe('#,##0');
    expect(lines.getRow(2).getCell(col.get('Unit price (JPY)')!).numFmt).toBe('#,##0.000000');
    expect(lines.getRow(2).getCell(col.get('Landed per unit (JPY)')!).numFmt).toBe('#,##0.0000');
    expect(rowWhere(wb.getWorksheet('Summary')!, 1, 'Landed cost').getCell(2).numFmt).toBe('#,##0');
    // The transformer has no stress check: the sheet keeps the caution and says why it is empty.
    const stress = wb.getWorksheet('Stress')!;
    expect(String(stress.getCell('A1').value)).toMatch(/qualified engineer/);
    expect(String(stress.getCell('A3').value)).toMatch(/^No line of this BOM has a stress check/);
    expect(stress.rowCount).toBe(3);
  });
});

// LibreOffice Calc's own recalculation: an outside spreadsheet program computes every
// formula of the exported file (it has no cached results), and its totals must equal the
// cost API's, rounded per the costing rules.
const soffice = process.env.FARTHING_SOFFICE ?? '/usr/bin/soffice';
const haveSoffice = existsSync(soffice);
if (!haveSoffice) {
  console.warn(
    `\n*** SPREADSHEET CHECK SKIPPED: no LibreOffice at ${soffice}. The exported workbook's formulas were NOT recalculated by a spreadsheet program. ` +
      'Install it with: apt-get install -y --no-install-recommends libreoffice-calc (or set FARTHING_SOFFICE). ***\n',
  );
}

/** Minimal RFC 4180 reader: quoted fields may hold commas, quotes and newlines. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  const endField = () => {
    row.push(field);
    field = '';
  };
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') endField();
    else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && text[i + 1] === '\n') i++;
      endField();
      rows.push(row);
      row = [];
    } else field += ch;
  }
  if (field !== '' || row.length) {
    endField();
    rows.push(row);
  }
  return rows;
}

/** Converts every sheet of an xlsx file to CSV with LibreOffice, recalculating every formula. */
function recalculate(xlsx: Buffer): { sheets: Map<string, string[][]>; dir: string } {
  const dir = mkdtempSync(join(tmpdir(), 'farthing-lo-'));
  const profile = join(dir, 'profile');
  mkdirSync(join(profile, 'user'), { recursive: true });
  // OOXMLRecalcMode 0 = always recalculate on load (stack facts §5).
  writeFileSync(
    join(profile, 'user', 'registrymodifications.xcu'),
    '<?xml version="1.0" encoding="UTF-8"?>\n<oor:items xmlns:oor="http://openoffice.org/2001/registry" xmlns:xs="http://www.w3.org/2001/XMLSchema" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">\n' +
      '<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>0</value></prop></item>\n</oor:items>\n',
  );
  const out = join(dir, 'out');
  mkdirSync(out);
  writeFileSync(join(dir, 'costed.xlsx'), xlsx);
  execFileSync(
    soffice,
    ['--headless', '--norestore', '--nolockcheck', `-env:UserInstallation=file://${profile}`, '--convert-to', 'csv:Text - txt - csv (StarCalc):44,34,UTF8,1,,0,false,true,false,false,false,-1', '--outdir', out, join(dir, 'costed.xlsx')],
    { timeout: 120_000, stdio: 'pipe' },
  );
  const sheets = new Map<string, string[][]>();
  for (const f of readdirSync(out)) {
    const m = /^costed-(.+)\.csv$/.exec(f);
    if (m) sheets.set(m[1], parseCsv(readFileSync(join(out, f), 'utf8')));
  }
  return { sheets, dir };
}

const SPREADSHEET_ERRORS = ['#VALUE!', '#REF!', '#NAME?', '#DIV/0!', '#N/A', '#NUM!', 'Err:'];


/** Half-up to `dp` decimals, as the costing rules round for display. */
const round = (v: string, dp: number) => new Decimal(v).toDecimalPlaces(dp, Decimal.ROUND_HALF_UP).toFixed(dp);
/** ISO 4217 minor unit from the npm reference package [ISO-NPM], not from our own table. */
const minorUnit = (code: string) => currencyCodes.code(code)!.digits;

/** The recalculated Summary against the cost API's totals, rounded per the costing rules. */
function expectApiTotals(sheets: Map<string, string[][]>, api: { currency: string; totals: Record<string, string> }, qty: number) {
  expect([...sheets.keys()].sort()).toEqual(['Lines', 'Notes', 'Offers', 'Stress', 'Summary']);
  const errorCells: string[] = [];
  for (const [name, rows] of sheets) {
    rows.forEach((row, r) => row.forEach((value, c) => {
      if (SPREADSHEET_ERRORS.some((e) => value.includes(e))) errorCells.push(`${name} row ${r + 1} column ${c + 1}: ${value}`);
    }));
  }
  expect(errorCells).toEqual([]);
  const summary = sheets.get('Summary')!;
  const find = (label: string) => {
    const row = summary.find((r) => r[0] === label);
    if (!row) throw new Error(`no Summary row ${label}`);
    return row;
  };
  const digits = minorUnit(api.currency);
  expect(find('Build quantity')[1]).toBe(String(qty));
  const totals: [string, string][] = [
    ['Goods', 'goods'], ['Origin', 'origin'], ['Freight', 'freight'], ['Insurance', 'insurance'], ['Duty', 'duty'],
    ['Fees', 'fees'], ['Destination', 'destination'], ['Assembly', 'assembly'], ['Landed cost', 'landedTotal'],
  ];
  for (const [label, key] of totals) {
    expect(round(find(label)[1], digits), label).toBe(round(api.totals[key], digits));
  }
  expect(round(find('Landed cost')[2], 4)).toBe(round(api.totals.landedPerUnit, 4));
  expect(round(find('Cost lines (per-unit costs × build quantity)')[2], 4)).toBe(round(api.totals.costLinesPerUnit, 4));
  expect(round(find('One-time costs, share of this build')[2], 4)).toBe(round(api.totals.oneTimePerUnit, 4));
  const gap = find('Gap to target (per unit − target; positive is over)')[2];
  if (api.totals.gapToTarget === null) expect(gap).toBe('');
  else expect(round(gap, 4)).toBe(round(api.totals.gapToTarget, 4));
}

(haveSoffice ? describe : describe.skip)('LibreOffice Calc recalculates the exported workbook to the API totals', () => {
  it('Summary totals equal GET /cost totals, rounded to the minor unit (per unit to 4 decimals); no cell shows an error', async () => {
    const qty = 3000;
    const api = (await ws.agents.viewer.get(`/api/boms/${bomId}/cost`).query({ qty, date: DATE }).expect(200)).body;
    const res = await download(ws.agents.viewer, bomId, { qty, date: DATE });
    const { sheets, dir } = recalculate(res.body as Buffer);
    try {
      expectApiTotals(sheets, api, qty);
      // Every adder is there, so this BOM exercises each formula.
      for (const key of ['origin', 'freight', 'insurance', 'duty', 'fees', 'destination', 'assembly']) expect(Number(api.totals[key]), key).toBeGreaterThan(0);
      expect(Number(api.totals.gapToTarget)).toBeGreaterThan(0);
      // Line by line too: the recalculated landed cost of each line is the API's.
      const lines = sheets.get('Lines')!;
      const h = lines[0];
      const refCol = h.indexOf('Ref designators');
      const landedCol = h.indexOf('Landed cost (USD)');
      const digits = minorUnit(api.currency);
      for (const l of api.lines as { refDes: string; landed: string; kind: string }[]) {
        if (l.kind !== 'part') continue;
        const row = lines.find((r) => r[refCol] === l.refDes)!;
        expect(round(row[landedCol], digits), l.refDes).toBe(round(l.landed, digits));
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('holds for 5,000 lines too: per-shipment shares written to 6 decimals still add up to the API totals', async () => {
    const id = await bigBomId();
    const api = (await ws.agents.viewer.get(`/api/boms/${id}/cost`).query({ date: DATE }).expect(200)).body;
    for (const key of ['freight', 'fees']) expect(Number(api.totals[key]), key).toBeGreaterThan(0);
    const { sheets, dir } = recalculate((await download(ws.agents.viewer, id)).body as Buffer);
    try {
      expectApiTotals(sheets, api, 5000);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 300_000);
});

let bigBom: Promise<string> | undefined;
/** A 5,000-line BOM made through the bulk line endpoint, once per file, with every adder of the profile. */
function bigBomId(): Promise<string> {
  bigBom ??= (async () => {
    const o = ws.agents.owner;
    const s = await makeSupplier(o, { name: 'Demo Bulk Passives', currency: 'CNY' });
    const parts: { id: string }[] = [];
    for (let i = 0; i < 20; i++) {
      const p = await makePart(o, { internalPn: `R-BULK-${i}`, hsCode: i % 2 ? '8533.21' : '8532.24' });
      await makeQuote(o, p.id, s.id, { currency: 'CNY', incoterm: i % 3 ? 'FOB' : 'EXW', priceBreaks: [{ minQty: 1, unitPrice: '0.0120' }, { minQty: 10000, unitPrice: '0.0085' }] });
      parts.push(p);
    }
    const bom = (await ws.agents.designer.post('/api/boms').send({ name: 'Desk ioniser 5k', reportingCurrency: 'USD', profileId, plannedQty: 5000 }).expect(201)).body;
    const create = Array.from({ length: 5000 }, (_, i) => ({ refDes: `R${i + 1}`, partId: parts[i % parts.length].id, qtyPerUnit: String(1 + (i % 3)) }));
    await ws.agents.designer.post(`/api/boms/${bom.id}/lines/bulk`).send({ create }).expect(200);
    return bom.id as string;
  })();
  return bigBom;
}

describe('a large BOM', () => {
  it('exports 5,000 lines through the streaming writer', async () => {
    const id = await bigBomId();
    const res = await download(ws.agents.viewer, id);
    expect(res.status).toBe(200);
    const wb = await readBook(res.body);
    const lines = wb.getWorksheet('Lines')!;
    expect(lines.rowCount).toBe(5001);
    expect(lines.autoFilter).toBe('A1:AN5001');
    expect(lines.getRow(5001).getCell(2).value).toBe('R5000');
    expect(lines.getRow(5001).getCell(18).formula).toBe('J5001*Q5001');
    expect(rowWhere(wb.getWorksheet('Summary')!, 1, 'Landed cost').getCell(2).formula).toBe('SUM(Lines!$AJ$2:$AJ$5001)');
  }, 180_000);
});
