import type { FakeState, Clock } from './state';
import type { WebhookDispatcher } from './webhooks';

/** What every route and operation of one fake instance shares. */
export interface FakeContext {
  state: FakeState;
  clock: Clock;
  /** Unix milliseconds now (the injectable clock). */
  now(): number;
  /** Where browsers reach the hosted pages, without a trailing slash. */
  publicUrl(): string;
  webhooks: WebhookDispatcher;
  hasEndpoint: boolean;
}
