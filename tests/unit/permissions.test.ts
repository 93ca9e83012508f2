import { describe, expect, test } from "vitest";
import { ACTIONS, can, effectiveProjectRole, ROLES } from "@/lib/permissions";
import { ADDRESS_LOCK_AFTER, decideThrottle, FREE_ATTEMPTS, LOCK_AFTER, MAX_DELAY_MS } from "@/lib/auth/throttle";

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

describe("decideThrottle(counts)", () => {
  const at = (pair: number, account = pair, address = pair) => decideThrottle({ pair, account, address });
  test("no delay for the first attempts, a growing delay after, a lock after many from one client", () => {
    expect(at(1).delayMs).toBe(0);
    expect(at(FREE_ATTEMPTS).delayMs).toBe(0);
    expect(at(FREE_ATTEMPTS + 2).delayMs).toBeGreaterThan(at(FREE_ATTEMPTS + 1).delayMs);
    expect(at(LOCK_AFTER).locked).toBe(false);
    expect(at(LOCK_AFTER + 1).locked).toBe("account");
  });
  test("failures from other clients slow an account down but never lock it, so a stranger cannot shut it", () => {
    const owner = at(1, 500, 1);
    expect(owner.locked).toBe(false);
    expect(owner.delayMs).toBe(MAX_DELAY_MS);
    // Past the lock count, the account's passwords are checked one at a time, whoever sends them.
    expect(owner.slowPath).toBe(true);
    expect(at(LOCK_AFTER).slowPath).toBe(false);
  });
  test("one client address trying many accounts is locked", () => {
    expect(at(1, 1, ADDRESS_LOCK_AFTER).locked).toBe(false);
    expect(at(1, 1, ADDRESS_LOCK_AFTER + 1).locked).toBe("address");
  });
});
