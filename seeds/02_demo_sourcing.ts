import type { Knex } from 'knex';
import { demoWorkspaceName } from './01_demo_workspace';

/**
 * DEMO DATA — invented parts, makers, suppliers, prices and rates for Tinbell Gadgets.
 * None of it describes a real product or offer. Idempotent: does nothing once the demo
 * workspace has parts. Quotes and FX rates are dated relative to the day it runs, so the
 * demo always has current offers.
 */

// A small deterministic generator so every fresh demo looks the same.
function rng(seed: number) {
  let s = seed >>> 0;
  return () => {
    s = (s * 1664525 + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

const day = (offset: number) => new Date(Date.now() + offset * 86400_000).toISOString().slice(0, 10);

type PartSeed = {
  internalPn: string; mpn: string; manufacturer: string; category: string; description: string; package: string;
  mount: string; pins: number; hsCode: string | null; unitWeightG: string | null; ratings: Record<string, unknown>; basePrice: number;
};

function demoParts(): PartSeed[] {
  const parts: PartSeed[] = [];
  const res = (val: string, ohm: number, pkg: string, p: number, lev: number, price: number, maker = 'Harbour Passives (demo)') =>
    parts.push({ internalPn: `TB-R-${val}-${pkg}`, mpn: `HP-R${pkg}-${val}`, manufacturer: maker, category: 'resistor', description: `Thick-film chip resistor ${val}`, package: pkg, mount: 'smt', pins: 2, hsCode: '853321', unitWeightG: pkg === '1206' ? '0.0090' : '0.0020', ratings: { resistanceOhm: ohm, powerW: p, levV: lev, tolerancePct: 5 }, basePrice: price });
  res('100R', 100, '0603', 0.1, 75, 0.0009); res('1K', 1000, '0603', 0.1, 75, 0.0009); res('4K7', 4700, '0603', 0.1, 75, 0.0009);
  res('10K', 10000, '0603', 0.1, 75, 0.0008); res('47K', 47000, '0603', 0.1, 75, 0.0009); res('100K', 100000, '0603', 0.1, 75, 0.0009);
  res('1M', 1e6, '0603', 0.1, 75, 0.0010); res('10K', 10000, '1206', 0.25, 200, 0.0016); res('1M', 1e6, '1206', 0.25, 200, 0.0018);
  res('10M', 10e6, '1206', 0.25, 200, 0.0021); res('22M', 22e6, '1206', 0.25, 200, 0.0024); res('4R7', 4.7, '1206', 0.25, 200, 0.0017);
  // High-voltage bleeder resistors: the cheap chip above and HV parts that pass.
  parts.push({ internalPn: 'TB-R-22M-HV1206', mpn: 'KV-HV1206-22M', manufacturer: 'Kestrel Resistive (demo)', category: 'resistor', description: 'High-voltage thick-film chip 22 MΩ, 800 V', package: '1206', mount: 'smt', pins: 2, hsCode: '853321', unitWeightG: '0.0090', ratings: { resistanceOhm: 22e6, powerW: 0.25, levV: 800, tolerancePct: 5 }, basePrice: 0.0095 });
  parts.push({ internalPn: 'TB-R-22M-HVAX', mpn: 'KV-GLZ25-22M', manufacturer: 'Kestrel Resistive (demo)', category: 'resistor', description: 'Metal-glaze HV leaded resistor 22 MΩ, 1.6 kV', package: 'Axial 0207', mount: 'tht', pins: 2, hsCode: '853310', unitWeightG: '0.2100', ratings: { resistanceOhm: 22e6, powerW: 0.25, levV: 1600, tolerancePct: 5 }, basePrice: 0.0180 });
  parts.push({ internalPn: 'TB-R-100M-HVAX', mpn: 'KV-GLZ37-100M', manufacturer: 'Kestrel Resistive (demo)', category: 'resistor', description: 'Metal-glaze HV leaded resistor 100 MΩ, 3.5 kV', package: 'Axial 0309', mount: 'tht', pins: 2, hsCode: '853310', unitWeightG: '0.3500', ratings: { resistanceOhm: 100e6, powerW: 0.5, levV: 3500, tolerancePct: 5 }, basePrice: 0.0420 });
  parts.push({ internalPn: 'TB-R-1R-SENSE', mpn: 'HP-R2512-1R0', manufacturer: 'Harbour Passives (demo)', category: 'resistor', description: 'Current-sense chip 1 Ω', package: '2512', mount: 'smt', pins: 2, hsCode: '853321', unitWeightG: '0.0400', ratings: { resistanceOhm: 1, powerW: 1, levV: 200, tolerancePct: 1 }, basePrice: 0.0065 });

  const cap = (pn: string, c: number, v: number, d: string, pkg: string, price: number, mount = 'smt', w = '0.0050') =>
    parts.push({ internalPn: `TB-C-${pn}`, mpn: `HP-C-${pn}`, manufacturer: d === 'hv_ceramic' ? 'Lotus Ceramics (demo)' : 'Harbour Passives (demo)', category: 'capacitor', description: `${d.replace('_', ' ')} capacitor ${pn}`, package: pkg, mount, pins: 2, hsCode: d === 'al_electrolytic' ? '853222' : d === 'film' ? '853225' : d === 'hv_ceramic' ? '853223' : '853224', unitWeightG: w, ratings: { capacitanceF: c, ratedVoltageV: v, dielectric: d }, basePrice: price });
  cap('100N-16V-0603', 100e-9, 16, 'x7r', '0603', 0.0012); cap('1U-16V-0603', 1e-6, 16, 'x5r', '0603', 0.0020);
  cap('10U-10V-0805', 10e-6, 10, 'x5r', '0805', 0.0045); cap('100P-50V-0603', 100e-12, 50, 'c0g', '0603', 0.0011);
  cap('2N2-2KV-DISC', 2.2e-9, 2000, 'hv_ceramic', 'Disc 7 mm', 0.0140, 'tht', '0.3000');
  cap('1N-3KV-DISC', 1e-9, 3000, 'hv_ceramic', 'Disc 8 mm', 0.0190, 'tht', '0.3500');
  cap('1N-6KV-DISC', 1e-9, 6000, 'hv_ceramic', 'Disc 10 mm', 0.0330, 'tht', '0.5000');
  cap('2N2-1KV-1206', 2.2e-9, 1000, 'hv_ceramic', '1206', 0.0085);
  cap('100U-16V-ELEC', 100e-6, 16, 'al_electrolytic', 'Radial 5x11', 0.0160, 'tht', '0.4000');
  cap('470U-10V-ELEC', 470e-6, 10, 'al_electrolytic', 'Radial 6x11', 0.0210, 'tht', '0.6000');
  cap('100N-275V-X2', 100e-9, 275, 'film', 'Radial P10', 0.0380, 'tht', '0.9000');
  cap('10U-16V-TANT', 10e-6, 16, 'tantalum', '1206 case A', 0.0300);

  const bjt = (pn: string, pkg: string, ic: number, vceo: number, pd: number, rth: number, price: number) =>
    parts.push({ internalPn: `TB-Q-${pn}`, mpn: `KS-${pn}`, manufacturer: 'Kestrel Semi (demo)', category: 'bjt', description: `NPN transistor ${pn}`, package: pkg, mount: pkg === 'TO-92' ? 'tht' : 'smt', pins: 3, hsCode: '854121', unitWeightG: pkg === 'TO-92' ? '0.1800' : '0.0080', ratings: { icMaxA: ic, vceoMaxV: vceo, pdMaxW: pd, tjMaxC: 150, rthJaCPerW: rth }, basePrice: price });
  bjt('N40-SOT23', 'SOT-23', 0.2, 40, 0.3, 417, 0.0048); bjt('N40-TO92', 'TO-92', 0.2, 40, 0.625, 200, 0.0062);
  bjt('N25-1A5-SOT23', 'SOT-23', 1.5, 25, 0.3, 417, 0.0075); bjt('N25-1A5-TO92', 'TO-92', 1.5, 25, 0.625, 200, 0.0090);
  bjt('N60-3A-SOT89', 'SOT-89', 3, 60, 1.0, 125, 0.0160);
  const fet = (pn: string, pkg: string, id: number, vds: number, pd: number, rth: number, price: number) =>
    parts.push({ internalPn: `TB-M-${pn}`, mpn: `KS-${pn}`, manufacturer: 'Kestrel Semi (demo)', category: 'mosfet', description: `N-channel MOSFET ${pn}`, package: pkg, mount: 'smt', pins: 3, hsCode: '854121', unitWeightG: '0.0100', ratings: { idMaxA: id, vdsMaxV: vds, pdMaxW: pd, tjMaxC: 150, rthJaCPerW: rth }, basePrice: price });
  fet('N20-4A-SOT23', 'SOT-23', 4, 20, 1.25, 100, 0.0110); fet('N30-6A-SOT23', 'SOT-23', 6, 30, 1.4, 90, 0.0150); fet('N60-0A3-SOT23', 'SOT-23', 0.3, 60, 0.35, 350, 0.0085);

  const diode = (pn: string, pkg: string, vrrm: number, ifav: number, price: number, desc: string, mount = 'smt') =>
    parts.push({ internalPn: `TB-D-${pn}`, mpn: `KS-D${pn}`, manufacturer: 'Kestrel Semi (demo)', category: 'diode', description: desc, package: pkg, mount, pins: 2, hsCode: '854110', unitWeightG: '0.0300', ratings: { vrrmV: vrrm, ifAvA: ifav, tjMaxC: 150 }, basePrice: price });
  diode('1KV-1A-SMA', 'SMA', 1000, 1, 0.0070, 'Rectifier 1 kV 1 A'); diode('40V-1A-SCH', 'SOD-123', 40, 1, 0.0060, 'Schottky 40 V 1 A');
  diode('75V-SIG', 'SOD-323', 75, 0.15, 0.0025, 'Small-signal switching diode');
  diode('2KV-HV', 'Axial DO-15', 2000, 0.2, 0.0210, 'HV rectifier 2 kV', 'tht'); diode('4KV-HV', 'Axial DO-15', 4000, 0.2, 0.0290, 'HV rectifier 4 kV', 'tht');
  diode('6KV-HV', 'Axial DO-15', 6000, 0.1, 0.0420, 'HV rectifier 6 kV', 'tht');

  const led = (pn: string, ifmax: number, vf: number, price: number, desc: string) =>
    parts.push({ internalPn: `TB-L-${pn}`, mpn: `LW-${pn}`, manufacturer: 'Lumen Works (demo)', category: 'led', description: desc, package: pn.includes('2835') ? '2835' : '0603', mount: 'smt', pins: 2, hsCode: '854141', unitWeightG: '0.0200', ratings: { ifMaxA: ifmax, vfV: vf }, basePrice: price });
  led('W-2835-60MA', 0.06, 3.1, 0.0085, 'White LED 2835, 60 mA'); led('W-2835-150MA', 0.15, 3.1, 0.0120, 'White LED 2835, 150 mA');
  led('R-0603', 0.02, 2.0, 0.0040, 'Red indicator LED 0603'); led('B-0603', 0.02, 3.0, 0.0048, 'Blue indicator LED 0603');

  const other = (pn: string, category: string, desc: string, pkg: string, mount: string, pins: number, hs: string, w: string, price: number) =>
    parts.push({ internalPn: `TB-${pn}`, mpn: `TBX-${pn}`, manufacturer: 'Various (demo)', category, description: desc, package: pkg, mount, pins, hsCode: hs, unitWeightG: w, ratings: {}, basePrice: price });
  other('T-HV-STEPUP', 'transformer', 'Step-up ignition transformer, ferrite rod', 'Rod 8x25', 'hand', 4, '850431', '4.5000', 0.1600);
  other('T-OSC-EE10', 'transformer', 'Oscillator transformer EE10', 'EE10', 'tht', 6, '850431', '2.1000', 0.0950);
  other('L-10U-0805', 'inductor', 'Power inductor 10 µH', '0805', 'smt', 2, '850450', '0.0300', 0.0120);
  other('SW-TACT-6MM', 'switch', 'Tactile switch 6 mm', '6x6 THT', 'tht', 4, '853650', '0.4000', 0.0110);
  other('SW-SLIDE', 'switch', 'Slide switch SPDT', 'SS12', 'tht', 3, '853650', '0.5000', 0.0140);
  other('BAT-LIPO-180', 'battery', 'Li-ion pouch cell 3.7 V 180 mAh', '402030', 'hand', 2, '850760', '4.2000', 0.3400);
  other('BAT-CR2032', 'battery', 'Lithium coin cell 3 V', 'CR2032', 'hand', 2, '850650', '3.0000', 0.0480);
  other('IC-CHG-SOT23', 'other', 'Li-ion linear charger IC', 'SOT-23-5', 'smt', 5, '854239', '0.0150', 0.0520);
  other('USB-C-6P', 'other', 'USB-C receptacle, 6 pin power-only', 'SMT', 'smt', 6, '853669', '0.3000', 0.0310);
  other('PCB-ARC-2L', 'pcb', 'Arc lighter PCB, 2 layer FR4', '32x12 mm', 'none', 0, '853400', '1.2000', 0.0290);
  other('PCB-BOOK-1L', 'pcb', 'Book light PCB, 1 layer CEM-1', '25x20 mm', 'none', 0, '853400', '1.0000', 0.0160);
  other('PCB-ION-1L', 'pcb', 'Ioniser PCB, 1 layer FR4', '40x30 mm', 'none', 0, '853400', '2.0000', 0.0310);
  other('ENC-ARC', 'enclosure', 'Arc lighter housing set (ABS)', '2 parts', 'hand', 0, '392690', '14.0000', 0.1100);
  other('ENC-BOOK', 'enclosure', 'Book light clip housing', '3 parts', 'hand', 0, '392690', '9.0000', 0.0750);
  other('ENC-ION', 'enclosure', 'Ioniser housing with grille', '2 parts', 'hand', 0, '392690', '38.0000', 0.2300);
  other('WIRE-HV-24', 'wire', 'Silicone HV wire, per metre', '24 AWG', 'hand', 0, '854449', '3.0000', 0.0450);
  other('PKG-BLISTER', 'packaging', 'Blister card with insert', 'A6', 'hand', 0, '481910', '12.0000', 0.0380);
  other('PKG-BOX', 'packaging', 'Printed retail box', '80x50x30', 'hand', 0, '481920', '18.0000', 0.0520);
  other('IC-OSC-555', 'other', 'Timer IC (oscillator)', 'SOP-8', 'smt', 8, '854239', '0.0800', 0.0380);
  return parts;
}

export async function seed(knex: Knex): Promise<void> {
  const ws = await knex('workspaces').where({ name: demoWorkspaceName }).first('id');
  if (!ws) return;
  if (await knex('parts').where({ workspaceId: ws.id }).first('id')) return;
  const random = rng(20261201);
  await knex.transaction(async (trx) => {
    const suppliers = await trx('suppliers')
      .insert([
        { workspaceId: ws.id, name: 'Pearl Delta Components (demo)', country: 'CN', currency: 'CNY', defaultIncoterm: 'FOB', contactEmails: ['quotes@pearl-delta.example'], notes: 'Demo supplier: passives and discretes, reels only.' },
        { workspaceId: ws.id, name: 'Lakeshore Parts Supply (demo)', country: 'US', currency: 'USD', defaultIncoterm: 'FCA', contactEmails: ['sales@lakeshore-parts.example'], notes: 'Demo distributor: small MOQs, higher prices.' },
        { workspaceId: ws.id, name: 'Rheinmark Bauteile (demo)', country: 'DE', currency: 'EUR', defaultIncoterm: 'DAP', contactEmails: ['angebot@rheinmark.example'], notes: 'Demo supplier: HV parts, delivered.' },
        { workspaceId: ws.id, name: 'Dongguan Tinworks Assembly (demo)', country: 'CN', currency: 'CNY', defaultIncoterm: 'EXW', contactEmails: ['pm@tinworks.example'], notes: 'Demo contract manufacturer: enclosures, packaging, assembly.' },
      ])
      .returning(['id', 'currency', 'name']);
    const [pearl, lakeshore, rhein, tinworks] = suppliers;
    const parts = demoParts();
    const inserted = await trx('parts')
      .insert(parts.map(({ basePrice: _p, ratings, ...p }) => ({ ...p, ratings: JSON.stringify(ratings), workspaceId: ws.id })))
      .returning(['id', 'category', 'internalPn']);
    // Demo rates: 1 EUR = x (invented around plausible levels).
    const eur: Record<string, number> = { USD: 1.08, CNY: 7.80, GBP: 0.845 };
    const toCcy = (usd: number, ccy: string) => (ccy === 'USD' ? usd : (usd / eur.USD) * (ccy === 'EUR' ? 1 : eur[ccy]));
    const fx = [];
    for (let d = -30; d <= 0; d++) {
      for (const [ccy, mid] of Object.entries(eur)) fx.push({ workspaceId: ws.id, date: day(d), base: 'EUR', quote: ccy, rate: (mid * (1 + (random() - 0.5) * 0.01)).toFixed(4), source: 'demo' });
    }
    await trx('fx_rates').insert(fx);

    const quoteRows: Record<string, unknown>[] = [];
    const breakSets: { minQty: number; unitPrice: string }[][] = [];
    const reel = (cat: string, pkg: string) => (cat === 'resistor' || cat === 'capacitor') && /0603|0805|1206/.test(pkg) ? (cat === 'resistor' ? 5000 : 4000) : cat === 'bjt' || cat === 'mosfet' || cat === 'diode' || cat === 'led' ? 3000 : 100;
    parts.forEach((p, i) => {
      const partId = inserted[i].id;
      const offers: { s: { id: string; currency: string }; factor: number; inc: string; lead: number; moqMul: number }[] = [];
      const hvOrDiscrete = ['diode', 'bjt', 'mosfet'].includes(p.category) || /HV/.test(p.internalPn);
      if (['pcb', 'enclosure', 'packaging', 'wire', 'transformer', 'battery'].includes(p.category)) {
        offers.push({ s: tinworks, factor: 1, inc: 'EXW', lead: 35, moqMul: 10 });
        offers.push({ s: pearl, factor: 1.12, inc: 'FOB', lead: 28, moqMul: 10 });
      } else {
        offers.push({ s: pearl, factor: 1, inc: 'FOB', lead: 21, moqMul: 1 });
        offers.push({ s: lakeshore, factor: 2.4, inc: 'FCA', lead: 7, moqMul: 0.02 });
        if (hvOrDiscrete || random() < 0.4) offers.push({ s: rhein, factor: 1.8, inc: 'DAP', lead: 14, moqMul: 0.2 });
      }
      for (const o of offers) {
        const pack = reel(p.category, p.package);
        const moq = Math.max(1, Math.round(pack * o.moqMul));
        const mult = o.moqMul >= 1 ? pack : 1;
        const unit = toCcy(p.basePrice * o.factor * (1 + (random() - 0.5) * 0.1), o.s.currency);
        const tiers = [1, 5, 20, 100].map((m) => m * moq);
        breakSets.push(tiers.map((minQty, k) => ({ minQty, unitPrice: (unit * [1, 0.86, 0.74, 0.66][k]).toFixed(6) })));
        quoteRows.push({
          workspaceId: ws.id, partId, supplierId: o.s.id, currency: o.s.currency, incoterm: o.inc, moq, orderMultiple: mult,
          leadTimeDays: o.lead, validFrom: day(-20), validUntil: day(70), source: 'manual', note: 'Demo quote',
        });
      }
    });
    // One expired quote stays on the board, shown as expired.
    quoteRows.push({ workspaceId: ws.id, partId: inserted[3].id, supplierId: pearl.id, currency: 'CNY', incoterm: 'FOB', moq: 5000, orderMultiple: 5000, leadTimeDays: 21, validFrom: day(-120), validUntil: day(-30), source: 'manual', note: 'Demo quote (expired)' });
    breakSets.push([{ minQty: 5000, unitPrice: '0.004000' }]);
    const ids = (await trx('quotes').insert(quoteRows).returning('id')) as { id: string }[];
    await trx('price_breaks').insert(ids.flatMap((q, k) => breakSets[k].map((b) => ({ workspaceId: ws.id, quoteId: q.id, ...b }))));

    await trx('landed_cost_profiles').insert([
      {
        workspaceId: ws.id, name: 'Sea freight to UK, CIF basis (demo)', currency: 'GBP', originPct: '1.5', freightPct: '0',
        freightPerShipment: '420', freightCurrency: 'USD', shipments: 1, freightBasis: 'value', insurancePct: '0.3', dutyBasis: 'CIF',
        dutyRates: JSON.stringify([{ hsPrefix: '8541', ratePct: '0' }, { hsPrefix: '8533', ratePct: '0' }, { hsPrefix: '8532', ratePct: '0' }, { hsPrefix: '3926', ratePct: '6.5' }, { hsPrefix: '8507', ratePct: '2.7' }, { hsPrefix: '4819', ratePct: '0' }]),
        defaultDutyPct: '2.0', feesPerShipment: '95', destinationPct: '1.0', maxLeadTimeDays: 45,
        attritionPct: JSON.stringify({ resistor: '2', capacitor: '2', led: '1', bjt: '1', mosfet: '1', diode: '1' }),
        smtRatePerPlacement: '0.0012', thtRatePerJoint: '0.0030', handRatePerOp: '0.0150',
        notes: 'Demo profile: rates and duty are invented for the demo, not advice.',
      },
      {
        workspaceId: ws.id, name: 'Sea freight to US, FOB basis (demo)', currency: 'USD', originPct: '1.5', freightPct: '0',
        freightPerShipment: '520', freightCurrency: 'USD', shipments: 1, freightBasis: 'value', insurancePct: '0.3', dutyBasis: 'FOB',
        dutyRates: JSON.stringify([{ hsPrefix: '8541', ratePct: '0' }, { hsPrefix: '3926', ratePct: '5.3' }, { hsPrefix: '8507', ratePct: '3.4' }]),
        defaultDutyPct: '2.5', feesPerShipment: '140', destinationPct: '1.2', maxLeadTimeDays: 45,
        attritionPct: JSON.stringify({ resistor: '2', capacitor: '2', led: '1', bjt: '1', mosfet: '1', diode: '1' }),
        smtRatePerPlacement: '0.0015', thtRatePerJoint: '0.0035', handRatePerOp: '0.0180',
        notes: 'Demo profile: rates and duty are invented for the demo, not advice.',
      },
    ]);
  });
}
