import { NextResponse } from "next/server";
import { apiRoute, parseId } from "@/lib/api/handler";
import { ApiError, conflict, forbidden, notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { mailResetLink, ResetMailError } from "@/lib/auth/password-reset";
import { can } from "@/lib/permissions";
import { fetchUserById, toPublicUser } from "@/db/queries/users";

type Ctx = { params: Promise<{ userId: string }> };

/** Mails the person a one-time link for setting a new password; administrators only. */
export const POST = apiRoute(async (_request: Request, { params }: Ctx) => {
  const admin = await requireUser();
  if (!can(admin.role, "users.manage")) throw forbidden("reset passwords");
  const userId = parseId((await params).userId, "The user");
  const row = await fetchUserById(userId);
  if (!row || row.organisation_id !== admin.organisationId) throw notFound("The user");
  const person = toPublicUser(row);
  if (!person.active) throw conflict("This person is deactivated: reactivate them before sending a reset link.");
  try {
    const { expiresAt } = await mailResetLink(person, admin);
    return NextResponse.json({ sentTo: person.email, expiresAt }, { status: 201 });
  } catch (err) {
    if (!(err instanceof ResetMailError)) throw err;
    console.error("[users] reset mail failed", err);
    throw new ApiError(502, "mail_failed", `The reset link could not be mailed (${err.message}). Try again later.`);
  }
});
