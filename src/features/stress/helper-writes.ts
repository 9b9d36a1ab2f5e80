import type { MultiplierResult, ResistorStringResult } from '../../../server/derating';
import type { OperatingPointWrite } from './hooks';
import type { LineRef } from './line-ref';

/**
 * Which BOM lines take a multiplier's voltages. `highest`: every chosen capacitor line
 * takes the highest capacitor stress and every chosen diode line the highest diode
 * stress (a line such as "C1-C6" holds several positions). `positions`: each position
 * names a line; a line named by several positions takes the highest of them.
 */
export type MultiplierChoice =
  | { mode: 'highest'; capacitorLines: string[]; diodeLines: string[] }
  | { mode: 'positions'; byPosition: Record<string, string | null> };

type Point = { voltageV: number; currentA?: number };

function higher(a: Point | undefined, b: Point): Point {
  if (!a) return b;
  const currentA = Math.max(a.currentA ?? -Infinity, b.currentA ?? -Infinity);
  return { voltageV: Math.max(a.voltageV, b.voltageV), ...(Number.isFinite(currentA) ? { currentA } : {}) };
}

/** The operating-point writes a multiplier result makes; lines not found (deleted meanwhile) are left out. */
export function multiplierWrites(result: MultiplierResult, choice: MultiplierChoice, lines: Map<string, LineRef>): OperatingPointWrite[] {
  const target = new Map<string, Point>();
  if (choice.mode === 'highest') {
    const worst = (kind: 'capacitor' | 'diode') => result.positions.filter((p) => p.kind === kind).reduce<Point | undefined>((acc, p) => higher(acc, p.operatingPoint), undefined);
    const cap = worst('capacitor');
    const diode = worst('diode');
    if (cap) for (const id of choice.capacitorLines) target.set(id, higher(target.get(id), { voltageV: cap.voltageV }));
    if (diode) for (const id of choice.diodeLines) target.set(id, higher(target.get(id), diode));
  } else {
    for (const p of result.positions) {
      const id = choice.byPosition[p.position];
      if (!id) continue;
      const point: Point = p.kind === 'capacitor' ? { voltageV: p.operatingPoint.voltageV } : p.operatingPoint;
      target.set(id, higher(target.get(id), point));
    }
  }
  const writes: OperatingPointWrite[] = [];
  for (const [id, point] of target) {
    const line = lines.get(id);
    if (!line) continue;
    writes.push({ id, version: line.version, operatingPoint: point.currentA === undefined ? { voltageV: point.voltageV } : { voltageV: point.voltageV, currentA: point.currentA } });
  }
  return writes;
}

/** The resistor string's worst-case voltage across one resistor, written into the chosen resistor line. */
export function resistorStringWrite(result: ResistorStringResult, line: LineRef): OperatingPointWrite {
  return { id: line.id, version: line.version, operatingPoint: { voltageV: result.worstEachV } };
}
