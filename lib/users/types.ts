import type { Role } from "@/lib/permissions";

// A person as the app shows them: never the password hash (db/queries/users.ts reads the row).

export interface PublicUser {
  id: number;
  organisationId: number;
  email: string;
  name: string;
  role: Role;
  active: boolean;
}
