import "server-only";
import { z } from "zod";
import { fetchUserByEmail, recordSignIn } from "@/db/queries/users";
import { bookCheckSlot, countSignInAttempt, takeBackSignInAttempt } from "@/db/queries/sign-in-counters";
import { DUMMY_HASH, verifyPassword } from "./password";
import { attemptKeys, decideThrottle, LOCK_MINUTES, SLOW_PATH_MAX_WAIT_MS, SLOW_PATH_SPACING_MS } from "./throttle";
import type { Role } from "@/lib/permissions";

/** The one message for every failed sign-in: it never says whether the account exists. */
export const SIGN_IN_FAILED = "The e-mail or password is not right.";

/** Said only after the right password, so it tells nothing to someone guessing. */
export const SIGN_IN_DEACTIVATED = "This account is deactivated. Ask your administrator to reactivate it.";

const BUSY = "Sign-in for this e-mail is being tried very often just now. Try again in a minute.";

export const credentialsSchema = z.object({
  email: z.string().trim().toLowerCase().email().max(254),
  password: z.string().min(1).max(200),
});

export interface SignedInUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  organisationId: number;
  sessionVersion: number;
}

export class SignInError extends Error {}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * Checks credentials with throttling; throws SignInError with a message safe to show. The attempt is
 * counted as a failure before the password is checked and taken back only when it was right, so parallel
 * guesses cannot all be checked against one stale count, and a right password clears nobody else's.
 */
export async function authenticate(raw: unknown, clientAddress: string): Promise<SignedInUser> {
  const parsed = credentialsSchema.safeParse(raw);
  if (!parsed.success) throw new SignInError(SIGN_IN_FAILED);
  const { email, password } = parsed.data;

  const keys = attemptKeys(email, clientAddress);
  const counts = await countSignInAttempt(Object.values(keys), LOCK_MINUTES);
  const decision = decideThrottle({
    pair: counts[keys.pair] ?? 1,
    address: counts[keys.address] ?? 1,
    account: counts[keys.account] ?? 1,
  });
  if (decision.locked) {
    const what = decision.locked === "account" ? "for this e-mail" : "from this network";
    throw new SignInError(`Too many failed sign-ins ${what}. Try again in ${decision.retryInMinutes} min.`);
  }
  let waitMs = decision.delayMs;
  if (decision.slowPath) {
    const turn = await bookCheckSlot(keys.account, SLOW_PATH_SPACING_MS, SLOW_PATH_MAX_WAIT_MS);
    if (turn === null) throw new SignInError(BUSY);
    waitMs = Math.max(waitMs, turn);
  }
  if (waitMs) await sleep(waitMs);

  const user = await fetchUserByEmail(email);
  const ok = await verifyPassword(password, user?.password_hash ?? DUMMY_HASH);
  if (!user || !ok) throw new SignInError(SIGN_IN_FAILED);
  if (!user.active) throw new SignInError(SIGN_IN_DEACTIVATED);
  await takeBackSignInAttempt(Object.values(keys));
  await recordSignIn(user.id);
  return {
    id: String(user.id),
    email: user.email,
    name: user.name,
    role: user.role,
    organisationId: user.organisation_id,
    sessionVersion: user.session_version,
  };
}
