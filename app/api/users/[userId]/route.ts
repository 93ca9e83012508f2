import { NextResponse } from "next/server";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { ApiError, forbidden, notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { can } from "@/lib/permissions";
import { LAST_ADMIN_MESSAGE } from "@/lib/users/admin-seat";
import { updateUserAccessSchema } from "@/lib/validations/user";
import { fetchUserById, updateUserAccess } from "@/db/queries/users";
import { clearSignInCountersOf } from "@/db/queries/sign-in-counters";

type Ctx = { params: Promise<{ userId: string }> };

/**
 * Changes a user's role or active flag (either ends the user's sessions), or lifts a sign-in lock.
 * Nobody, themselves included, may take the organisation's last active administrator out of that seat.
 */
export const PATCH = apiRoute(async (request: Request, { params }: Ctx) => {
  const admin = await requireUser();
  if (!can(admin.role, "users.manage")) throw forbidden("manage users");
  const userId = parseId((await params).userId, "The user");
  const input = await parseJson(request, updateUserAccessSchema);
  const change = await updateUserAccess({
    organisationId: admin.organisationId,
    userId,
    role: input.role,
    active: input.active,
  });
  if (change.kind === "not-found") throw notFound("The user");
  if (change.kind === "last-admin") {
    throw new ApiError(409, "last_admin", LAST_ADMIN_MESSAGE, {
      [input.role !== undefined ? "role" : "active"]: [LAST_ADMIN_MESSAGE],
    });
  }
  if (input.unlockSignIn) {
    const row = await fetchUserById(userId);
    if (row) await clearSignInCountersOf(row.email);
  }
  return NextResponse.json({ user: change.user });
});
