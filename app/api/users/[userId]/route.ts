import { NextResponse } from "next/server";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { ApiError, forbidden, notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { can } from "@/lib/permissions";
import { updateUserAccessSchema } from "@/lib/validations/user";
import { fetchUserById, updateUserAccess } from "@/db/queries/users";
import { clearSignInCountersOf } from "@/db/queries/sign-in-counters";

type Ctx = { params: Promise<{ userId: string }> };

/** Changes a user's role or active flag (either ends the user's sessions), or lifts a sign-in lock. */
export const PATCH = apiRoute(async (request: Request, { params }: Ctx) => {
  const admin = await requireUser();
  if (!can(admin.role, "users.manage")) throw forbidden("manage users");
  const userId = parseId((await params).userId, "The user");
  const input = await parseJson(request, updateUserAccessSchema);
  if (userId === admin.id && (input.role !== undefined || input.active === false)) {
    throw new ApiError(400, "invalid_input", "You cannot change your own role or deactivate yourself.", {
      role: ["Ask another administrator."],
    });
  }
  const updated = await updateUserAccess({
    organisationId: admin.organisationId,
    userId,
    role: input.role,
    active: input.active,
  });
  if (!updated) throw notFound("The user");
  if (input.unlockSignIn) {
    const row = await fetchUserById(userId);
    if (row) await clearSignInCountersOf(row.email);
  }
  return NextResponse.json({ user: updated });
});
