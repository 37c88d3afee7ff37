// The sign-in limiter's counts in PostgreSQL (express-rate-limit's Store interface), so that the
// limits hold across restarts and across several app processes behind one address. One row per
// key; a window starts at the first failure and the row is reused once its window has passed.
import { eq, lt, sql } from 'drizzle-orm';
import type { ClientRateLimitInfo, IncrementResponse, Options, Store } from 'express-rate-limit';
import type { Db } from '../db/client';
import { signInLimits } from '../db/schema';

/** Rows whose window ended more than this long ago are removed now and then. */
const KEEP_EXPIRED_MS = 24 * 60 * 60_000;

export class PgRateLimitStore implements Store {
  readonly localKeys = false;
  private windowMs = 60_000;

  constructor(
    private readonly db: Db,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const [row] = await this.db
      .select()
      .from(signInLimits)
      .where(eq(signInLimits.key, this.prefix + key));
    return row && row.resetAt > new Date() ? { totalHits: row.hits, resetTime: row.resetAt } : undefined;
  }

  async increment(key: string): Promise<IncrementResponse> {
    const t = signInLimits;
    const windowEnd = sql`now() + ${this.windowMs} * interval '1 millisecond'`;
    // one statement, so that two requests at once are both counted
    const [row] = await this.db
      .insert(t)
      .values({ key: this.prefix + key, hits: 1, resetAt: windowEnd })
      .onConflictDoUpdate({
        target: t.key,
        set: {
          hits: sql`case when ${t.resetAt} <= now() then 1 else ${t.hits} + 1 end`,
          resetAt: sql`case when ${t.resetAt} <= now() then ${windowEnd} else ${t.resetAt} end`,
        },
      })
      .returning();
    if (Math.random() < 0.01) {
      await this.db.delete(t).where(lt(t.resetAt, new Date(Date.now() - KEEP_EXPIRED_MS)));
    }
    return { totalHits: row.hits, resetTime: row.resetAt };
  }

  async decrement(key: string): Promise<void> {
    await this.db
      .update(signInLimits)
      .set({ hits: sql`greatest(${signInLimits.hits} - 1, 0)` })
      .where(eq(signInLimits.key, this.prefix + key));
  }

  async resetKey(key: string): Promise<void> {
    await this.db.delete(signInLimits).where(eq(signInLimits.key, this.prefix + key));
  }
}
