import type { Role } from "@/lib/permissions";

declare module "next-auth" {
  interface Session {
    user: { id: number; name: string; email: string; role: Role; organisationId: number; sessionVersion: number };
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    uid?: number;
    role?: Role;
    organisationId?: number;
    /** The user's session version when the token was issued (lib/auth/session.ts). */
    sv?: number;
  }
}
