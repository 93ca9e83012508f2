import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { bumpSessionVersion } from "@/db/queries/users";
import { authenticate, SignInError, type SignedInUser } from "./sign-in";
import { clientAddress } from "./client-address";
import { safeCallbackPath } from "./callback-path";
import type { Role } from "@/lib/permissions";

/** Shown on the sign-in form when the database (or anything else) fails; the cause goes to the log. */
export const SIGN_IN_UNAVAILABLE = "Sign-in is unavailable just now. Try again in a few minutes.";

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials, req) {
        try {
          return await authenticate(credentials, clientAddress(req.headers ?? {}));
        } catch (err) {
          // next-auth passes a thrown message to the sign-in form as the error text.
          if (err instanceof SignInError) throw new Error(err.message);
          console.error("[auth] sign-in failed on the server", err);
          throw new Error(SIGN_IN_UNAVAILABLE);
        }
      },
    }),
  ],
  callbacks: {
    // After sign-in next-auth goes to the callbackUrl only when it is a page of this app (lib/auth/callback-path.ts).
    async redirect({ url, baseUrl }) {
      return baseUrl + (safeCallbackPath(url, baseUrl) ?? "/projects");
    },
    async jwt({ token, user }) {
      if (user) {
        const signedIn = user as unknown as SignedInUser;
        token.uid = Number(signedIn.id);
        token.role = signedIn.role;
        token.organisationId = signedIn.organisationId;
        token.sv = signedIn.sessionVersion;
      }
      return token;
    },
    async session({ session, token }) {
      session.user = {
        id: token.uid as number,
        name: token.name ?? "",
        email: token.email ?? "",
        role: token.role as Role,
        organisationId: token.organisationId as number,
        sessionVersion: token.sv ?? 0,
      };
      return session;
    },
  },
  events: {
    // Signing out ends every session of the user, not only this browser's cookie.
    async signOut({ token }) {
      if (typeof token?.uid === "number") await bumpSessionVersion(token.uid);
    },
  },
};
