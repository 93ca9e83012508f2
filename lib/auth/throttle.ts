/**
 * Slows down and stops password guessing. Every attempt is counted (db/queries/sign-in-counters.ts)
 * before its password is checked, under three keys:
 * - the pair (client address, e-mail): locked after LOCK_AFTER failures, so one client guessing one
 *   account is stopped without checking more passwords;
 * - the client address: locked after ADDRESS_LOCK_AFTER failures, whatever e-mails it tries;
 * - the e-mail, from every address: never locked, since a stranger could then lock anyone out, but
 *   past FREE_ATTEMPTS every attempt on it waits longer, and past LOCK_AFTER its passwords are checked
 *   one at a time, SLOW_PATH_SPACING_MS apart, whoever sends them: the slow path the owner can still
 *   sign in by, and a rate no crowd of addresses can raise.
 * Keyed by the e-mail typed, whether or not such a user exists, so no answer tells who has an account.
 */
export const FREE_ATTEMPTS = 3;
export const LOCK_AFTER = 8;
export const ADDRESS_LOCK_AFTER = 100;
/** A key's count starts again once it has had no failure for this long; a lock lasts as long. */
export const LOCK_MINUTES = 15;
export const MAX_DELAY_MS = 3000;
export const SLOW_PATH_SPACING_MS = 1000;
/** An attempt that would queue longer than this on the slow path is turned away (not checked). */
export const SLOW_PATH_MAX_WAIT_MS = 10_000;

export interface AttemptKeys {
  pair: string;
  address: string;
  account: string;
}

export function attemptKeys(email: string, address: string): AttemptKeys {
  return { pair: `pair:${address} ${email}`, address: `address:${address}`, account: `account:${email}` };
}

export interface ThrottleDecision {
  /** Refuse without checking the password: this e-mail from this client, or this client whatever the e-mail. */
  locked: false | "account" | "address";
  /** Wait this long (ms) before checking, so scripted guessing gets slow. */
  delayMs: number;
  /** Minutes until the lock lifts, for the message. */
  retryInMinutes: number;
  /** Check the password only in the account's turn (SLOW_PATH_SPACING_MS apart). */
  slowPath: boolean;
}

/** Decides from each key's count, this attempt included. */
export function decideThrottle(counts: { pair: number; address: number; account: number }): ThrottleDecision {
  if (counts.address > ADDRESS_LOCK_AFTER) {
    return { locked: "address", delayMs: 0, retryInMinutes: LOCK_MINUTES, slowPath: false };
  }
  if (counts.pair > LOCK_AFTER) return { locked: "account", delayMs: 0, retryInMinutes: LOCK_MINUTES, slowPath: false };
  const extra = Math.max(0, Math.max(counts.pair, counts.account) - FREE_ATTEMPTS);
  return {
    locked: false,
    delayMs: Math.min(extra * 500, MAX_DELAY_MS),
    retryInMinutes: 0,
    slowPath: counts.account > LOCK_AFTER,
  };
}
