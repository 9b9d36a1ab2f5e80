/**
 * The LED key-ring torch of the costing reference §5.2: a CM in China quotes FCA Shenzhen
 * in USD and buys the parts; EU import, CIF-basis duty 3.7 %. Figures are the reference's
 * illustrative values (common practice, no source); part names are our demo's.
 */
import { breaks, makeInput } from './test-factories';
import type { BomLine, CostRollInput, Part, PartCategory, Mount, Quote, Supplier } from './types';

export const CM: Supplier = { id: 'sup-kestrel-cm', active: true, name: 'Kestrel Works CM (demo)' };

interface Row {
  id: string;
  category: PartCategory;
  mount: Mount;
  pins: number;
  qty: string;
  attritionPct: string;
  moq: number;
  tiers: [number, string][];
}

// Qty/unit, attrition, MOQ = multiple, tiers: reference §5.2 BOM table.
export const TORCH_ROWS: Row[] = [
  { id: 'r-0603', category: 'resistor', mount: 'smt', pins: 2, qty: '4', attritionPct: '2', moq: 5000, tiers: [[5000, '0.0010'], [20000, '0.0008']] },
  { id: 'c-0603', category: 'capacitor', mount: 'smt', pins: 2, qty: '2', attritionPct: '2', moq: 4000, tiers: [[4000, '0.0015']] },
  { id: 'led', category: 'led', mount: 'smt', pins: 2, qty: '3', attritionPct: '1', moq: 4000, tiers: [[4000, '0.0100'], [20000, '0.0080']] },
  { id: 'ic-driver', category: 'other', mount: 'smt', pins: 6, qty: '1', attritionPct: '1', moq: 3000, tiers: [[3000, '0.0400'], [15000, '0.0300']] },
  { id: 'switch', category: 'switch', mount: 'tht', pins: 4, qty: '1', attritionPct: '0.5', moq: 1000, tiers: [[1000, '0.0150'], [10000, '0.0120']] },
  { id: 'pcb', category: 'pcb', mount: 'none', pins: 0, qty: '1', attritionPct: '1', moq: 100, tiers: [[100, '0.0300'], [10000, '0.0180']] },
  { id: 'cr2032', category: 'battery', mount: 'none', pins: 0, qty: '1', attritionPct: '0.5', moq: 100, tiers: [[100, '0.0500'], [10000, '0.0420']] },
  { id: 'housing', category: 'enclosure', mount: 'none', pins: 0, qty: '1', attritionPct: '1', moq: 100, tiers: [[100, '0.0350']] },
  { id: 'blister', category: 'packaging', mount: 'none', pins: 0, qty: '1', attritionPct: '2', moq: 500, tiers: [[500, '0.0200']] },
];

export function torchParts(): { parts: Part[]; quotes: Quote[]; lines: BomLine[] } {
  const parts: Part[] = [];
  const quotes: Quote[] = [];
  const lines: BomLine[] = [];
  for (const r of TORCH_ROWS) {
    parts.push({ id: `part-${r.id}`, category: r.category, mount: r.mount, pins: r.pins, hsCode: null, unitWeightG: null });
    quotes.push({
      id: `quote-${r.id}`,
      partId: `part-${r.id}`,
      supplierId: CM.id,
      currency: 'USD',
      incoterm: 'FCA',
      moq: r.moq,
      orderMultiple: r.moq,
      leadTimeDays: 30,
      priceBreaks: breaks(...r.tiers),
    });
    lines.push({ id: `line-${r.id}`, refDes: r.id.toUpperCase(), kind: 'part', partId: `part-${r.id}`, qtyPerUnit: r.qty, attritionPct: r.attritionPct });
  }
  return { parts, quotes, lines };
}

/** The parts alone, bought FCA with no adders: the material of the worked example. */
export function torchMaterialInput(qty: number): CostRollInput {
  const { parts, quotes, lines } = torchParts();
  return makeInput({ bom: { qty, date: '2026-12-01', reportingCurrency: 'USD' }, parts, quotes, lines, suppliers: [CM] });
}
