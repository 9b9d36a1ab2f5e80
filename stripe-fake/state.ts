import { randomBytes } from 'node:crypto';
import { planIds, plans } from '../src/shared/plans';
import type { CheckoutPlan, CheckoutSession, Customer, EventRecord, FakeObject, Invoice, PortalSession, Price, Product, Subscription } from './objects';

/** Everything the fake knows, in memory; tests may read it directly. Insertion order is creation order. */
export interface FakeState {
  customers: Map<string, Customer>;
  products: Map<string, Product>;
  prices: Map<string, Price>;
  checkoutSessions: Map<string, CheckoutSession>;
  checkoutPlans: Map<string, CheckoutPlan>;
  portalSessions: Map<string, PortalSession>;
  subscriptions: Map<string, Subscription>;
  invoices: Map<string, Invoice>;
  events: EventRecord[];
  invoiceCount: number;
}

const alphabet = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';

/** An id in the service's style: a type prefix and random letters and digits. */
export function newId(prefix: string, length = 24): string {
  let s = prefix;
  for (const b of randomBytes(length)) s += alphabet[b % alphabet.length];
  return s;
}

export interface Clock {
  /** Unix seconds now. */
  seconds(): number;
  /**
   * Unix seconds, strictly increasing from call to call (a burst runs at most a few seconds
   * ahead of the wall clock), so that of two events or subscriptions the later one always
   * carries the larger `created`.
   */
  tick(): number;
}

export function createClock(now: () => number): Clock {
  let last = 0;
  const seconds = () => Math.floor(now() / 1000);
  return { seconds, tick: () => (last = Math.max(seconds(), last + 1)) };
}

/** A fresh state holding one product and one monthly price per paid plan of Farthing's plan table. */
export function createState(clock: Clock): FakeState {
  const state: FakeState = {
    customers: new Map(),
    products: new Map(),
    prices: new Map(),
    checkoutSessions: new Map(),
    checkoutPlans: new Map(),
    portalSessions: new Map(),
    subscriptions: new Map(),
    invoices: new Map(),
    events: [],
    invoiceCount: 0,
  };
  const created = clock.seconds();
  for (const id of planIds) {
    const plan = plans[id];
    if (!plan.lookupKey) continue;
    const product: Product = {
      id: newId('prod_', 14), object: 'product', created, active: true, name: `Farthing ${plan.name}`,
      default_price: null, metadata: { plan: plan.id }, livemode: false,
    };
    const price: Price = {
      id: newId('price_'), object: 'price', created, active: true, type: 'recurring', billing_scheme: 'per_unit',
      currency: 'usd', unit_amount: plan.monthlyCents, recurring: { interval: 'month', interval_count: 1, usage_type: 'licensed' },
      lookup_key: plan.lookupKey, nickname: `${plan.name} monthly`, product: product.id, metadata: { plan: plan.id }, livemode: false,
    };
    product.default_price = price.id;
    state.products.set(product.id, product);
    state.prices.set(price.id, price);
  }
  return state;
}

/** Any stored object by its id, whatever its type (for `expand`). */
export function findObject(state: FakeState, id: string): FakeObject | undefined {
  return (
    state.customers.get(id) ?? state.products.get(id) ?? state.prices.get(id) ?? state.checkoutSessions.get(id) ??
    state.portalSessions.get(id) ?? state.subscriptions.get(id) ?? state.invoices.get(id)
  );
}

/** Newest first, as the service lists. */
export function newestFirst<T>(items: Iterable<T>): T[] {
  return [...items].reverse();
}
