import type { FakeContext } from './context';
import type { EventType, FakeEvent, FakeObject } from './objects';
import { newId } from './state';

/** The API version stamped on events: the default of the SDK release Farthing uses (stripe 23.1.0). */
export const apiVersion = '2026-10-28.endive';

function orderingKey(object: FakeObject): string {
  if (object.object === 'subscription') return object.id;
  if ((object.object === 'invoice' || object.object === 'checkout.session') && object.subscription) return object.subscription;
  return object.id;
}

/**
 * Records an event about `object` as it is now (a snapshot, not a live reference) and
 * queues its delivery. `created` comes from the strictly increasing clock, so a receiver
 * can order two events about one subscription by it.
 */
export function emit(ctx: FakeContext, type: EventType, object: FakeObject, previous?: Record<string, unknown>): FakeEvent {
  const event: FakeEvent = {
    id: newId('evt_'),
    object: 'event',
    api_version: apiVersion,
    created: ctx.clock.tick(),
    type,
    data: { object: structuredClone(object), ...(previous ? { previous_attributes: structuredClone(previous) } : {}) },
    livemode: false,
    pending_webhooks: ctx.hasEndpoint ? 1 : 0,
    request: { id: null, idempotency_key: null },
  };
  ctx.webhooks.send({ event, orderingKey: orderingKey(object), delivery: 'pending', attempts: [] });
  return event;
}
