/**
 * What the stress check needs of a BOM line besides its checks: its version (every write
 * names the version it read), its quantity and its operating point. The lines come from
 * the BOM area's own query; this is the part of that shape the stress area reads.
 */
export type LineRef = {
  id: string;
  version: number;
  refDes: string;
  qtyPerUnit: string;
  partId: string | null;
  operatingPoint: { voltageV: number | null; currentA: number | null; powerW: number | null; ambientC: number | null };
};

export type OperatingField = keyof LineRef['operatingPoint'];

export const operatingQuantities = { voltageV: 'voltage', currentA: 'current', powerW: 'power', ambientC: 'temperature' } as const;
