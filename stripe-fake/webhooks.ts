import { createHmac } from 'node:crypto';
import { request as httpRequest } from 'node:http';
import { request as httpsRequest } from 'node:https';
import type { EventRecord } from './objects';

/**
 * The `Stripe-Signature` header value: `t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<payload>">`,
 * keyed with the whole endpoint secret (its `whsec_` prefix included), which is what the
 * SDK's `webhooks.constructEvent` recomputes.
 */
export function signatureHeader(payload: string, secret: string, t: number): string {
  return `t=${t},v1=${createHmac('sha256', secret).update(`${t}.${payload}`).digest('hex')}`;
}

export interface WebhookDispatcher {
  /** Records the event and queues its delivery; returns at once. */
  send(record: EventRecord): void;
  /** Stops retries and aborts deliveries in flight. */
  close(): Promise<void>;
}

export interface DispatcherOptions {
  url?: string;
  secret: string;
  retryDelaysMs: number[];
  records: EventRecord[];
  log: (line: string) => void;
  attemptTimeoutMs?: number;
}

/** POSTs JSON once, without keep-alive (no socket outlives the attempt); resolves with the status. */
function postOnce(url: URL, payload: string, headers: Record<string, string>, timeoutMs: number, signal: AbortSignal): Promise<number> {
  return new Promise((resolve, reject) => {
    const send = url.protocol === 'https:' ? httpsRequest : httpRequest;
    const req = send(url, { method: 'POST', agent: false, signal, timeout: timeoutMs, headers: { ...headers, 'content-length': String(Buffer.byteLength(payload)) } }, (res) => {
      res.resume();
      res.on('end', () => resolve(res.statusCode ?? 0));
      res.on('error', reject);
    });
    req.on('timeout', () => req.destroy(new Error(`no answer within ${timeoutMs} ms`)));
    req.on('error', reject);
    req.end(payload);
  });
}

/**
 * Delivers events to one endpoint. Events sharing an ordering key (the subscription) go
 * out strictly one after another: a later event waits while an earlier one is retried,
 * so a receiver never sees a subscription's states out of order. A non-2xx answer or no
 * answer is retried after each of `retryDelaysMs` in turn, then given up as failed.
 */
export function createWebhookDispatcher(opts: DispatcherOptions): WebhookDispatcher {
  const url = opts.url ? new URL(opts.url) : null;
  const timeoutMs = opts.attemptTimeoutMs ?? 10_000;
  const queues = new Map<string, Promise<void>>();
  const wakers = new Set<() => void>();
  const stop = new AbortController();
  let closed = false;

  const sleep = (ms: number) =>
    new Promise<void>((resolve) => {
      const wake = () => {
        clearTimeout(timer);
        wakers.delete(wake);
        resolve();
      };
      const timer = setTimeout(wake, ms);
      wakers.add(wake);
    });

  async function attempt(record: EventRecord, target: URL): Promise<boolean> {
    const payload = JSON.stringify(record.event, null, 2);
    // Signed at each attempt with the wall clock: the receiver's tolerance is about delivery time.
    const headers = {
      'content-type': 'application/json; charset=utf-8',
      'user-agent': 'farthing-stripe-fake',
      'stripe-signature': signatureHeader(payload, opts.secret, Math.floor(Date.now() / 1000)),
    };
    const at = Date.now();
    try {
      const status = await postOnce(target, payload, headers, timeoutMs, stop.signal);
      record.attempts.push({ at, status, error: null, durationMs: Date.now() - at });
      opts.log(`${record.event.type} ${record.event.id} → ${status}`);
      return status >= 200 && status < 300;
    } catch (e) {
      const error = e instanceof Error ? e.message : String(e);
      record.attempts.push({ at, status: null, error, durationMs: Date.now() - at });
      opts.log(`${record.event.type} ${record.event.id} → ${error}`);
      return false;
    }
  }

  async function deliver(record: EventRecord, target: URL): Promise<void> {
    for (let n = 0; !closed; n++) {
      if (await attempt(record, target)) {
        record.delivery = 'delivered';
        return;
      }
      if (closed) return;
      if (n >= opts.retryDelaysMs.length) {
        record.delivery = 'failed';
        opts.log(`${record.event.type} ${record.event.id} given up after ${record.attempts.length} attempts`);
        return;
      }
      await sleep(opts.retryDelaysMs[n]);
    }
  }

  return {
    send(record) {
      opts.records.push(record);
      if (!url) {
        record.delivery = 'no_endpoint';
        return;
      }
      if (closed) return;
      const key = record.orderingKey;
      const current = (queues.get(key) ?? Promise.resolve()).then(() => deliver(record, url));
      queues.set(key, current);
      void current.then(() => {
        if (queues.get(key) === current) queues.delete(key);
      });
    },
    async close() {
      closed = true;
      for (const wake of [...wakers]) wake();
      stop.abort();
      await Promise.allSettled([...queues.values()]);
    },
  };
}
