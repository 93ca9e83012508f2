import { formatDateTime } from "@/lib/format";
import type { ResetTokenState } from "./types";

/** Why a reset link cannot set a password, in the words the reset page and the API both use. */
export function resetLinkRefusal(state: Exclude<ResetTokenState, { kind: "valid" }>): string {
  switch (state.kind) {
    case "used":
      return `This link was used on ${formatDateTime(state.usedAt)} and works only once. Ask your administrator for a new one.`;
    case "expired":
      return `This link expired on ${formatDateTime(state.expiredAt)}. Ask your administrator for a new one.`;
    case "inactive":
      return "This account is deactivated, so its password cannot be set. Ask your administrator.";
    case "unknown":
      return "This link is not valid. Check that the whole link was opened, or ask your administrator for a new one.";
  }
}

/** The HTTP status for each refusal: gone for a link that once worked, not found for one that never did. */
export const RESET_REFUSAL_STATUS: Record<Exclude<ResetTokenState, { kind: "valid" }>["kind"], number> = {
  used: 410,
  expired: 410,
  inactive: 409,
  unknown: 404,
};
