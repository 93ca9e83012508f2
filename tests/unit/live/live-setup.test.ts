/**
 * Live mode's FS is the FS a full run of the same state would keep, to the last bit: the live
 * document goes through the same set-up parsing, water choice and documentForRun as the run route
 * after the state is saved (JSON in, JSON out), and the same searchRecord.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import path from "node:path";
import { validateSection, type SectionDocument } from "@/lib/stability";
import { documentForRun, runSetupSchema, type RunSetup } from "@/lib/analysis/run-setup";
import { moveSharedVertex } from "@/lib/editor/document-edits";
import { automaticSetup, keptSection, liveDocument, liveSetupFor } from "@/lib/live/live-setup";
import { liveOutcome } from "@/lib/live/live-ghosts";
import { searchRecord } from "@/lib/runs/record/search-record";
import { drawnConditionId, showWaterCondition } from "@/lib/sections/water-condition-edits";

const stored = JSON.parse(
  readFileSync(path.resolve(__dirname, "../../fixtures/sections/three-material-embankment.json"), "utf8"),
) as SectionDocument;
delete stored.analysis;

// A coarse search keeps the test quick; the equality does not depend on the grid.
const setup: RunSetup = {
  ...automaticSetup(stored),
  grid: { x1: 55, y1: 25, x2: 85, y2: 45, nx: 8, ny: 6 },
  radii: { tangentY1: 10, tangentY2: 1, n: 5 },
};
const active = drawnConditionId(stored);
const shown = showWaterCondition(stored, active);
const TOE = { kind: "region", region: 3, index: 1 } as const;

function liveFs(preview: SectionDocument) {
  const record = searchRecord(liveDocument(keptSection(stored, preview, active), setup, active));
  if (!record.ok) throw new Error("live search failed");
  return liveOutcome(record.result);
}

/** What the server keeps: the saved version and the run form's set-up, both through JSON, then the run route's path. */
function fullRunFs(preview: SectionDocument) {
  const version = JSON.parse(JSON.stringify(keptSection(stored, preview, active))) as SectionDocument;
  const runSetup = runSetupSchema.parse(JSON.parse(JSON.stringify({ ...setup, waterCondition: active })));
  // lib/runs/record/run-record.ts searches the validated document.
  const valid = validateSection(documentForRun(version, runSetup));
  if (!valid.ok) throw new Error("kept state is invalid");
  const record = searchRecord(valid.section);
  if (!record.ok) throw new Error("full run failed");
  return record.result.results;
}

describe("live search against a full run of the same state", () => {
  it("gives bit-identical FS for each method on the drawing as stored and with the toe dragged", () => {
    for (const toeX of [80, 84, 76.5]) {
      const preview = moveSharedVertex(shown, TOE, [toeX, 10]);
      const live = liveFs(preview);
      const full = fullRunFs(preview);
      expect(live.ghosts.map((g) => g.method)).toEqual(["bishop", "fellenius"]);
      for (const g of live.ghosts) {
        expect(Object.is(g.fs, full[g.method]!.fs)).toBe(true);
        expect(g.circle).toEqual(full[g.method]!.circle);
      }
    }
  });

  it("raises FS when the downstream toe is dragged outward (a flatter face; common practice)", () => {
    const steep = liveFs(moveSharedVertex(shown, TOE, [76, 10])).ghosts[0].fs;
    const flat = liveFs(moveSharedVertex(shown, TOE, [86, 10])).ghosts[0].fs;
    expect(flat).toBeGreaterThan(steep);
  });

  it("searches the last run's set-up when there is one, else the automatic grid of the downstream face", () => {
    expect(liveSetupFor(stored, setup)).toEqual({ setup, source: "last-run" });
    const auto = liveSetupFor(stored, null);
    expect(auto.source).toBe("automatic");
    // The automatic grid sits above the downstream (right-hand) face: toe at x = 80, crest edge at x = 56.
    expect(auto.setup.face).toBe("downstream");
    expect(auto.setup.grid.x1).toBeGreaterThanOrEqual(50);
    expect(auto.setup.grid.y1).toBeGreaterThan(22);
  });

  it("says what is wrong instead of a number when the drawing cannot be analysed", () => {
    const broken = moveSharedVertex(shown, TOE, [30, 40]);
    const record = searchRecord(liveDocument(keptSection(stored, broken, active), setup, active));
    expect(record.ok).toBe(false);
    if (record.ok) return;
    const outcome = liveOutcome(record);
    expect(outcome.ghosts).toEqual([]);
    expect(outcome.problem).toContain(record.errors[0].message);
  });
});
