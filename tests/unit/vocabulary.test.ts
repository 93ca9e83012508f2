import { describe, expect, test } from "vitest";
import { loadCaseSchema, methodSchema } from "@/lib/stability";
import { LOADING_CONDITIONS } from "@/lib/analysis/required-fs";
import { MATERIAL_MODELS } from "@/lib/materials/parameters";
import { RUN_STATUSES } from "@/lib/review/status";
import { NUMBER_FIELDS } from "@/lib/design/form-values";
import { SWEEP_CASES } from "@/lib/design/sweep-plan";
import {
  analysisSettingWords,
  conditionWords,
  faceWords,
  loadCaseWords,
  methodName,
  modelWords,
  POOL_WORDS,
  STATUS_LABELS,
} from "@/lib/vocabulary";

// Issue 18, item 5: one mapping from engine codes to the user's words. Every code the engine or the
// database can hold has words of its own, and no code comes back out as it went in.
describe("codes in words", () => {
  test("every method, load case, material model and review status has words that are not its code", () => {
    for (const m of methodSchema.options) expect(methodName(m)).not.toBe(m);
    for (const c of loadCaseSchema.options) expect(loadCaseWords(c)).not.toBe(c);
    for (const m of MATERIAL_MODELS) expect(modelWords(m)).not.toMatch(/mohr-coulomb|^undrained$|^impenetrable$/);
    for (const s of RUN_STATUSES) expect(STATUS_LABELS[s]).not.toBe(s);
    expect(STATUS_LABELS.submitted).toBe("Awaiting review");
    expect(methodName("fellenius")).toBe("Ordinary method of slices");
  });

  test("the analysis names the pools as the designer's form does", () => {
    const poolLabels = [NUMBER_FIELDS.normalPool.label, NUMBER_FIELDS.floodPool.label].map((l) => l.toLowerCase());
    expect(poolLabels).toEqual([POOL_WORDS.normal, POOL_WORDS.flood]);
    const analysis = LOADING_CONDITIONS.map((c) => c.label).join(" ");
    expect(analysis).not.toMatch(/storage|surcharge/i);
    for (const c of SWEEP_CASES) expect(c.label).toContain(POOL_WORDS[c.pool]);
    expect(conditionWords("drawdown-surcharge")).toBe("Rapid drawdown from the flood pool");
  });

  test("faces and analysis settings read as words, never as JSON", () => {
    expect(faceWords("downstream")).toBe("Downstream face");
    expect(faceWords("upstream", true)).toBe("upstream face");
    const grid = analysisSettingWords("grid", { x1: 10, y1: 20, x2: 40, y2: 35, nx: 6, ny: 5 });
    expect(grid).toBe("6 × 5 centres, x 10–40 m, elevation 20–35 m");
    expect(analysisSettingWords("methods", ["bishop", "fellenius"])).toBe(
      "Bishop's simplified method and Ordinary method of slices",
    );
    expect(analysisSettingWords("drawdown", { from: 16, to: 8, method: "staged" })).toBe(
      "from 16 m to 8 m, staged total-stress method",
    );
    expect(analysisSettingWords("radii", { tangentY1: 4, tangentY2: 0, n: 5 })).not.toMatch(/[{}"]/);
  });
});
