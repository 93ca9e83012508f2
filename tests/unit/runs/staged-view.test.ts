/**
 * A staged rapid drawdown (docs/engine.md §7(b), Duncan, Wright & Wong 1990) shown as staged:
 * what the panel, the CSV and the API say must be what the engine computed for the same circle.
 */
import Papa from "papaparse";
import { describe, expect, test } from "vitest";
import { columnHeader, governingText, isStagedSlices, numberSlices, sliceColumns } from "@/lib/runs/view/slice-columns";
import { sliceTableToCsv, runFs } from "@/lib/runs/view/slice-csv";
import { stageCells, stagedFromResult, stagedView, stageLine } from "@/lib/runs/view/staged-view";
import { ENGINE_VERSION, type GridSearchSuccess } from "@/lib/stability";
import { smallStagedRun } from "./staged-fixture";

/** The result as the server keeps it today: the per-circle stages are not among its stored keys. */
function withoutStages(result: GridSearchSuccess): GridSearchSuccess {
  const copy = structuredClone(result);
  for (const m of copy.methods) if (copy.results[m]) delete copy.results[m]!.stages;
  delete copy.stagedVariant;
  return copy;
}

describe("stage factors of safety", () => {
  test("a fresh search carries each method's stages; the final stage is the FS of the run", () => {
    const { result } = smallStagedRun();
    const view = stagedFromResult(result);
    expect(view?.variant).toBe("three-stage");
    for (const m of ["bishop", "fellenius"] as const) {
      expect(view!.stages[m]).toEqual(result.results[m]!.stages);
      expect(view!.stages[m]!.final).toBe(result.results[m]!.fs);
    }
  });

  test("a kept run without stored stages gets exactly the same stages from its frozen document", () => {
    const { doc, result } = smallStagedRun();
    const view = stagedView(withoutStages(result), doc, ENGINE_VERSION);
    expect(view!.stages.bishop).toEqual(result.results.bishop!.stages);
    expect(view!.stages.fellenius).toEqual(result.results.fellenius!.stages);
    // A result from another engine version is not recomputed by this one.
    expect(stagedView(withoutStages(result), doc, "0.0.0-other")!.stages.bishop).toBeNull();
  });

  test("each stage is named, and a missing stage 3 says why instead of showing a number", () => {
    const cells = stageCells({ fs1: 2.17, fs2: 1.064, fs3: null, final: 1.064, switchedSlices: 0 }, "three-stage");
    expect(cells.map((c) => c.stage)).toEqual(["1", "2", "3", "final"]);
    expect(cells[2].missing).toBe("no slice drained");
    const two = stageCells({ fs1: 2.17, fs2: 1.064, fs3: null, final: 1.064, switchedSlices: 0 }, "usace-two-stage");
    expect(two[2].missing).toBe("not used: two stages");
  });
});

describe("slices of a staged drawdown", () => {
  test("final-stage strengths are not headed c′ and φ′; the governing strength and stage-1 stresses are shown", () => {
    const { slices } = smallStagedRun();
    expect(isStagedSlices(slices.bishop)).toBe(true);
    const headers = sliceColumns("bishop", true).map(columnHeader);
    expect(headers).not.toContain("c′ (kPa)");
    expect(headers).not.toContain("φ′ (°)");
    for (const h of ["c, final stage (kPa)", "φ, final stage (°)", "Governing strength", "σ′fc, stage 1 (kPa)"])
      expect(headers).toContain(h);
    // Each slice's governing text follows the engine's own record of it.
    for (const row of slices.bishop) {
      const st = row.stage!;
      const text = governingText(row);
      if (st.drainage === "free-draining") expect(text).toBe("free-draining");
      else if (st.governing === "undrained") {
        expect(text).toBe("undrained (stage 2)");
        // Total stress on an undrained base: c = τff of stage 2, φ = 0.
        expect(row.phi).toBe(0);
        expect(row.c).toBeCloseTo(st.tau2!, 9);
      } else expect(text).toBe("drained (stage 3)");
    }
    // An undrained base shows no pore pressure in the final stage.
    const und = numberSlices(slices.bishop).find(
      (s) => s.row.stage?.governing === "undrained" && s.row.stage.drainage !== "free-draining",
    );
    const uCol = sliceColumns("bishop", true).find((c) => c.key === "porePressure")!;
    expect(uCol.value(und!, "bishop")).toBeNull();
  });

  test("the slice CSV header states each stage's FS for both methods", () => {
    const { doc, result, slices } = smallStagedRun();
    const staged = stagedView(result, doc, ENGINE_VERSION);
    const csv = sliceTableToCsv(slices.bishop, {
      method: "bishop",
      fs: runFs(result.methods, { fsBishop: result.results.bishop!.fs, fsFellenius: result.results.fellenius!.fs }),
      staged,
    });
    const comments = Papa.parse<string[]>(csv.trimEnd(), { newline: "\r\n" }).data.filter((r) => r[0].startsWith("#"));
    const lines = comments.map((r) => r[0]);
    expect(lines).toContain(
      "# Staged rapid drawdown, three stages after Duncan, Wright & Wong (1990); the FS above is the final stage's",
    );
    expect(lines).toContain(`# Stages, Bishop: ${stageLine(result.results.bishop!.stages, "three-stage")}`);
    expect(lines).toContain(`# Stages, ordinary: ${stageLine(result.results.fellenius!.stages, "three-stage")}`);
    const b = result.results.bishop!.stages!;
    expect(stageLine(b, "three-stage")).toBe(
      `stage 1 ${b.fs1!.toFixed(3)}; stage 2 ${b.fs2!.toFixed(3)}; stage 3 — (no slice drained); final ${b.final!.toFixed(3)}`,
    );
  });
});
