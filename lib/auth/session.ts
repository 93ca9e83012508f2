import "server-only";
import { getServerSession } from "next-auth";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { fetchSessionState } from "@/db/queries/users";
import { authOptions } from "./options";
import { unauthorized } from "@/lib/api/errors";
import { REQUEST_PATH_HEADER } from "@/lib/api/request-path";
import { signInPathFor } from "./callback-path";
import type { Role } from "@/lib/permissions";

export interface SessionUser {
  id: number;
  name: string;
  email: string;
  role: Role;
  organisationId: number;
  sessionVersion: number;
}

/**
 * The signed-in user, or null. A token is honoured only while it carries the user's current session
 * version and the user is active: sign-out, a password change, a role change and a deactivation bump
 * the version (db/queries/users.ts), so every token issued before them stops working at once.
 * A database failure is thrown, not taken for "signed out", so the caller can answer 503.
 */
export async function getSessionUser(): Promise<SessionUser | null> {
  const session = await getServerSession(authOptions);
  const user = session?.user;
  if (!user?.id) return null;
  const state = await fetchSessionState(user.id);
  if (!state || !state.active || state.sessionVersion !== user.sessionVersion) return null;
  return user;
}

/** For route handlers and server actions: no session is a 401. */
export async function requireUser(): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) throw unauthorized();
  return user;
}

/**
 * For pages: no session sends the visitor to sign in, with the page they asked for as the callbackUrl,
 * so a link from a mail brings them back to its item (proxy.ts passes the path on).
 */
export async function requirePageUser(): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) redirect(signInPathFor((await headers()).get(REQUEST_PATH_HEADER)));
  return user;
}
