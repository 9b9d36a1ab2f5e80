import { describe, expect, it } from 'vitest';
import {
  CAREFUL,
  DEFAULT_POLICY_ID,
  HI_REL,
  SEEDED_POLICIES,
  SHELF_GRADE,
  allowedJunctionC,
  policyLimitsSchema,
  type PolicyLimits,
} from './policies';
import { DIELECTRICS } from './types';

// The seeded tiers as derating.md fixes them; the sources beside each number are those of
// the derating reference (RAC C, KEMET-TA C, FILM C, RENESAS C, R-DERATE C, EEE-INST-002 M, P).
const TABLE: Record<string, [number, number, number]> = {
  'capacitor.c0g': [0.8, 0.7, 0.6],
  'capacitor.x7r': [0.8, 0.7, 0.6],
  'capacitor.x5r': [0.8, 0.7, 0.6],
  'capacitor.y5v': [0.8, 0.7, 0.6],
  'capacitor.hv_ceramic': [0.7, 0.6, 0.5],
  'capacitor.film': [0.8, 0.7, 0.6],
  'capacitor.al_electrolytic': [0.8, 0.8, 0.7],
  'capacitor.tantalum': [0.5, 0.5, 0.5],
  'resistor.voltage': [0.8, 0.8, 0.8],
  'resistor.power': [0.7, 0.6, 0.5],
  'transistor.current': [0.8, 0.75, 0.75],
  'transistor.voltage': [0.8, 0.75, 0.75],
  'transistor.power': [0.8, 0.6, 0.5],
  'diode.reverseVoltage': [0.8, 0.8, 0.7],
  'diode.current': [0.9, 0.9, 0.5],
  'led.current': [0.8, 0.7, 0.6],
};

function limitAt(limits: PolicyLimits, path: string): { value: number; source?: string; confidence?: string } {
  const [group, key] = path.split('.');
  return (limits as unknown as Record<string, Record<string, { value: number }>>)[group][key];
}

describe('seeded policies', () => {
  it('are Shelf-grade (the default), Careful and Hi-rel', () => {
    expect(SEEDED_POLICIES.map((p) => p.name)).toEqual(['Shelf-grade', 'Careful', 'Hi-rel']);
    expect(DEFAULT_POLICY_ID).toBe(SHELF_GRADE.id);
    expect(new Set(SEEDED_POLICIES.map((p) => p.id)).size).toBe(3);
  });

  it.each(Object.entries(TABLE))('%s matches the policy table', (path, [shelf, careful, hiRel]) => {
    expect(limitAt(SHELF_GRADE.limits, path).value).toBe(shelf);
    expect(limitAt(CAREFUL.limits, path).value).toBe(careful);
    expect(limitAt(HI_REL.limits, path).value).toBe(hiRel);
  });

  it('covers every dielectric', () => {
    for (const p of SEEDED_POLICIES) expect(Object.keys(p.limits.capacitor).sort()).toEqual([...DIELECTRICS].sort());
  });

  it('names a source and a confidence mark for every limit', () => {
    for (const p of SEEDED_POLICIES) {
      for (const path of Object.keys(TABLE)) {
        const l = limitAt(p.limits, path);
        expect(l.source, `${p.name} ${path}`).toMatch(/\S/);
        expect(['C', 'M', 'P']).toContain(l.confidence);
      }
      expect(p.limits.transistor.junctionTemp.source).toMatch(/\S/);
    }
  });

  it('marks the confirmed numbers as the reference does: RAC Benign ceramic 70 % [RAC; C], KEMET MnO2 50 % [KEMET-TA; C]', () => {
    expect(CAREFUL.limits.capacitor.x7r).toMatchObject({ value: 0.7, confidence: 'C' });
    expect(CAREFUL.limits.capacitor.x7r.source).toMatch(/RAC Benign/);
    expect(HI_REL.limits.capacitor.x7r.source).toMatch(/RAC Severe/);
    expect(SHELF_GRADE.limits.capacitor.tantalum.source).toMatch(/KEMET-TA/);
    expect(SHELF_GRADE.limits.capacitor.c0g.confidence).toBe('P');
    expect(HI_REL.limits.transistor.power.confidence).toBe('M');
  });

  it('validate against the limits schema', () => {
    for (const p of SEEDED_POLICIES) expect(policyLimitsSchema.safeParse(p.limits).success).toBe(true);
  });
});

describe('allowed junction temperature per tier', () => {
  it('Shelf-grade: Tj,max − 25 °C (125 °C for a 150 °C part) [P]', () => {
    expect(allowedJunctionC(150, SHELF_GRADE.limits.transistor.junctionTemp)).toBe(125);
    expect(allowedJunctionC(175, SHELF_GRADE.limits.transistor.junctionTemp)).toBe(150);
  });

  it('Careful: min(Tj,max − 30, 125 °C) [P; 125 °C cap MIL-19500 C]', () => {
    expect(allowedJunctionC(150, CAREFUL.limits.transistor.junctionTemp)).toBe(120);
    expect(allowedJunctionC(175, CAREFUL.limits.transistor.junctionTemp)).toBe(125);
  });

  it('Hi-rel: min(Tj,max − 40, 125 °C) [EEE-INST-002; M]', () => {
    expect(allowedJunctionC(150, HI_REL.limits.transistor.junctionTemp)).toBe(110);
    expect(allowedJunctionC(200, HI_REL.limits.transistor.junctionTemp)).toBe(125);
  });
});

describe('policyLimitsSchema: edits to a policy', () => {
  const edit = (mutate: (l: PolicyLimits) => void) => {
    const limits = structuredClone(SHELF_GRADE.limits);
    mutate(limits);
    return policyLimitsSchema.safeParse(limits);
  };
  const messages = (r: ReturnType<typeof edit>) => (r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`));

  it('accepts a limit of exactly 1 and an edit without a source', () => {
    expect(edit((l) => (l.led.current = { value: 1 })).success).toBe(true);
  });

  it('rejects 0, negatives and percentages given as whole numbers', () => {
    expect(messages(edit((l) => (l.resistor.power.value = 0)))).toEqual(['resistor.power.value: a limit must be above 0']);
    expect(messages(edit((l) => (l.diode.current.value = -0.5)))).toEqual(['diode.current.value: a limit must be above 0']);
    expect(messages(edit((l) => (l.capacitor.film.value = 80)))).toEqual([
      'capacitor.film.value: a limit is a fraction of the rating, at most 1 (0.8 means 80 %)',
    ]);
  });

  it('rejects a non-finite limit', () => {
    expect(messages(edit((l) => (l.led.current.value = Number.NaN)))).toEqual(['led.current.value: a limit must be a finite number']);
    expect(edit((l) => (l.led.current.value = Number.POSITIVE_INFINITY))).toMatchObject({ success: false });
  });

  it('rejects a negative Tj margin and accepts zero', () => {
    expect(messages(edit((l) => (l.transistor.junctionTemp.marginC = -5)))).toEqual([
      'transistor.junctionTemp.marginC: marginC must be 0 °C or more below Tj,max',
    ]);
    expect(edit((l) => (l.transistor.junctionTemp.marginC = 0)).success).toBe(true);
  });

  it('rejects a missing dielectric limit', () => {
    const r = edit((l) => delete (l.capacitor as Partial<PolicyLimits['capacitor']>).tantalum);
    expect(r.success).toBe(false);
    expect(messages(r)[0]).toMatch(/^capacitor\.tantalum/);
  });

  it('rejects an unknown confidence mark', () => {
    const r = edit((l) => ((l.led.current as { confidence?: string }).confidence = 'X'));
    expect(messages(r)[0]).toMatch(/confidence must be C \(confirmed\), M \(from memory\) or P \(common practice\)/);
  });
});
