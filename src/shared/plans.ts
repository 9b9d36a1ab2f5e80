/** Farthing's plans (our names) and what each allows; the server enforces, the client shows. */
export const planIds = ['bench', 'workshop', 'factory'] as const;
export type PlanId = (typeof planIds)[number];

export interface Plan {
  id: PlanId;
  name: string;
  /** Price per month in USD minor units (cents); 0 is free. */
  monthlyCents: number;
  /** The payment service's price lookup key (none for the free plan). */
  lookupKey: string | null;
  limits: { boms: number | null; members: number | null; rfq: boolean; apiTokens: boolean };
}

export const plans: Record<PlanId, Plan> = {
  bench: { id: 'bench', name: 'Bench', monthlyCents: 0, lookupKey: null, limits: { boms: 3, members: 2, rfq: false, apiTokens: false } },
  workshop: { id: 'workshop', name: 'Workshop', monthlyCents: 2900, lookupKey: 'farthing_workshop_monthly', limits: { boms: null, members: 10, rfq: true, apiTokens: false } },
  factory: { id: 'factory', name: 'Factory', monthlyCents: 9900, lookupKey: 'farthing_factory_monthly', limits: { boms: null, members: null, rfq: true, apiTokens: true } },
};

/** The cheapest plan that allows a feature, named in 402 messages. */
export function planAllowing(feature: 'boms' | 'members' | 'rfq' | 'apiTokens', count = 0): Plan {
  for (const id of planIds) {
    const l = plans[id].limits[feature];
    if (typeof l === 'boolean' ? l : l === null || count < l) return plans[id];
  }
  return plans.factory;
}
