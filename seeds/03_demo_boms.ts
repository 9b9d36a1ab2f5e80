import type { Knex } from 'knex';
import { demoWorkspaceName } from './01_demo_workspace';

/**
 * DEMO DATA — Tinbell's three invented products as BOMs, with operating points so that the
 * stress check shows every status: the arc lighter in two revisions (released, and a
 * cost-down draft whose bleeder string of cheap chips runs beyond policy and whose
 * oscillator transistor moved to a smaller package), the book light in review, and the
 * ioniser draft with an over-rated multiplier diode. Idempotent.
 */
type Line = {
  refDes?: string; pn?: string; qty: string; kind?: string; note?: string; unitCost?: string; oneTimeCost?: string; currency?: string;
  v?: number; i?: number; p?: number; dnp?: boolean;
};

const arcCommon: Line[] = [
  { refDes: 'BT1', pn: 'TB-BAT-LIPO-180', qty: '1' },
  { refDes: 'U1', pn: 'TB-IC-CHG-SOT23', qty: '1', v: 5 },
  { refDes: 'J1', pn: 'TB-USB-C-6P', qty: '1' },
  { refDes: 'SW1', pn: 'TB-SW-TACT-6MM', qty: '1' },
  { refDes: 'C1', pn: 'TB-C-100U-16V-ELEC', qty: '1', v: 5.5 },
  { refDes: 'C2 C3', pn: 'TB-C-100N-16V-0603', qty: '2', v: 5.5 },
  { refDes: 'R1', pn: 'TB-R-10K-0603', qty: '1' },
  { refDes: 'R2', pn: 'TB-R-1K-0603', qty: '1' },
  { refDes: 'LED1', pn: 'TB-L-R-0603', qty: '1', i: 0.008 },
  { refDes: 'T1', pn: 'TB-T-OSC-EE10', qty: '1' },
  { refDes: 'T2', pn: 'TB-T-HV-STEPUP', qty: '1' },
  { refDes: 'C10', pn: 'TB-C-2N2-2KV-DISC', qty: '1', v: 1200 },
  { refDes: 'D1 D2', pn: 'TB-D-2KV-HV', qty: '2', v: 1200, i: 0.001 },
  { refDes: 'PCB1', pn: 'TB-PCB-ARC-2L', qty: '1' },
  { refDes: 'W1', pn: 'TB-WIRE-HV-24', qty: '0.15' },
  { refDes: 'ENC1', pn: 'TB-ENC-ARC', qty: '1' },
  { refDes: 'BOX1', pn: 'TB-PKG-BOX', qty: '1' },
  { kind: 'labour', qty: '1', note: 'Hand assembly and potting of the HV module', unitCost: '0.0600', currency: 'USD' },
  { kind: 'test', qty: '1', note: 'Arc and charge test at end of line', unitCost: '0.0150', currency: 'USD' },
  { kind: 'tooling', qty: '1', note: 'Housing mould (one time)', oneTimeCost: '3200', currency: 'USD' },
];

const arcRev1: Line[] = [
  ...arcCommon,
  // Oscillator: TO-92, 1.2 A peak-ish continuous, 0.25 W.
  { refDes: 'Q1', pn: 'TB-Q-N25-1A5-TO92', qty: '1', v: 12, i: 1.2, p: 0.25 },
  // Bleeder: two leaded HV resistors, 600 V each.
  { refDes: 'R10 R11', pn: 'TB-R-22M-HVAX', qty: '2', v: 600 },
];

const arcRev2: Line[] = [
  ...arcCommon,
  // Cost-down: the same transistor in SOT-23, pushed hard.
  { refDes: 'Q1', pn: 'TB-Q-N25-1A5-SOT23', qty: '1', v: 12, i: 1.2, p: 0.25 },
  // Cost-down: the bleeder as four cheap 1206 chips at 190 V each (LEV 200 V).
  { refDes: 'R10-R13', pn: 'TB-R-22M-1206', qty: '4', v: 190 },
];

const bookLight: Line[] = [
  { refDes: 'LED1-LED3', pn: 'TB-L-W-2835-60MA', qty: '3', i: 0.045 },
  { refDes: 'R1-R3', pn: 'TB-R-4R7-1206', qty: '3', v: 0.2, p: 0.01 },
  { refDes: 'Q1', pn: 'TB-M-N20-4A-SOT23', qty: '1', v: 3.2, i: 0.135, p: 0.02 },
  { refDes: 'SW1', pn: 'TB-SW-SLIDE', qty: '1' },
  { refDes: 'BT1', pn: 'TB-BAT-CR2032', qty: '1' },
  { refDes: 'C1', pn: 'TB-C-1U-16V-0603', qty: '1', v: 3.2 },
  { refDes: 'PCB1', pn: 'TB-PCB-BOOK-1L', qty: '1' },
  { refDes: 'ENC1', pn: 'TB-ENC-BOOK', qty: '1' },
  { refDes: 'PK1', pn: 'TB-PKG-BLISTER', qty: '1' },
  { kind: 'labour', qty: '1', note: 'Clip and housing assembly', unitCost: '0.0250', currency: 'USD' },
  { kind: 'tooling', qty: '1', note: 'Clip mould (one time)', oneTimeCost: '1800', currency: 'USD' },
];

const ioniser: Line[] = [
  { refDes: 'U1', pn: 'TB-IC-OSC-555', qty: '1', v: 12 },
  { refDes: 'Q1', pn: 'TB-Q-N60-3A-SOT89', qty: '1', v: 40, i: 0.6, p: 0.3 },
  { refDes: 'T1', pn: 'TB-T-HV-STEPUP', qty: '1' },
  // Multiplier (three stages, 1.2 kV peak in): capacitors at 2.4 kV, diodes at 2.4 kV.
  { refDes: 'C1-C6', pn: 'TB-C-1N-3KV-DISC', qty: '6', v: 2000 },
  { refDes: 'D1-D6', pn: 'TB-D-2KV-HV', qty: '6', v: 2400, i: 0.0001 },
  { refDes: 'R1', pn: 'TB-R-100M-HVAX', qty: '1', v: 2400 },
  { refDes: 'C10', pn: 'TB-C-470U-10V-ELEC', qty: '1' },
  { refDes: 'R5', pn: 'TB-R-47K-0603', qty: '1', v: 12, p: 0.003 },
  { refDes: 'PCB1', pn: 'TB-PCB-ION-1L', qty: '1' },
  { refDes: 'ENC1', pn: 'TB-ENC-ION', qty: '1' },
  { refDes: 'W1', pn: 'TB-WIRE-HV-24', qty: '0.3' },
  { refDes: 'BOX1', pn: 'TB-PKG-BOX', qty: '1' },
  { kind: 'labour', qty: '1', note: 'HV module assembly and potting', unitCost: '0.0900', currency: 'USD' },
  { kind: 'tooling', qty: '1', note: 'Housing and grille mould (one time)', oneTimeCost: '4500', currency: 'USD' },
];

export async function seed(knex: Knex): Promise<void> {
  const ws = await knex('workspaces').where({ name: demoWorkspaceName }).first('id');
  if (!ws) return;
  if (await knex('boms').where({ workspaceId: ws.id }).first('id')) return;
  const parts = new Map((await knex('parts').where({ workspaceId: ws.id }).select('id', 'internalPn')).map((p: { id: string; internalPn: string }) => [p.internalPn, p.id]));
  const profiles = await knex('landed_cost_profiles').where({ workspaceId: ws.id }).orderBy('id').select('id', 'name');
  const uk = profiles.find((p: { name: string }) => p.name.includes('UK'))?.id ?? null;
  const us = profiles.find((p: { name: string }) => p.name.includes('US'))?.id ?? null;
  const owner = await knex('users').where({ email: 'owner@tinbell.example' }).first('id');

  await knex.transaction(async (trx) => {
    const makeBom = async (b: Record<string, unknown>, lines: Line[], familyId?: string) => {
      const { rows } = await trx.raw(`SELECT nextval(pg_get_serial_sequence('boms', 'id')) AS id`);
      const id = String(rows[0].id);
      await trx('boms').insert({ id, familyId: familyId ?? id, workspaceId: ws.id, ...b, shelf: JSON.stringify(b.shelf ?? {}) });
      await trx('bom_lines').insert(
        lines.map((l, position) => {
          const partId = l.pn ? parts.get(l.pn) : null;
          if (l.pn && !partId) throw new Error(`demo part ${l.pn} is missing`);
          return {
            workspaceId: ws.id, bomId: id, position, kind: l.kind ?? 'part', refDes: l.refDes ?? '', partId: partId ?? null, qtyPerUnit: l.qty,
            note: l.note ?? '', unitCost: l.unitCost ?? null, oneTimeCost: l.oneTimeCost ?? null, currency: l.currency ?? null, dnp: l.dnp ?? false,
            opVoltageV: l.v ?? null, opCurrentA: l.i ?? null, opPowerW: l.p ?? null,
          };
        }),
      );
      return id;
    };
    const arcShelf = { price: '4.99', vatPct: '20', retailerMarginPct: '35', importerMarginPct: '25', freightToStorePerUnit: '0.05' };
    const arc1 = await makeBom({
      name: 'Arc lighter (USB rechargeable)', revision: 1, state: 'released', reportingCurrency: 'GBP', profileId: uk, ambientC: 40, plannedQty: 20000,
      targetUnitCost: '1.60', amortisationQty: 60000, shelf: arcShelf, notes: 'Demo BOM. Revision 1 as first shipped.', releasedAt: trx.fn.now(), releasedBy: owner?.id ?? null,
    }, arcRev1);
    await makeBom({
      name: 'Arc lighter (USB rechargeable)', revision: 2, state: 'draft', reportingCurrency: 'GBP', profileId: uk, ambientC: 40, plannedQty: 20000,
      targetUnitCost: '1.60', amortisationQty: 60000, shelf: arcShelf, notes: 'Demo BOM. Cost-down revision: smaller transistor package, chip bleeder string.',
    }, arcRev2, arc1);
    await makeBom({
      name: 'Clip-on LED book light', revision: 1, state: 'in_review', reportingCurrency: 'USD', profileId: us, ambientC: 30, plannedQty: 50000,
      targetUnitCost: '0.55', shelf: { price: '1.99', vatPct: '0', retailerMarginPct: '40', importerMarginPct: '25', freightToStorePerUnit: '0.03' }, notes: 'Demo BOM.',
    }, bookLight);
    await makeBom({
      name: 'Desk ioniser', revision: 1, state: 'draft', reportingCurrency: 'GBP', profileId: uk, ambientC: 35, plannedQty: 10000,
      targetUnitCost: '2.40', shelf: { price: '9.99', vatPct: '20', retailerMarginPct: '40', importerMarginPct: '25', freightToStorePerUnit: '0.08' }, notes: 'Demo BOM. The multiplier diodes are not yet chosen.',
    }, ioniser);
  });
}
