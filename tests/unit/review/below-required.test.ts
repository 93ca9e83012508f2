import { describe, expect, test } from "vitest";
import { checkDecision } from "@/lib/review/rules";
import { CHECKLIST_KEYS } from "@/lib/review/checklist";
import { governingFsOf, isBelowRequired } from "@/lib/review/below-required";
import { statusWords } from "@/lib/review/status";
import { runsToCsv, type RunCsvRow } from "@/lib/report/runs-csv";

const reviewer = { userId: 2, role: "reviewer" as const };
const submitted = { status: "submitted" as const, authorId: 1 };
const allOk = CHECKLIST_KEYS.map((key) => ({ key, state: "ok" as const, note: "" }));

describe("isBelowRequired: every method the run used must meet the required FS (at the 3 decimals shown)", () => {
  const both = ["bishop", "fellenius"];
  test("a run whose ordinary method falls short is below the requirement even when Bishop meets it", () => {
    // Common practice: the run is judged by each method it reports, so the lower one governs.
    expect(isBelowRequired({ methods: both, fsBishop: 1.52, fsFellenius: 1.46, requiredFs: 1.5 })).toBe(true);
    expect(governingFsOf({ methods: both, fsBishop: 1.52, fsFellenius: 1.46, requiredFs: 1.5 })).toBe(1.46);
  });

  test("1.4996 shows as 1.500 and meets 1.50; a method not used does not count; no FS at all is below", () => {
    expect(isBelowRequired({ methods: ["bishop"], fsBishop: 1.4996, fsFellenius: 0.9, requiredFs: 1.5 })).toBe(false);
    expect(isBelowRequired({ methods: both, fsBishop: null, fsFellenius: null, requiredFs: 1.3 })).toBe(true);
  });
});

describe("checkDecision: signing off below the required FS needs the reviewer's reason", () => {
  const below = (reason: string) => ({ requiredFs: 1.5, reason });

  test("refused with 422 on the reason field when the reason is missing or a stray word", () => {
    for (const reason of ["", "   ", "ok"]) {
      const v = checkDecision("approve", reviewer, submitted, {
        note: "",
        checklist: allOk,
        belowRequired: below(reason),
      });
      expect(v).toMatchObject({ ok: false, status: 422, code: "below_required_reason", field: "belowRequiredReason" });
      if (!v.ok) expect(v.message).toMatch(/below the required 1\.50/);
    }
  });

  test("accepted with a stated reason; a passing run needs none; returning a run is unaffected", () => {
    const reason = "Accepted as the record of a failing case, redesign follows.";
    expect(
      checkDecision("approve", reviewer, submitted, { note: "", checklist: allOk, belowRequired: below(reason) }).ok,
    ).toBe(true);
    expect(checkDecision("approve", reviewer, submitted, { note: "", checklist: allOk, belowRequired: null }).ok).toBe(
      true,
    );
    expect(
      checkDecision("return", reviewer, submitted, {
        note: "Flatten the face",
        checklist: [],
        belowRequired: below(""),
      }).ok,
    ).toBe(true);
  });

  test("the checklist is still checked first", () => {
    const v = checkDecision("approve", reviewer, submitted, {
      note: "",
      checklist: allOk.slice(1),
      belowRequired: below("Accepted as the record of a failing case."),
    });
    expect(v).toMatchObject({ ok: false, code: "checklist_open" });
  });
});

describe("the words of a sign-off below the required FS", () => {
  test("never plain 'signed off'", () => {
    expect(statusWords("approved", true)).toBe("signed off — below the required FS");
    expect(statusWords("approved", false)).toBe("signed off");
  });

  test("the runs CSV says so in its status column", () => {
    const row: RunCsvRow = {
      id: 7,
      title: "Upstream drawdown",
      sectionName: "Main",
      sectionVersion: 2,
      loadingCondition: "rapid-drawdown",
      face: "upstream",
      methods: ["bishop"],
      requiredFs: 1.3,
      fsBishop: 1.12,
      fsFellenius: null,
      status: "approved",
      authorName: "A",
      createdAt: "2026-01-01T00:00:00.000Z",
      reviewedByName: "R",
      reviewedAt: "2026-01-02T00:00:00.000Z",
      revisesRunId: null,
      belowRequiredReason: "Record of a failing case; redesign follows.",
    };
    expect(runsToCsv([row], "P")).toContain("signed off — below the required FS");
    expect(runsToCsv([{ ...row, belowRequiredReason: null, fsBishop: 1.4 }], "P")).not.toContain(
      "below the required FS",
    );
  });
});
