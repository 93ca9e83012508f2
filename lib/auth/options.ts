import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { authenticate, SignInError, type SignedInUser } from "./sign-in";
import type { Role } from "../permissions";

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials) {
        try {
          return await authenticate(credentials);
        } catch (err) {
          // next-auth passes a thrown message to the sign-in form as the error text.
          if (err instanceof SignInError) throw new Error(err.message);
          throw err;
        }
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        const signedIn = user as unknown as SignedInUser;
        token.uid = Number(signedIn.id);
        token.role = signedIn.role;
        token.organisationId = signedIn.organisationId;
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
      };
      return session;
    },
  },
};
