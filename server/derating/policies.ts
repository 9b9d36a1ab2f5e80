import { z } from 'zod';
import type { Dielectric } from './types';

/**
 * Stress policies: the allowed fraction of each rating, with where each number comes from.
 * Source tags and confidence marks are those of the derating reference:
 * C = confirmed, M = from memory, P = common practice of the trade.
 */

const confidenceSchema = z.enum(['C', 'M', 'P'], {
  error: 'confidence must be C (confirmed), M (from memory) or P (common practice)',
});

const fraction = z
  .number({ error: 'a limit must be a finite number' })
  .gt(0, { error: 'a limit must be above 0' })
  .lte(1, { error: 'a limit is a fraction of the rating, at most 1 (0.8 means 80 %)' });

const sourceSchema = z.string().trim().min(1, { error: 'source must not be empty' }).max(200);

export const policyLimitSchema = z.object({
  value: fraction,
  source: sourceSchema.optional(),
  confidence: confidenceSchema.optional(),
});
export type PolicyLimit = z.infer<typeof policyLimitSchema>;

/** Allowed junction temperature: tjMax − marginC, and never above capC when one is set. */
export const tjAllowedSchema = z.object({
  marginC: z
    .number({ error: 'marginC must be a finite number of °C' })
    .min(0, { error: 'marginC must be 0 °C or more below Tj,max' }),
  capC: z.number({ error: 'capC must be a finite number of °C' }).nullable().optional(),
  source: sourceSchema.optional(),
  confidence: confidenceSchema.optional(),
});
export type TjAllowed = z.infer<typeof tjAllowedSchema>;

export const policyLimitsSchema = z.object({
  capacitor: z.object({
    c0g: policyLimitSchema,
    x7r: policyLimitSchema,
    x5r: policyLimitSchema,
    y5v: policyLimitSchema,
    hv_ceramic: policyLimitSchema,
    film: policyLimitSchema,
    al_electrolytic: policyLimitSchema,
    tantalum: policyLimitSchema,
  } satisfies Record<Dielectric, typeof policyLimitSchema>),
  resistor: z.object({ voltage: policyLimitSchema, power: policyLimitSchema }),
  transistor: z.object({
    current: policyLimitSchema,
    voltage: policyLimitSchema,
    power: policyLimitSchema,
    junctionTemp: tjAllowedSchema,
  }),
  diode: z.object({ reverseVoltage: policyLimitSchema, current: policyLimitSchema }),
  led: z.object({ current: policyLimitSchema }),
});
export type PolicyLimits = z.infer<typeof policyLimitsSchema>;

export interface StressPolicy {
  id: string;
  name: string;
  limits: PolicyLimits;
}

/** The junction temperature a policy allows for a part with this Tj,max. */
export function allowedJunctionC(tjMaxC: number, tj: TjAllowed): number {
  const byMargin = tjMaxC - tj.marginC;
  return tj.capC === null || tj.capC === undefined ? byMargin : Math.min(byMargin, tj.capC);
}

const P = (value: number, source = 'common practice'): PolicyLimit => ({ value, source, confidence: 'P' });
const C = (value: number, source: string): PolicyLimit => ({ value, source, confidence: 'C' });
const M = (value: number, source: string): PolicyLimit => ({ value, source, confidence: 'M' });

const HV_DISC = 'common practice (HV discs in multipliers run at 50–70 % of rating)';

/** Consumer practice; the default. */
export const SHELF_GRADE: StressPolicy = {
  id: 'shelf-grade',
  name: 'Shelf-grade',
  limits: {
    capacitor: {
      c0g: P(0.8, 'common practice (consumer ≤ 80 %)'),
      x7r: P(0.8, 'common practice (consumer ≤ 80 %)'),
      x5r: P(0.8, 'common practice (consumer ≤ 80 %)'),
      y5v: P(0.8, 'common practice (consumer ≤ 80 %)'),
      hv_ceramic: P(0.7, HV_DISC),
      film: C(0.8, 'FILM (operating voltage ≤ 80 % of rated)'),
      al_electrolytic: C(0.8, 'RAC Benign'),
      tantalum: C(0.5, 'KEMET-TA (MnO2 ≤ 50 %)'),
    },
    resistor: {
      voltage: P(0.8, 'common practice (voltage ≤ 80 % of U_max)'),
      power: P(0.7, 'common practice (consumer ≤ 70 % of f(T)·P70)'),
    },
    transistor: {
      current: P(0.8, 'common practice (never above 80 % of an absolute maximum)'),
      voltage: C(0.8, 'RENESAS (keep VDS within 80 %)'),
      power: P(0.8, 'common practice (never above 80 % of an absolute maximum)'),
      junctionTemp: { marginC: 25, capC: null, source: 'common practice (Tj ≤ Tj,max − 25 °C)', confidence: 'P' },
    },
    diode: {
      reverseVoltage: C(0.8, 'RAC Benign'),
      current: C(0.9, 'RAC (forward current: Severe 90 %, Benign < 100 %)'),
    },
    led: { current: P(0.8, 'common practice (consumer ≤ 80 %)') },
  },
};

/** Close to the reliability centre's "benign" column. */
export const CAREFUL: StressPolicy = {
  id: 'careful',
  name: 'Careful',
  limits: {
    capacitor: {
      c0g: C(0.7, 'RAC Benign'),
      x7r: C(0.7, 'RAC Benign'),
      x5r: C(0.7, 'RAC Benign'),
      y5v: C(0.7, 'RAC Benign'),
      hv_ceramic: P(0.6, HV_DISC),
      film: C(0.7, 'RAC Benign'),
      al_electrolytic: C(0.8, 'RAC Benign'),
      tantalum: C(0.5, 'KEMET-TA (MnO2 ≤ 50 %)'),
    },
    resistor: {
      voltage: P(0.8, 'common practice (voltage ≤ 80 % of U_max)'),
      power: P(0.6, 'common practice (industrial ≤ 60 % of f(T)·P70)'),
    },
    transistor: {
      current: M(0.75, 'EEE-INST-002 (Ic/Id 75 %)'),
      voltage: M(0.75, 'EEE-INST-002 (Vce/Vds 75 %)'),
      power: P(0.6, 'common practice (industrial ≤ 60 %)'),
      junctionTemp: {
        marginC: 30,
        capC: 125,
        source: 'common practice (Tj ≤ Tj,max − 30 °C); 125 °C cap as MIL-19500 notes',
        confidence: 'P',
      },
    },
    diode: {
      reverseVoltage: C(0.8, 'RAC Benign'),
      current: C(0.9, 'RAC (forward current: Severe 90 %, Benign < 100 %)'),
    },
    led: { current: P(0.7, 'common practice') },
  },
};

/** Close to the reliability centre's "severe" column and space-agency guidance. */
export const HI_REL: StressPolicy = {
  id: 'hi-rel',
  name: 'Hi-rel',
  limits: {
    capacitor: {
      c0g: C(0.6, 'RAC Severe'),
      x7r: C(0.6, 'RAC Severe'),
      x5r: C(0.6, 'RAC Severe'),
      y5v: C(0.6, 'RAC Severe'),
      hv_ceramic: P(0.5, HV_DISC),
      film: C(0.6, 'RAC Severe'),
      al_electrolytic: C(0.7, 'RAC Severe'),
      tantalum: C(0.5, 'KEMET-TA (MnO2 ≤ 50 %)'),
    },
    resistor: {
      voltage: M(0.8, 'EEE-INST-002 / ECSS-30-11 (≤ 80 % of U_max, typical)'),
      power: C(0.5, 'R-DERATE (power derated to 50–70 %)'),
    },
    transistor: {
      current: M(0.75, 'EEE-INST-002 (Ic/Id 75 %)'),
      voltage: M(0.75, 'EEE-INST-002 (Vce/Vds 75 %)'),
      power: M(0.5, 'EEE-INST-002 (power 50 %)'),
      junctionTemp: {
        marginC: 40,
        capC: 125,
        source: 'EEE-INST-002 (Tj ≤ 125 °C or Tj,max − 40 °C, whichever is lower)',
        confidence: 'M',
      },
    },
    diode: {
      reverseVoltage: C(0.7, 'RAC Severe'),
      current: M(0.5, 'EEE-INST-002 (forward current about 50 %)'),
    },
    led: { current: P(0.6, 'common practice') },
  },
};

export const SEEDED_POLICIES: readonly StressPolicy[] = [SHELF_GRADE, CAREFUL, HI_REL];
export const DEFAULT_POLICY_ID = SHELF_GRADE.id;
