import "server-only";
import { cookies } from "next/headers";
import { decode, encode } from "next-auth/jwt";
import { authOptions } from "./options";

/**
 * Re-issues the caller's own session cookie with a new session version, so a password change ends every
 * other session of the user but not the one that made the change.
 */
export async function reissueOwnSession(sessionVersion: number): Promise<void> {
  const secret = process.env.NEXTAUTH_SECRET;
  if (!secret) return;
  const secure = (process.env.NEXTAUTH_URL ?? "").startsWith("https://");
  const cookieName = `${secure ? "__Secure-" : ""}next-auth.session-token`;
  const jar = await cookies();
  const token = await decode({ token: jar.get(cookieName)?.value, secret });
  if (!token) return;
  const maxAge = authOptions.session?.maxAge ?? 12 * 60 * 60;
  const value = await encode({ token: { ...token, sv: sessionVersion }, secret, maxAge });
  jar.set(cookieName, value, { httpOnly: true, sameSite: "lax", path: "/", secure, maxAge });
}
