import { z } from 'zod';
import type { PolicyLimit, PolicyLimits, StressPolicy } from './api';
import { LIMIT_ROWS, limitAt } from './limit-rows';

/**
 * The policy form as typed: each limit a percentage with its source and confidence, the
 * junction temperature a margin below Tj max with an optional cap. Read into the API's
 * shape with limits as fractions (80 % → 0.8); the server validates them again.
 */
export type LimitField = { pct: string; source: string; confidence: '' | 'C' | 'M' | 'P' };
export type PolicyFormValues = {
  name: string;
  notes: string;
  limits: Record<string, LimitField>;
  tj: { marginC: string; capC: string; source: string; confidence: '' | 'C' | 'M' | 'P' };
};
export type PolicyFormOutput = { name: string; notes: string; limits: PolicyLimits };

/** A fraction as the percentage the form shows: 0.7 → "70", never "70.00000000000001". */
export const toPercentText = (fraction: number) => String(Number((fraction * 100).toFixed(6)));

function limitField(limit: PolicyLimit | undefined): LimitField {
  return { pct: limit ? toPercentText(limit.value) : '', source: limit?.source ?? '', confidence: limit?.confidence ?? '' };
}

export function policyFormValues(policy: StressPolicy): PolicyFormValues {
  const tj = policy.limits.transistor.junctionTemp;
  return {
    name: policy.name,
    notes: policy.notes,
    limits: Object.fromEntries(LIMIT_ROWS.map((r) => [r.id, limitField(limitAt(policy.limits, r))])),
    tj: { marginC: String(tj.marginC), capC: tj.capC === null || tj.capC === undefined ? '' : String(tj.capC), source: tj.source ?? '', confidence: tj.confidence ?? '' },
  };
}

const PERCENT = /^(\d+(?:\.\d+)?|\.\d+)\s*%?$/;
const DEGREES = /^(-?\d+(?:\.\d+)?)\s*(?:°C|C)?$/;

export const policyFormSchema = z
  .object({
    name: z.string(),
    notes: z.string(),
    limits: z.record(z.string(), z.object({ pct: z.string(), source: z.string(), confidence: z.enum(['', 'C', 'M', 'P']) })),
    tj: z.object({ marginC: z.string(), capC: z.string(), source: z.string(), confidence: z.enum(['', 'C', 'M', 'P']) }),
  })
  .transform((form, ctx): PolicyFormOutput => {
    const name = form.name.trim();
    if (!name) ctx.addIssue({ code: 'custom', path: ['name'], message: 'is required' });
    else if (name.length > 80) ctx.addIssue({ code: 'custom', path: ['name'], message: 'must be at most 80 characters' });

    const limits: Record<string, Record<string, unknown>> = {};
    for (const r of LIMIT_ROWS) {
      const field = form.limits[r.id] ?? { pct: '', source: '', confidence: '' };
      const m = PERCENT.exec(field.pct.trim());
      const pct = m ? Number(m[1]) : Number.NaN;
      if (!m || !(pct > 0) || pct > 100) {
        ctx.addIssue({ code: 'custom', path: ['limits', r.id, 'pct'], message: 'must be a percentage above 0 and at most 100' });
        continue;
      }
      const limit: PolicyLimit = { value: Number((pct / 100).toFixed(8)) };
      if (field.source.trim()) limit.source = field.source.trim();
      if (field.confidence) limit.confidence = field.confidence;
      (limits[r.group] ??= {})[r.key] = limit;
    }

    const margin = DEGREES.exec(form.tj.marginC.trim());
    if (!margin || Number(margin[1]) < 0) ctx.addIssue({ code: 'custom', path: ['tj', 'marginC'], message: 'must be 0 °C or more below Tj max' });
    const capText = form.tj.capC.trim();
    const cap = capText ? DEGREES.exec(capText) : null;
    if (capText && !cap) ctx.addIssue({ code: 'custom', path: ['tj', 'capC'], message: 'must be a temperature such as 125 or left empty' });
    (limits.transistor ??= {}).junctionTemp = {
      marginC: margin ? Number(margin[1]) : 0,
      capC: cap ? Number(cap[1]) : null,
      ...(form.tj.source.trim() ? { source: form.tj.source.trim() } : {}),
      ...(form.tj.confidence ? { confidence: form.tj.confidence } : {}),
    };
    return { name, notes: form.notes, limits: limits as unknown as PolicyLimits };
  });

/** "<name> (copy)", or "(copy 2)" and on while a policy of that name exists (names are unique in a workspace). */
export function copyName(name: string, taken: readonly string[]): string {
  const base = `${name} (copy)`.slice(0, 80);
  if (!taken.includes(base)) return base;
  for (let n = 2; ; n += 1) {
    const next = `${name} (copy ${n})`.slice(0, 80);
    if (!taken.includes(next)) return next;
  }
}
