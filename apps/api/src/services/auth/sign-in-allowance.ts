// Sign-in allowances in PostgreSQL, shared by every API process: a key (an account tried from
// unknown browsers, one known browser, an address) has `limit` attempts per window. Taking an
// attempt is atomic and happens before the password is checked, so a burst of parallel guesses
// cannot overrun the limit; a success gives its attempt back, so only failures count. The
// failure that uses the last attempt pauses the key for one window, whatever password follows.
import { QueryTypes } from 'sequelize';
import type { Transaction } from 'sequelize';
import { database, withTransaction } from '../../db/with-transaction';

export interface AllowanceRule {
  limit: number;
  windowMs: number;
}

/** An attempt taken from a key's allowance, to be given back or recorded as a failure. */
export interface TakenAttempt {
  key: string;
  windowStartedAt: Date;
}

export type TakeResult = { taken: true; attempt: TakenAttempt } | { taken: false; until: Date };

export const allowanceKeys = {
  /** Attempts on an account from browsers it has not signed in from. */
  account: (email: string) => `account:${email.trim().toLowerCase()}`.slice(0, 300),
  /** Attempts on an account from one browser it has signed in from. */
  device: (deviceId: string, userId: string) => `device:${deviceId}:${userId}`,
  /** Attempts from one address (an IPv6 address counts by its /56). */
  address: (address: string) => `address:${address}`.slice(0, 300),
};

interface Row {
  attempts: number;
  window_started_at: Date;
  locked_until: Date | null;
}

export async function takeAttempt(
  key: string,
  rule: AllowanceRule,
  now: Date,
): Promise<TakeResult> {
  return withTransaction(async (transaction) => {
    await database().query(
      `INSERT INTO sign_in_allowances (key, attempts, window_started_at) VALUES ($1, 0, $2)
       ON CONFLICT (key) DO NOTHING`,
      { bind: [key, now], transaction },
    );
    const [row] = await database().query<Row>(
      `SELECT attempts, window_started_at, locked_until FROM sign_in_allowances
        WHERE key = $1 FOR UPDATE`,
      { bind: [key], type: QueryTypes.SELECT, transaction },
    );
    if (!row) throw new Error('sign-in allowance row vanished');
    if (row.locked_until && row.locked_until > now)
      return { taken: false, until: row.locked_until };
    let attempts = row.attempts;
    let windowStartedAt = row.window_started_at;
    // A pause that has run out, or a window that has passed, starts a fresh allowance.
    if (row.locked_until || windowStartedAt.getTime() + rule.windowMs <= now.getTime()) {
      attempts = 0;
      windowStartedAt = now;
    }
    // Only attempts still in flight can fill the allowance without a pause: refuse the extra.
    if (attempts >= rule.limit)
      return { taken: false, until: new Date(windowStartedAt.getTime() + rule.windowMs) };
    await database().query(
      `UPDATE sign_in_allowances SET attempts = $2, window_started_at = $3, locked_until = NULL
        WHERE key = $1`,
      { bind: [key, attempts + 1, windowStartedAt], transaction },
    );
    return { taken: true, attempt: { key, windowStartedAt } };
  });
}

/** A successful attempt does not count against the allowance. */
export async function giveBack(attempt: TakenAttempt): Promise<void> {
  await database().query(
    `UPDATE sign_in_allowances SET attempts = greatest(attempts - 1, 0)
      WHERE key = $1 AND window_started_at = $2 AND locked_until IS NULL`,
    { bind: [attempt.key, attempt.windowStartedAt] },
  );
}

/**
 * A failed attempt stays counted. When it was the last one in the allowance the key is paused
 * for one window; `pauseStarted` is true for exactly one failure per pause.
 */
export async function recordFailure(
  attempt: TakenAttempt,
  rule: AllowanceRule,
  now: Date,
): Promise<{ pauseStarted: boolean }> {
  const rows = await database().query<{ key: string }>(
    `UPDATE sign_in_allowances SET locked_until = $3
      WHERE key = $1 AND window_started_at = $2 AND attempts >= $4 AND locked_until IS NULL
      RETURNING key`,
    {
      bind: [
        attempt.key,
        attempt.windowStartedAt,
        new Date(now.getTime() + rule.windowMs),
        rule.limit,
      ],
      type: QueryTypes.SELECT,
    },
  );
  return { pauseStarted: rows.length > 0 };
}

/** Lifts a pause and forgets the failures (an unlock link, a new password). */
export async function clearAllowance(key: string, transaction?: Transaction): Promise<void> {
  await database().query('DELETE FROM sign_in_allowances WHERE key = $1', {
    bind: [key],
    transaction,
  });
}
