import { NextResponse } from "next/server";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { ApiError } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { reissueOwnSession } from "@/lib/auth/reissue";
import { changePasswordSchema } from "@/lib/validations/user";
import { fetchUserById, updatePasswordHash } from "@/db/queries/users";

export const POST = apiRoute(async (request: Request) => {
  const user = await requireUser();
  const input = await parseJson(request, changePasswordSchema);
  const row = await fetchUserById(user.id);
  if (!row || !(await verifyPassword(input.currentPassword, row.password_hash))) {
    throw new ApiError(400, "invalid_input", "Some fields are not valid.", {
      currentPassword: ["This is not your current password."],
    });
  }
  // Every other session of the user ends here; this one carries on with the new version.
  await reissueOwnSession(await updatePasswordHash(user.id, await hashPassword(input.newPassword)));
  return NextResponse.json({ ok: true });
});
