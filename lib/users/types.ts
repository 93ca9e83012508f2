import type { Role } from "@/lib/permissions";

// A person as the app shows them: never the password hash (db/queries/users.ts reads the row).

export interface PublicUser {
  id: number;
  organisationId: number;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  /** ISO 8601 (UTC); null until their first sign-in. */
  lastSignInAt: string | null;
}

/** What a password-reset link stands for when it is opened or used (db/queries/password-resets.ts). */
export type ResetTokenState =
  | { kind: "valid"; userId: number; expiresAt: string }
  | { kind: "used"; usedAt: string }
  | { kind: "expired"; expiredAt: string }
  /** The person was deactivated after the link was sent. */
  | { kind: "inactive" }
  | { kind: "unknown" };
