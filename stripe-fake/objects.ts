/**
 * The shapes of the objects the fake serves: the subset of each resource's fields that
 * Farthing reads, named and typed as the payment service's API names them.
 */
export type Metadata = Record<string, string>;

export interface ApiList<T> {
  object: 'list';
  url: string;
  has_more: boolean;
  data: T[];
}

export interface Customer {
  id: string;
  object: 'customer';
  created: number;
  email: string | null;
  name: string | null;
  description: string | null;
  metadata: Metadata;
  livemode: false;
}

export interface Product {
  id: string;
  object: 'product';
  created: number;
  active: boolean;
  name: string;
  default_price: string | null;
  metadata: Metadata;
  livemode: false;
}

export interface Price {
  id: string;
  object: 'price';
  created: number;
  active: boolean;
  type: 'recurring';
  billing_scheme: 'per_unit';
  currency: string;
  unit_amount: number;
  recurring: { interval: 'month'; interval_count: number; usage_type: 'licensed' };
  lookup_key: string | null;
  nickname: string | null;
  product: string;
  metadata: Metadata;
  livemode: false;
}

export interface CheckoutSession {
  id: string;
  object: 'checkout.session';
  created: number;
  expires_at: number;
  mode: 'subscription';
  status: 'open' | 'complete';
  payment_status: 'unpaid' | 'paid';
  customer: string | null;
  customer_email: string | null;
  client_reference_id: string | null;
  success_url: string;
  cancel_url: string | null;
  url: string;
  currency: string;
  amount_subtotal: number;
  amount_total: number;
  subscription: string | null;
  invoice: string | null;
  metadata: Metadata;
  livemode: false;
}

/** What a checkout session keeps out of its public object until it completes. */
export interface CheckoutPlan {
  lineItems: { price: string; quantity: number }[];
  subscriptionMetadata: Metadata;
}

export interface PortalSession {
  id: string;
  object: 'billing_portal.session';
  created: number;
  customer: string;
  return_url: string | null;
  url: string;
  livemode: false;
}

export interface SubscriptionItem {
  id: string;
  object: 'subscription_item';
  created: number;
  subscription: string;
  /** Always expanded, as the service does for subscription items. */
  price: Price;
  quantity: number;
  current_period_start: number;
  current_period_end: number;
  metadata: Metadata;
}

export type SubscriptionStatus = 'active' | 'past_due' | 'canceled';

export interface Subscription {
  id: string;
  object: 'subscription';
  created: number;
  start_date: number;
  customer: string;
  status: SubscriptionStatus;
  currency: string;
  collection_method: 'charge_automatically';
  /** Kept here as well as on each item: older API versions read it from the subscription. */
  current_period_start: number;
  current_period_end: number;
  billing_cycle_anchor: number;
  cancel_at_period_end: boolean;
  cancel_at: number | null;
  canceled_at: number | null;
  ended_at: number | null;
  items: ApiList<SubscriptionItem>;
  latest_invoice: string | null;
  metadata: Metadata;
  livemode: false;
}

export interface InvoiceLine {
  id: string;
  object: 'line_item';
  amount: number;
  currency: string;
  description: string;
  quantity: number;
  price: string;
  period: { start: number; end: number };
}

export interface Invoice {
  id: string;
  object: 'invoice';
  created: number;
  number: string;
  customer: string;
  /** The older top-level link; newer API versions read `parent.subscription_details`. */
  subscription: string;
  parent: { type: 'subscription_details'; subscription_details: { subscription: string; metadata: Metadata } };
  status: 'open' | 'paid';
  billing_reason: 'subscription_create' | 'subscription_cycle';
  currency: string;
  amount_due: number;
  amount_paid: number;
  amount_remaining: number;
  attempt_count: number;
  attempted: boolean;
  hosted_invoice_url: string;
  invoice_pdf: null;
  period_start: number;
  period_end: number;
  status_transitions: { finalized_at: number; paid_at: number | null };
  lines: ApiList<InvoiceLine>;
  livemode: false;
}

export type FakeObject = Customer | Product | Price | CheckoutSession | PortalSession | Subscription | Invoice;

export type EventType =
  | 'checkout.session.completed'
  | 'customer.subscription.created'
  | 'customer.subscription.updated'
  | 'customer.subscription.deleted'
  | 'invoice.paid'
  | 'invoice.payment_failed';

export interface FakeEvent {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  type: EventType;
  data: { object: FakeObject; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
}

export interface DeliveryAttempt {
  /** Unix milliseconds when the attempt started. */
  at: number;
  /** The receiver's HTTP status, or null when no answer came (refused, reset, timed out). */
  status: number | null;
  error: string | null;
  durationMs: number;
}

export interface EventRecord {
  event: FakeEvent;
  /** Events sharing this key are delivered one after another, in the order they happened. */
  orderingKey: string;
  delivery: 'pending' | 'delivered' | 'failed' | 'no_endpoint';
  attempts: DeliveryAttempt[];
}
