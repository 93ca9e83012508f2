/**
 * Slows down guessing of one account's password. Keyed by the e-mail typed, whether or not such
 * a user exists, so neither the delay nor the lock tells an attacker who has an account.
 */
export const FREE_ATTEMPTS = 3;
export const LOCK_AFTER = 8;
export const LOCK_MINUTES = 15;
/** Failures older than this no longer count. */
export const FORGET_AFTER_MINUTES = 60;

export interface ThrottleDecision {
  /** Refuse without checking the password. */
  locked: boolean;
  /** Wait this long (ms) before answering, so scripted guessing gets slow. */
  delayMs: number;
  /** Minutes until the lock lifts, for the message. */
  retryInMinutes: number;
}

export function decideThrottle(record: { failures: number; lastFailureAt: Date } | null, now: Date): ThrottleDecision {
  if (!record) return { locked: false, delayMs: 0, retryInMinutes: 0 };
  const minutesSince = (now.getTime() - record.lastFailureAt.getTime()) / 60000;
  if (minutesSince > FORGET_AFTER_MINUTES) return { locked: false, delayMs: 0, retryInMinutes: 0 };
  if (record.failures >= LOCK_AFTER && minutesSince < LOCK_MINUTES) {
    return { locked: true, delayMs: 0, retryInMinutes: Math.ceil(LOCK_MINUTES - minutesSince) };
  }
  const extra = Math.max(0, record.failures - FREE_ATTEMPTS + 1);
  return { locked: false, delayMs: Math.min(extra * 500, 3000), retryInMinutes: 0 };
}
