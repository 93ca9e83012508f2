import { NextResponse } from "next/server";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { ApiError, forbidden } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { hashPassword } from "@/lib/auth/password";
import { can } from "@/lib/permissions";
import { createUserSchema } from "@/lib/validations/user";
import { createUser, fetchUserByEmail, fetchUsersOfOrganisation } from "@/db/queries/users";

export const GET = apiRoute(async () => {
  const user = await requireUser();
  if (!can(user.role, "users.manage")) throw forbidden("list users");
  return NextResponse.json({ users: await fetchUsersOfOrganisation(user.organisationId) });
});

export const POST = apiRoute(async (request: Request) => {
  const user = await requireUser();
  if (!can(user.role, "users.manage")) throw forbidden("add users");
  const input = await parseJson(request, createUserSchema);
  if (await fetchUserByEmail(input.email)) {
    throw new ApiError(409, "conflict", "A user with this e-mail exists already.", { email: ["Already in use."] });
  }
  const created = await createUser({
    organisationId: user.organisationId,
    email: input.email,
    name: input.name,
    role: input.role,
    passwordHash: await hashPassword(input.password),
  });
  return NextResponse.json({ user: created }, { status: 201 });
});
