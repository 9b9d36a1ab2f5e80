import type { Knex } from 'knex';
import type { Store, Options, ClientRateLimitInfo } from 'express-rate-limit';

/**
 * express-rate-limit's counters kept in PostgreSQL (one upsert per hit), so limits
 * hold across several app servers.
 */
export class PgRateLimitStore implements Store {
  private windowMs = 60_000;
  readonly prefix: string;
  constructor(
    private readonly db: Knex,
    prefix = 'rl:',
  ) {
    this.prefix = prefix;
  }

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const k = this.prefix + key;
    const { rows } = await this.db.raw(
      `INSERT INTO rate_limits (key, hits, reset_at) VALUES (?, 1, now() + (? * interval '1 millisecond'))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN rate_limits.reset_at <= now() THEN 1 ELSE rate_limits.hits + 1 END,
         reset_at = CASE WHEN rate_limits.reset_at <= now() THEN EXCLUDED.reset_at ELSE rate_limits.reset_at END
       RETURNING hits, reset_at`,
      [k, this.windowMs],
    );
    return { totalHits: Number(rows[0].hits), resetTime: new Date(rows[0].resetAt) };
  }

  async decrement(key: string): Promise<void> {
    await this.db('rate_limits').where({ key: this.prefix + key }).decrement('hits', 1);
  }

  async resetKey(key: string): Promise<void> {
    await this.db('rate_limits').where({ key: this.prefix + key }).delete();
  }
}
