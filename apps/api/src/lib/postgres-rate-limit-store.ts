// An express-rate-limit store over PostgreSQL, so every API process shares one count. One
// atomic upsert per hit; a window that has passed starts again at one.
import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize';

export class PostgresRateLimitStore implements Store {
  windowMs = 60_000;
  readonly localKeys = false;

  constructor(
    private readonly sequelize: Sequelize,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  private key(key: string): string {
    return `${this.prefix}:${key}`.slice(0, 300);
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const rows = await this.sequelize.query<{ hits: number; reset_at: Date }>(
      'SELECT hits, reset_at FROM rate_limit_hits WHERE key = $1 AND reset_at > now()',
      { bind: [this.key(key)], type: QueryTypes.SELECT },
    );
    const row = rows[0];
    return row ? { totalHits: row.hits, resetTime: row.reset_at } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const rows = await this.sequelize.query<{ hits: number; reset_at: Date }>(
      `INSERT INTO rate_limit_hits AS r (key, hits, reset_at)
       VALUES ($1, 1, now() + $2 * interval '1 millisecond')
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN r.reset_at <= now() THEN 1 ELSE r.hits + 1 END,
         reset_at = CASE WHEN r.reset_at <= now() THEN excluded.reset_at ELSE r.reset_at END
       RETURNING hits, reset_at`,
      { bind: [this.key(key), this.windowMs], type: QueryTypes.SELECT },
    );
    const row = rows[0];
    if (!row) throw new Error('rate limit upsert returned no row');
    return { totalHits: row.hits, resetTime: row.reset_at };
  }

  async decrement(key: string): Promise<void> {
    await this.sequelize.query(
      'UPDATE rate_limit_hits SET hits = greatest(hits - 1, 0) WHERE key = $1',
      { bind: [this.key(key)] },
    );
  }

  async resetKey(key: string): Promise<void> {
    await this.sequelize.query('DELETE FROM rate_limit_hits WHERE key = $1', {
      bind: [this.key(key)],
    });
  }
}
