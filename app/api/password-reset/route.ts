import { NextResponse } from "next/server";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { ApiError } from "@/lib/api/errors";
import { hashPassword } from "@/lib/auth/password";
import { hashResetToken } from "@/lib/auth/password-reset";
import { resetLinkRefusal, RESET_REFUSAL_STATUS } from "@/lib/users/reset-link";
import { resetPasswordSchema } from "@/lib/validations/user";
import { redeemResetToken } from "@/db/queries/password-resets";
import { fetchUserById } from "@/db/queries/users";
import { clearSignInCountersOf } from "@/db/queries/sign-in-counters";

/**
 * Sets a new password from a mailed reset link, once. Open to anyone holding the link: the token is the
 * credential (256 random bits, so guessing needs no throttle of its own).
 */
export const POST = apiRoute(async (request: Request) => {
  const input = await parseJson(request, resetPasswordSchema);
  const state = await redeemResetToken(hashResetToken(input.token), await hashPassword(input.newPassword));
  if (state.kind !== "valid") {
    throw new ApiError(RESET_REFUSAL_STATUS[state.kind], `reset_${state.kind}`, resetLinkRefusal(state));
  }
  // A person locked out by failed sign-ins gets in with the new password at once.
  const person = await fetchUserById(state.userId);
  if (person) await clearSignInCountersOf(person.email);
  return NextResponse.json({ ok: true });
});
