import { z } from 'zod';
import { bomCreateBody, type BomCreateBody } from '../../shared/schemas/boms';
import type { Bom } from './api';

/** The New BOM and BOM details forms as typed: text boxes, read by the shared `bomCreateBody`. */
export type BomFormValues = {
  name: string;
  reportingCurrency: string;
  profileId: string;
  plannedQty: string;
  targetUnitCost: string;
  amortisationQty: string;
};

export const emptyBomForm: BomFormValues = {
  name: '',
  reportingCurrency: 'GBP',
  profileId: '',
  plannedQty: '10000',
  targetUnitCost: '',
  amortisationQty: '',
};

export function bomFormValues(bom: Bom): BomFormValues {
  return {
    name: bom.name,
    reportingCurrency: bom.reportingCurrency,
    profileId: bom.profileId ?? '',
    plannedQty: String(bom.plannedQty),
    targetUnitCost: bom.targetUnitCost ? bom.targetUnitCost.replace(/\.?0+$/, '') : '',
    amortisationQty: bom.amortisationQty ? String(bom.amortisationQty) : '',
  };
}

const wholeNumber = (text: string) => {
  const clean = text.trim().replace(/[,\s]/g, '');
  return /^\d+$/.test(clean) ? Number(clean) : clean === '' ? null : Number.NaN;
};

export type BomFormOutput = Pick<BomCreateBody, 'name' | 'reportingCurrency' | 'profileId' | 'plannedQty' | 'targetUnitCost' | 'amortisationQty'>;

export const bomFormSchema = z
  .object({
    name: z.string(),
    reportingCurrency: z.string(),
    profileId: z.string(),
    plannedQty: z.string(),
    targetUnitCost: z.string(),
    amortisationQty: z.string(),
  })
  .transform((form, ctx): BomFormOutput => {
    const planned = wholeNumber(form.plannedQty);
    const amortisation = wholeNumber(form.amortisationQty);
    const body = bomCreateBody.safeParse({
      name: form.name,
      reportingCurrency: form.reportingCurrency,
      profileId: form.profileId || null,
      plannedQty: planned ?? undefined,
      targetUnitCost: form.targetUnitCost.trim().replace(/,/g, '') || null,
      amortisationQty: amortisation,
    });
    if (!body.success) {
      for (const issue of body.error.issues) {
        const field = String(issue.path[0] ?? 'name');
        const message = Number.isNaN(planned) && field === 'plannedQty' ? 'must be a whole number of units' : issue.message;
        ctx.addIssue({ code: 'custom', path: [field], message: issue.code === 'invalid_type' && field === 'plannedQty' ? 'must be a whole number of units' : message });
      }
      return z.NEVER;
    }
    const { name, reportingCurrency, profileId, plannedQty, targetUnitCost, amortisationQty } = body.data;
    return { name, reportingCurrency, profileId, plannedQty, targetUnitCost, amortisationQty };
  });

export const bomFormFields = ['name', 'reportingCurrency', 'profileId', 'plannedQty', 'targetUnitCost', 'amortisationQty'] as const;
