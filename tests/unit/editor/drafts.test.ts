import { describe, expect, it } from "vitest";
import { appendDraftPoint, closesDraft, draftProblem, dropLastDraftPoint, type Draft } from "@/lib/editor/drafts";

describe("drafts", () => {
  it("appendDraftPoint adds points and ignores a repeated click", () => {
    let d: Draft = { kind: "region", points: [] };
    for (const p of [
      [0, 0],
      [10, 0],
      [10, 0],
      [10, 5],
    ] as [number, number][]) {
      const r = appendDraftPoint(d, p);
      if (r.ok) d = r.draft;
    }
    expect(d.points).toEqual([
      [0, 0],
      [10, 0],
      [10, 5],
    ]);
    expect(closesDraft(d, [0, 0])).toBe(true);
    expect(appendDraftPoint(d, [0, 0])).toEqual({ ok: true, draft: d });
    expect(draftProblem(d)).toBeNull();
    expect(draftProblem(dropLastDraftPoint(d))).toMatch(/at least 3/);
  });

  it("appendDraftPoint keeps the phreatic line running left to right", () => {
    const d: Draft = { kind: "phreatic", points: [[5, 10]] };
    const r = appendDraftPoint(d, [4, 10]);
    expect(r.ok).toBe(false);
    expect(draftProblem(d)).toMatch(/at least 2/);
  });
});
