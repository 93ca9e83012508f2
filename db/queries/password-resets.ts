import type { Knex } from "knex";
import { getDb } from "../index";
import { updatePasswordHash } from "./users";
import type { ResetTokenState } from "../../lib/users/types";

interface TokenRow {
  id: number;
  user_id: number;
  token_hash: string;
  expires_at: Date;
  used_at: Date | null;
}

/**
 * Keeps a new reset link's token hash for the user. Earlier links of the user that were not used yet
 * expire now: only the newest link mailed to a person works.
 */
export async function storeResetToken(
  input: { userId: number; tokenHash: string; expiresAt: Date; createdBy: number | null },
  db: Knex = getDb(),
): Promise<void> {
  await db.transaction(async (trx) => {
    await trx("password_reset_tokens")
      .where({ user_id: input.userId })
      .whereNull("used_at")
      .where("expires_at", ">", trx.raw("UTC_TIMESTAMP()"))
      .update({ expires_at: trx.raw("UTC_TIMESTAMP()") });
    await trx("password_reset_tokens").insert({
      user_id: input.userId,
      token_hash: input.tokenHash,
      expires_at: input.expiresAt,
      created_by: input.createdBy,
    });
  });
}

function stateOf(row: TokenRow | undefined, active: boolean, now: Date): ResetTokenState {
  if (!row) return { kind: "unknown" };
  if (row.used_at) return { kind: "used", usedAt: row.used_at.toISOString() };
  if (row.expires_at.getTime() <= now.getTime()) return { kind: "expired", expiredAt: row.expires_at.toISOString() };
  if (!active) return { kind: "inactive" };
  return { kind: "valid", userId: row.user_id, expiresAt: row.expires_at.toISOString() };
}

/** What a reset link's token hash stands for now, without using it (the reset page asks before showing its form). */
export async function readResetToken(tokenHash: string, db: Knex = getDb()): Promise<ResetTokenState> {
  const row = await db<TokenRow>("password_reset_tokens").where({ token_hash: tokenHash }).first();
  const user = row ? await db("users").where({ id: row.user_id }).first("active") : undefined;
  const now = (await db.raw("SELECT UTC_TIMESTAMP() AS now"))[0][0].now as Date;
  return stateOf(row, Boolean(user?.active), now);
}

/**
 * Uses a reset link: in one transaction, the token row is locked, checked (unused, unexpired, its person
 * active), marked used, and the new password hash written with a new session version, so every session
 * of the person ends. Returns the token's state as found; only "valid" changed anything.
 */
export async function redeemResetToken(
  tokenHash: string,
  passwordHash: string,
  db: Knex = getDb(),
): Promise<ResetTokenState> {
  return db.transaction(async (trx) => {
    const row = await trx<TokenRow>("password_reset_tokens").where({ token_hash: tokenHash }).forUpdate().first();
    const user = row ? await trx("users").where({ id: row.user_id }).forUpdate().first("active") : undefined;
    const now = (await trx.raw("SELECT UTC_TIMESTAMP() AS now"))[0][0].now as Date;
    const state = stateOf(row, Boolean(user?.active), now);
    if (state.kind !== "valid") return state;
    await trx("password_reset_tokens")
      .where({ id: row!.id })
      .update({ used_at: trx.raw("UTC_TIMESTAMP()") });
    await updatePasswordHash(state.userId, passwordHash, trx);
    return state;
  });
}
