/**
 * The calculation report carries a run's kept probabilistic result (lib/report/probabilistic-section.ts),
 * read back with an independent PDF reader (pdfjs-dist). The figures printed are the engine's for
 * a small staged drawdown; the verdict's wording follows the β table of USACE ETL 1110-2-547 /
 * 1110-2-556 (levels from memory, see lib/probabilistic/targets.ts).
 */
import { describe, expect, test } from "vitest";
import { buildRunReport, type ReportInput } from "@/lib/report/build-report";
import { buildMaterialSources } from "@/lib/review/material-sources";
import { ENGINE_VERSION, runProbabilistic } from "@/lib/stability";
import { toOutcome } from "@/lib/probabilistic/outcome";
import { DEFAULT_TARGET_BETA, TARGET_BASIS } from "@/lib/probabilistic/targets";
import { smallStagedRun } from "../runs/staged-fixture";
import { pdfText } from "../../support/pdf-text";

function probabilisticOutcome() {
  const { doc } = smallStagedRun();
  const m = doc.materials.findIndex((x) => "phi" in x && typeof x.phi === "number");
  const varied = structuredClone(doc) as unknown as {
    materials: Record<string, unknown>[];
    analysis: Record<string, unknown>;
  };
  varied.materials[m].vary = { phi: { dist: "normal", sd: 2 } };
  varied.analysis.probabilistic = { samples: 300, seed: 3, sampling: "latin-hypercube", mode: "critical-surface" };
  const r = runProbabilistic(varied);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return toOutcome(r, 1234);
}

describe("the report of a run with a probabilistic result", { timeout: 30_000 }, () => {
  test("prints pf and β per method with the Taylor-series estimate and the verdict against the target", async () => {
    const { doc, result, slices } = smallStagedRun();
    const outcome = probabilisticOutcome();
    const input: ReportInput = {
      projectName: "Invented reservoir",
      run: {
        id: 5,
        title: "Upstream, staged drawdown",
        status: "draft",
        sectionName: "Trial section",
        sectionVersion: 1,
        loadingCondition: "drawdown-storage",
        waterCondition: null,
        face: "upstream",
        requiredFs: 1.3,
        fsBishop: result.results.bishop!.fs,
        fsFellenius: result.results.fellenius!.fs,
        authorName: "Engineer",
        createdAt: "2026-01-01T00:00:00.000Z",
        engineVersion: ENGINE_VERSION,
        revisesRunId: null,
        document: doc,
        result,
        sliceTables: {
          bishop: { slices: slices.bishop, minMAlpha: null },
          fellenius: { slices: slices.fellenius, minMAlpha: null },
        },
      },
      review: { submittedByName: null, submittedAt: null, reviewedByName: null, reviewedAt: null, reviewNote: null },
      checklist: [],
      comments: [],
      materials: buildMaterialSources(doc.materials, [], []),
      sourcesFrozen: false,
      generatedAt: "2026-01-04T00:00:00.000Z",
      generatedBy: "Engineer",
      probabilistic: {
        stored: {
          id: 1,
          runId: 5,
          jobId: 9,
          settings: {},
          outcome,
          createdByName: "Engineer",
          createdAt: "2026-01-03T00:00:00.000Z",
        },
        target: {
          beta: DEFAULT_TARGET_BETA,
          defaultBeta: DEFAULT_TARGET_BETA,
          basis: TARGET_BASIS,
          reason: null,
          updatedByName: null,
        },
      },
    };
    const text = await pdfText(await buildRunReport(input));
    expect(text).toContain("Probabilistic analysis");
    expect(text).toContain("300 samples, Latin hypercube sampling, seed 3");
    const b = outcome.probabilistic.bishop!;
    expect(text).toContain(`Bishop, sampled ${b.meanFs!.toFixed(3)} ${b.sdFs!.toFixed(3)}`);
    expect(text).toContain(b.betaLognormal!.toFixed(2));
    expect(text).toContain(`Bishop, Taylor series ${b.fosm.fs!.toFixed(3)}`);
    expect(text).toContain("the project's target of 3.00");
    expect(text).toContain("expected performance");
  });
});
