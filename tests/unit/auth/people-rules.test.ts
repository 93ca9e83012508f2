import { describe, expect, test } from "vitest";
import { isLastActiveAdmin, LAST_ADMIN_MESSAGE } from "@/lib/users/admin-seat";
import { resetLinkRefusal, RESET_REFUSAL_STATUS } from "@/lib/users/reset-link";
import { composeResetMail } from "@/lib/mail/compose-reset";
import { resetPasswordSchema } from "@/lib/validations/user";
import type { PublicUser } from "@/lib/users/types";

const person = (id: number, role: PublicUser["role"], active = true): PublicUser => ({
  id,
  organisationId: 1,
  email: `p${id}@scarpline.test`,
  name: `Person ${id}`,
  role,
  active,
  lastSignInAt: null,
});

describe("the last administrator's seat", () => {
  test("only the sole active administrator holds it; a deactivated administrator does not count", () => {
    const team = [person(1, "admin"), person(2, "engineer"), person(3, "admin", false)];
    expect(isLastActiveAdmin(team[0], team)).toBe(true);
    expect(isLastActiveAdmin(team[1], team)).toBe(false);
    expect(isLastActiveAdmin(team[2], team)).toBe(false);
    const two = [...team, person(4, "admin")];
    expect(isLastActiveAdmin(two[0], two)).toBe(false);
    expect(LAST_ADMIN_MESSAGE).toMatch(/at least one active administrator/);
  });
});

/**
 * OWASP Forgot Password Cheat Sheet (from memory): a reset token is random, single-use, expires, is
 * stored hashed, and the new password follows the same policy as any other; the person is told how
 * long the link lasts.
 */
describe("reset links", () => {
  test("the mail says when the link expires, in ISO 8601 with the zone, and that it works once", () => {
    const mail = composeResetMail({
      recipientName: "Demo Engineer",
      adminName: "Demo Administrator",
      link: "http://127.0.0.1:3000/reset-password/abc",
      expiresAt: "2026-12-02T08:15:00.000Z",
      minutesValid: 60,
    });
    expect(mail.text).toContain("http://127.0.0.1:3000/reset-password/abc");
    expect(mail.text).toContain("expires on 2026-12-02 08:15 UTC (60 minutes after it was sent)");
    expect(mail.text).toMatch(/works once/);
  });

  test("a used, an expired and an unknown link are refused with different words and statuses", () => {
    expect(resetLinkRefusal({ kind: "used", usedAt: "2026-12-02T07:00:00Z" })).toMatch(
      /used on 2026-12-02 07:00 UTC and works only once/,
    );
    expect(resetLinkRefusal({ kind: "expired", expiredAt: "2026-12-02T07:00:00Z" })).toMatch(
      /expired on 2026-12-02 07:00 UTC/,
    );
    expect(resetLinkRefusal({ kind: "unknown" })).toMatch(/not valid/);
    // RFC 9110 §15.5.11: 410 Gone for what existed and is no more; §15.5.5: 404 for what was never there.
    expect(RESET_REFUSAL_STATUS).toMatchObject({ used: 410, expired: 410, unknown: 404 });
  });

  test("the new password follows the same rule as a password change", () => {
    const token = "t".repeat(43);
    const weak = resetPasswordSchema.safeParse({ token, newPassword: "short1", confirmPassword: "short1" });
    expect(weak.success).toBe(false);
    expect(weak.error?.issues[0].message).toBe("At least 10 characters.");
    const differ = resetPasswordSchema.safeParse({
      token,
      newPassword: "long-enough-1",
      confirmPassword: "long-enough-2",
    });
    expect(differ.error?.issues.map((i) => i.message)).toEqual(["The two new passwords differ."]);
    expect(
      resetPasswordSchema.safeParse({ token, newPassword: "long-enough-1", confirmPassword: "long-enough-1" }).success,
    ).toBe(true);
  });
});
