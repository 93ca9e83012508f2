import Papa from "papaparse";
import { describe, expect, test } from "vitest";
import {
  availableActions,
  checkChecklistEdit,
  checkComment,
  checkDecision,
  checkDraftChange,
  checkTransition,
} from "@/lib/review/rules";
import { CHECKLIST_KEYS, checklistHints, openChecklistItems } from "@/lib/review/checklist";
import { pinMarkers, toScreen, toWorld } from "@/lib/review/pin-markers";
import { composeNotice } from "@/lib/mail/compose-notice";
import { runsToCsv } from "@/lib/report/runs-csv";
import type { RunStatus } from "@/lib/review/status";

const author = { userId: 1, role: "engineer" as const };
const reviewer = { userId: 2, role: "reviewer" as const };
const designer = { userId: 3, role: "designer" as const };
const admin = { userId: 4, role: "admin" as const };
const run = (status: RunStatus) => ({ status, authorId: 1 });
const allOk = CHECKLIST_KEYS.map((key) => ({ key, state: "ok" as const, note: "" }));

describe("checkTransition(action, actor, run)", () => {
  test("the author submits a draft; a reviewer approves or returns a submitted run", () => {
    expect(checkTransition("submit", author, run("draft")).ok).toBe(true);
    expect(checkTransition("approve", reviewer, run("submitted")).ok).toBe(true);
    expect(checkTransition("return", reviewer, run("submitted")).ok).toBe(true);
  });

  test("refuses a designer's or an admin's decision with 403", () => {
    expect(checkTransition("approve", designer, run("submitted"))).toMatchObject({
      ok: false,
      status: 403,
      code: "forbidden",
    });
    expect(checkTransition("return", admin, run("submitted"))).toMatchObject({ ok: false, status: 403 });
    expect(checkTransition("submit", reviewer, run("draft"))).toMatchObject({ ok: false, status: 403 });
  });

  test("refuses self-review even when the author holds a reviewer's role", () => {
    expect(checkTransition("approve", { userId: 1, role: "reviewer" }, run("submitted"))).toMatchObject({
      ok: false,
      status: 403,
      code: "self_review",
    });
  });

  test("refuses moves out of the wrong status with 409 and says why", () => {
    const again = checkTransition("submit", author, run("submitted"));
    expect(again).toMatchObject({ ok: false, status: 409 });
    expect(!again.ok && again.message).toMatch(/already awaiting review/);
    const frozen = checkTransition("submit", author, run("approved"));
    expect(!frozen.ok && frozen.message).toMatch(/signed off/);
    expect(checkTransition("submit", author, run("returned"))).toMatchObject({ ok: false, status: 409 });
    expect(checkTransition("approve", reviewer, run("draft"))).toMatchObject({ ok: false, status: 409 });
    expect(checkTransition("return", reviewer, run("approved"))).toMatchObject({ ok: false, status: 409 });
  });

  test("availableActions lists exactly the permitted moves", () => {
    expect(availableActions(author, run("draft"))).toEqual(["submit"]);
    expect(availableActions(reviewer, run("submitted"))).toEqual(["approve", "return"]);
    expect(availableActions(reviewer, run("approved"))).toEqual([]);
    expect(availableActions(designer, run("draft"))).toEqual([]);
  });
});

describe("checkDecision(action, actor, run, input)", () => {
  test("a return needs a note; a sign-off needs every checklist item confirmed", () => {
    expect(checkDecision("return", reviewer, run("submitted"), { note: "  ", checklist: [] })).toMatchObject({
      ok: false,
      status: 422,
      field: "note",
    });
    expect(checkDecision("return", reviewer, run("submitted"), { note: "Fix the toe", checklist: [] }).ok).toBe(true);
    const open = checkDecision("approve", reviewer, run("submitted"), { note: "", checklist: allOk.slice(1) });
    expect(open).toMatchObject({ ok: false, status: 409, code: "checklist_open" });
    expect(!open.ok && open.message).toMatch(/geometry matches the drawings/);
    const concern = allOk.map((c) => (c.key === "fs" ? { ...c, state: "concern" as const } : c));
    expect(checkDecision("approve", reviewer, run("submitted"), { note: "", checklist: concern }).ok).toBe(false);
    expect(checkDecision("approve", reviewer, run("submitted"), { note: "", checklist: allOk }).ok).toBe(true);
  });
});

describe("draft changes, comments and the checklist", () => {
  test("only the author renames or deletes, and only a draft; frozen runs refuse everyone with 409", () => {
    expect(checkDraftChange(author, run("draft"), "rename").ok).toBe(true);
    expect(checkDraftChange(designer, run("draft"), "delete")).toMatchObject({ ok: false, status: 403 });
    for (const s of ["submitted", "returned", "approved"] as const) {
      expect(checkDraftChange(author, run(s), "delete")).toMatchObject({ ok: false, status: 409 });
      expect(checkDraftChange(admin, run(s), "rename")).toMatchObject({ ok: false, status: 409 });
    }
  });

  test("comments close at sign-off; the checklist is the reviewer's while the run awaits review", () => {
    expect(checkComment(author, run("returned")).ok).toBe(true);
    expect(checkComment(admin, run("submitted"))).toMatchObject({ ok: false, status: 403 });
    expect(checkComment(reviewer, run("approved"))).toMatchObject({ ok: false, status: 409 });
    expect(checkChecklistEdit(reviewer, run("submitted")).ok).toBe(true);
    expect(checkChecklistEdit(reviewer, run("draft"))).toMatchObject({ ok: false, status: 409 });
    expect(checkChecklistEdit(author, run("submitted"))).toMatchObject({ ok: false, status: 403 });
  });

  test("openChecklistItems counts untouched items as open", () => {
    expect(openChecklistItems([]).map((i) => i.key)).toEqual([...CHECKLIST_KEYS]);
    expect(openChecklistItems(allOk)).toEqual([]);
  });

  test("checklistHints flags a minimum on the grid edge and an FS below the required value", () => {
    const h = checklistHints({
      warnings: [{ code: "minimum-on-grid-edge", message: "on the right edge" }],
      fs: { bishop: 1.42, fellenius: 1.61 },
      requiredFs: 1.5,
    });
    expect(h.grid).toEqual({ tone: "check", text: "on the right edge" });
    expect(h.fs?.tone).toBe("check");
    expect(h.fs?.text).toContain("Bishop 1.420 < 1.50");
    expect(checklistHints({ warnings: [], fs: { bishop: 1.6 }, requiredFs: 1.5 }).fs?.tone).toBe("good");
  });
});

describe("pins, notices and exports", () => {
  test("pinMarkers places slice comments at the slice's base middle, and toWorld inverts toScreen", () => {
    const slice = { xLeft: 10, xRight: 12, baseY: 3 } as never;
    const markers = pinMarkers(
      [
        { body: "a", pin: { x: 1, y: 2 }, slice: null },
        { body: "b", pin: null, slice: null },
        { body: "c", pin: null, slice: { number: 1, method: "bishop" } },
      ],
      { bishop: { slices: [slice] } },
    );
    expect(markers).toEqual([
      { n: 1, x: 1, y: 2, label: "a" },
      { n: 3, x: 11, y: 3, label: "c" },
    ]);
    const view = { scale: 7.5, offsetX: 40, offsetY: 300 };
    const s = toScreen(view, 12.3, 4.5);
    const w = toWorld(view, s.left, s.top);
    expect(w.x).toBeCloseTo(12.3, 9);
    expect(w.y).toBeCloseTo(4.5, 9);
  });

  test("composeNotice(run-returned) carries the note, the comments, the link and the caution", () => {
    const n = composeNotice("run-returned", {
      projectName: "Test dam",
      runId: 9,
      runTitle: "Steady seepage",
      section: "Main v2",
      condition: "Long-term steady seepage",
      face: "downstream",
      requiredFs: 1.5,
      fs: { bishop: 1.42, fellenius: null },
      actorName: "Demo Reviewer",
      note: "Recheck the drain.",
      at: "2026-01-05T10:00:00Z",
      link: "http://127.0.0.1:3000/projects/1/runs/9",
      accountLink: "http://127.0.0.1:3000/account",
      comments: [{ label: "#1 on slice 4 (Bishop)", body: "High u" }],
    });
    expect(n.subject).toBe("Returned with comments: Steady seepage — Test dam");
    expect(n.text).toContain("Reviewer's note: Recheck the drain.");
    expect(n.text).toContain("#1 on slice 4 (Bishop): High u");
    expect(n.text).toContain("Bishop's simplified: FS 1.420 is below the required 1.50");
    expect(n.text).toContain("http://127.0.0.1:3000/projects/1/runs/9");
    expect(n.text).toContain("Caution:");
  });

  test("composeNotice(run-approved) says in the subject and the text when a run below its required FS is signed off", () => {
    const facts = {
      projectName: "Test dam",
      runId: 9,
      runTitle: "Steady seepage",
      section: "Main v2",
      condition: "Long-term steady seepage",
      face: "downstream",
      requiredFs: 1.5,
      fs: { bishop: 1.42, fellenius: null },
      actorName: "Demo Reviewer",
      note: "",
      at: "2026-01-05T10:00:00Z",
      link: "http://127.0.0.1:3000/projects/1/runs/9",
      accountLink: "http://127.0.0.1:3000/account",
    };
    const below = composeNotice("run-approved", { ...facts, belowRequiredReason: "Record of a failing case." });
    expect(below.subject).toBe("Signed off — below the required FS: Steady seepage — Test dam");
    expect(below.text).toContain("Reason for signing off below the required FS: Record of a failing case.");
    expect(composeNotice("run-approved", facts).subject).toBe("Signed off: Steady seepage — Test dam");
  });

  test("runsToCsv escapes text cells that start with =, +, - or @", () => {
    const base = {
      id: 1,
      sectionName: "S",
      sectionVersion: 1,
      loadingCondition: "steady-seepage",
      face: "downstream",
      methods: ["bishop"],
      requiredFs: 1.5,
      fsBishop: 1.6,
      fsFellenius: null,
      status: "approved" as const,
      authorName: "A",
      createdAt: "2026-01-01T00:00:00.000Z",
      reviewedByName: "R",
      reviewedAt: null,
      revisesRunId: null,
    };
    const csv = runsToCsv(
      ["=1+1", "+x", "-y", "@z"].map((title, i) => ({ ...base, id: i + 1, title })),
      "P",
    );
    // Read back with papaparse, which removes the quotes the writer puts around an escaped cell.
    const rows = Papa.parse<string[]>(csv.trimEnd(), { newline: "\r\n", delimiter: "," }).data;
    expect(rows.slice(3, 7).map((r) => r[1])).toEqual(["'=1+1", "'+x", "'-y", "'@z"]);
    expect(rows[3].slice(8, 12)).toEqual(["1.600", "", "yes", "signed off"]);
  });
});
