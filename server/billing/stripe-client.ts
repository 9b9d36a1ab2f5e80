import Stripe from 'stripe';
import type { Config } from '../config';

/**
 * The official SDK. With STRIPE_API_URL set (development and tests) it talks to our local
 * fake on loopback; with real keys and no URL it talks to the real service, no code change.
 */
export function createStripe(config: Config): Stripe {
  const base = config.STRIPE_API_URL ? new URL(config.STRIPE_API_URL) : null;
  return new Stripe(config.STRIPE_SECRET_KEY, {
    ...(base ? { host: base.hostname, port: Number(base.port || (base.protocol === 'https:' ? 443 : 80)), protocol: base.protocol.replace(':', '') as 'http' | 'https' } : {}),
    maxNetworkRetries: base ? 0 : 2,
    telemetry: false,
    timeout: 10_000,
  });
}
