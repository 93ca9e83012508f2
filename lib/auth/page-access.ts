import "server-only";
import { forbidden } from "next/navigation";
import { can, type Action, type Role } from "@/lib/permissions";

/**
 * For pages: a role without the permission gets the 403 page (app/(app)/forbidden.tsx) with a real
 * HTTP 403, as the API answers, not a 200 page that only reads as a refusal.
 */
export function requirePagePermission(role: Role | null | undefined, action: Action): void {
  if (!can(role, action)) forbidden();
}
