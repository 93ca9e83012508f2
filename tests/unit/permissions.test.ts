import { describe, expect, test } from "vitest";
import { ACTIONS, can, effectiveProjectRole, ROLES } from "@/lib/permissions";
import { decideThrottle, FREE_ATTEMPTS, LOCK_AFTER } from "@/lib/auth/throttle";

describe("can(role, action)", () => {
  test("only reviewers sign off runs, and a reviewer cannot run analyses (separation of duties, common practice)", () => {
    expect(ROLES.filter((r) => can(r, "run.review"))).toEqual(["reviewer"]);
    expect(can("reviewer", "run.create")).toBe(false);
  });
  test("only admins manage people and members", () => {
    expect(ROLES.filter((r) => can(r, "users.manage"))).toEqual(["admin"]);
    expect(ROLES.filter((r) => can(r, "members.manage"))).toEqual(["admin"]);
  });
  test("every role may view a project it belongs to; no role means no action", () => {
    for (const r of ROLES) expect(can(r, "project.view")).toBe(true);
    for (const a of ACTIONS) expect(can(null, a)).toBe(false);
  });
  test("effectiveProjectRole: admins keep theirs; others need a membership", () => {
    expect(effectiveProjectRole("admin", null)).toBe("admin");
    expect(effectiveProjectRole("engineer", null)).toBeNull();
    expect(effectiveProjectRole("engineer", "reviewer")).toBe("reviewer");
  });
});

describe("decideThrottle(record, now)", () => {
  const now = new Date("2026-01-01T12:00:00Z");
  test("no delay for the first attempts, growing delay after, lock after many", () => {
    expect(decideThrottle(null, now).delayMs).toBe(0);
    expect(decideThrottle({ failures: FREE_ATTEMPTS - 1, lastFailureAt: now }, now).delayMs).toBe(0);
    const a = decideThrottle({ failures: FREE_ATTEMPTS + 1, lastFailureAt: now }, now).delayMs;
    const b = decideThrottle({ failures: FREE_ATTEMPTS + 2, lastFailureAt: now }, now).delayMs;
    expect(b).toBeGreaterThan(a);
    expect(decideThrottle({ failures: LOCK_AFTER, lastFailureAt: now }, now).locked).toBe(true);
  });
  test("a lock lifts after its time, and old failures are forgotten", () => {
    const later = new Date(now.getTime() + 16 * 60000);
    expect(decideThrottle({ failures: LOCK_AFTER, lastFailureAt: now }, later).locked).toBe(false);
    const muchLater = new Date(now.getTime() + 120 * 60000);
    expect(decideThrottle({ failures: 50, lastFailureAt: now }, muchLater)).toEqual({
      locked: false,
      delayMs: 0,
      retryInMinutes: 0,
    });
  });
});
