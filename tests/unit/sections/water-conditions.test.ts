import { describe, expect, it } from "vitest";
import { buildDemoSection, DEMO_POOL } from "@/db/seeds/demo-section";
import { documentForRun, UnknownWaterConditionError, waterConditionForRun } from "@/lib/analysis/run-setup";
import { directionForFace } from "@/lib/analysis/face";
import { LOADING_CONDITIONS } from "@/lib/analysis/required-fs";
import { checkWaterConditions } from "@/lib/sections/check-water-conditions";
import { requireValidSection } from "@/lib/sections/check-document";
import { storedSectionSchema } from "@/lib/sections/water-conditions";
import {
  pickWaterCondition,
  poolLevels,
  SINGLE_WATER_ID,
  USUAL_KIND,
  waterConditionsOf,
  waterMismatch,
  type StoredSection,
} from "@/lib/sections/water-conditions";
import {
  addWaterCondition,
  drawnConditionId,
  keepDrawnWater,
  showWaterCondition,
  storeDrawnWater,
} from "@/lib/sections/water-condition-edits";
import { summarizeChange } from "@/lib/sections/diff";
import { runGridSearch, type SectionDocument } from "@/lib/stability";
import { quickSetup } from "../../support/runs";

const demo = buildDemoSection();

describe("water conditions of a section", () => {
  it("reads a section saved with one water block as a single condition, so older sections keep working", () => {
    const old: SectionDocument = { ...demo };
    delete (old as StoredSection).waterConditions;
    const all = waterConditionsOf(old);
    expect(all).toHaveLength(1);
    expect(all[0].id).toBe(SINGLE_WATER_ID);
    expect(all[0].water).toEqual(old.water);
    for (const c of LOADING_CONDITIONS) expect(pickWaterCondition(old, c.key).id).toBe(SINGLE_WATER_ID);
  });

  // The water each loading condition calls for is common practice (USACE EM 1110-2-1902 (2003), ch. 3, from
  // memory): end of construction without a reservoir, steady seepage from the pool named, drawdown from a pool.
  it("picks the usual water of each loading condition in the demo dam", () => {
    for (const c of LOADING_CONDITIONS) {
      const picked = pickWaterCondition(demo, c.key);
      expect(picked.usualFor).toContain(c.key);
      expect(picked.kind).toBe(USUAL_KIND[c.key]);
      expect(waterMismatch(demo, c.key, picked)).toBeNull();
    }
    expect(poolLevels(demo, pickWaterCondition(demo, "end-of-construction").water)).toEqual({
      left: null,
      right: null,
    });
    expect(poolLevels(demo, pickWaterCondition(demo, "steady-seepage").water).left).toBeCloseTo(DEMO_POOL.normal, 6);
    expect(poolLevels(demo, pickWaterCondition(demo, "surcharge-pool").water).left).toBeCloseTo(DEMO_POOL.flood, 6);
    expect(pickWaterCondition(demo, "drawdown-surcharge").drawdownTo).toBe(DEMO_POOL.drawdownTo);
  });

  it("without a choice a run takes the usual water; a named one is used; an unknown key is refused", () => {
    const setup = quickSetup(demo, "upstream", { condition: "end-of-construction" });
    expect(waterConditionForRun(demo, setup).id).toBe("end-of-construction");
    expect(waterConditionForRun(demo, { ...setup, waterCondition: "storage-pool" }).id).toBe("storage-pool");
    expect(() => documentForRun(demo, { ...setup, waterCondition: "no-such-water" })).toThrow(
      UnknownWaterConditionError,
    );
  });

  it("gives the engine the chosen condition's water as its one block; upstream stays on the reservoir side", () => {
    const setup = quickSetup(demo, "upstream", { condition: "end-of-construction" });
    const doc = documentForRun(demo, setup);
    expect("waterConditions" in doc).toBe(false);
    expect(doc.water).toEqual(pickWaterCondition(demo, "end-of-construction").water);
    expect(poolLevels(doc, doc.water)).toEqual({ left: null, right: null });
    // The reservoir of the demo is on the left: its upstream soil slides left even with a dry-pool water drawn.
    const dryDrawn = showWaterCondition(demo, "end-of-construction");
    expect(directionForFace(dryDrawn, "upstream")).toBe("left");
    expect(doc.analysis?.direction).toBe("left");
  });

  // A reservoir standing on the upstream face is a stabilising load (common practice: the water's weight acts
  // on the face and resists sliding toward the pool), so an end-of-construction check that wrongly kept the
  // pool reads safer than the same check without it.
  it("an end-of-construction run of the upstream face has no reservoir and a lower FS than with the pool", () => {
    const setup = quickSetup(demo, "upstream", { condition: "end-of-construction", methods: ["bishop"] });
    const without = runGridSearch(documentForRun(demo, setup));
    const withPool = runGridSearch(documentForRun(demo, { ...setup, waterCondition: "storage-pool" }));
    if (!without.ok || !withPool.ok) throw new Error("search failed");
    expect(without.results.bishop!.fs).toBeLessThan(withPool.results.bishop!.fs);
  });
});

describe("checking water conditions before a save", () => {
  const withConditions = (edit: (all: NonNullable<StoredSection["waterConditions"]>) => void): StoredSection => {
    const copy = structuredClone(demo);
    edit(copy.waterConditions!);
    return copy;
  };

  it("accepts the demo's set and keeps it when the section is stored", () => {
    expect(checkWaterConditions(demo).errors).toEqual([]);
    const stored = requireValidSection(demo).document;
    expect(stored.waterConditions?.map((c) => c.id)).toEqual(demo.waterConditions!.map((c) => c.id));
  });

  it("names each problem and where it is", () => {
    const bad = withConditions((all) => {
      all[2].water = all[0].water; // construction water with the reservoir
      all[1].usualFor = ["steady-seepage"]; // second usual water for one loading condition
      delete all[3].drawdownTo;
      all[4].drawdownTo = 30;
    });
    const errors = checkWaterConditions(bad).errors;
    const at = (path: string) => errors.find((e) => e.path === path)?.message ?? "";
    expect(at("waterConditions[2].water.phreatic")).toMatch(/no reservoir.*left edge/);
    expect(at("waterConditions[1].usualFor")).toMatch(/already takes/);
    expect(at("waterConditions[3].drawdownTo")).toMatch(/pool level after drawdown/);
    expect(at("waterConditions[4].drawdownTo")).toMatch(/30\.00 m.*above the pool before it \(17\.00 m\)/);
    expect(() => requireValidSection(bad)).toThrow(/4 problems; nothing was saved/);
  });

  it("checks each condition's water by the engine's rules and reports it at the condition", () => {
    const bad = withConditions((all) => {
      all[1].water = { phreatic: [[0, 10]] };
    });
    const errors = checkWaterConditions(bad).errors;
    expect(errors.some((e) => e.path.startsWith("waterConditions[1].water"))).toBe(true);
  });
});

describe("editing conditions in the editor", () => {
  it("writes a drawn change into the condition being edited only", () => {
    const shown = showWaterCondition(demo, "end-of-construction");
    expect(drawnConditionId(shown)).toBe("end-of-construction");
    const edited = keepDrawnWater({ ...shown, water: { ru: 0.2 } }, "end-of-construction");
    const all = waterConditionsOf(edited);
    expect(all.find((c) => c.id === "end-of-construction")!.water).toEqual({ ru: 0.2 });
    expect(all.find((c) => c.id === "storage-pool")!.water).toEqual(demo.waterConditions![0].water);
  });

  it("looking at another condition is not an edit; editing it leaves the section's own water alone", () => {
    const view = showWaterCondition(demo, "end-of-construction");
    const edited = storeDrawnWater(demo, { ...view, water: { ru: 0.1 } }, "end-of-construction");
    expect(edited.water).toEqual(demo.water);
    expect(waterConditionsOf(edited).find((c) => c.id === "end-of-construction")!.water).toEqual({ ru: 0.1 });
  });

  it("turns a one-water section into a list when a condition is added", () => {
    const old: SectionDocument = { ...demo };
    delete (old as StoredSection).waterConditions;
    const { doc, id } = addWaterCondition(old, "End of construction");
    expect(id).toBe("end-of-construction");
    expect(waterConditionsOf(doc).map((c) => c.id)).toEqual([SINGLE_WATER_ID, "end-of-construction"]);
  });
});

describe("the summary of a saved version", () => {
  it("names the water condition that changed", () => {
    const next = structuredClone(demo);
    next.waterConditions![3].drawdownTo = 9;
    next.waterConditions![1].name = "Surcharge pool";
    expect(summarizeChange(demo, next)).toBe(
      "water condition “Steady seepage, flood pool 17.0 m” renamed “Surcharge pool”; " +
        "water condition “Rapid drawdown, 16.0 m to 8.0 m”: level after drawdown changed",
    );
  });
});

describe("storedSectionSchema: a section frozen into a queue job keeps its named waters", () => {
  it("parses the demo section with every water condition, so a queued run finds the one its set-up names", () => {
    const demo = buildDemoSection();
    const frozen = storedSectionSchema.parse(JSON.parse(JSON.stringify(demo)));
    expect(frozen.waterConditions?.map((c) => c.id)).toEqual(demo.waterConditions?.map((c) => c.id));
    expect(frozen.waterConditions?.length).toBeGreaterThan(1);
  });
});
