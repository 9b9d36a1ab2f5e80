import { incoterms } from '../shared/schemas/trade';

/** The eleven Incoterms 2020 rules (ICC) by their own names. */
export const incotermNames: Record<(typeof incoterms)[number], string> = {
  EXW: 'Ex Works',
  FCA: 'Free Carrier',
  FAS: 'Free Alongside Ship',
  FOB: 'Free On Board',
  CFR: 'Cost and Freight',
  CPT: 'Carriage Paid To',
  CIF: 'Cost, Insurance and Freight',
  CIP: 'Carriage and Insurance Paid To',
  DAP: 'Delivered at Place',
  DPU: 'Delivered at Place Unloaded',
  DDP: 'Delivered Duty Paid',
};

export const incotermOptions = incoterms.map((code) => ({ value: code, label: `${code} — ${incotermNames[code]}` }));

/**
 * ISO 4217 codes offered first in currency boxes: the currencies component suppliers
 * and importers of this trade quote in most. Any other valid code may still be typed.
 */
export const commonCurrencies = ['CNY', 'USD', 'EUR', 'GBP', 'HKD', 'TWD', 'JPY', 'KRW', 'SGD', 'MYR', 'THB', 'VND', 'INR', 'CAD', 'AUD', 'CHF'] as const;
