/**
 * The calculation report says what the engine analysed and where the review stands: a staged
 * drawdown's stages, every material including impenetrable ones, and a sign-off below the
 * required FS in words. Read back with an independent PDF reader (pdfjs-dist).
 */
import { describe, expect, test } from "vitest";
import { buildRunReport, type ReportInput } from "@/lib/report/build-report";
import { buildMaterialSources } from "@/lib/review/material-sources";
import { ENGINE_VERSION, type SectionDocument } from "@/lib/stability";
import { smallStagedRun } from "../runs/staged-fixture";
import { pdfText } from "../../support/pdf-text";

function input(doc: SectionDocument, review: Partial<ReportInput["review"]>, status: ReportInput["run"]["status"]) {
  const { result, slices } = smallStagedRun();
  const stored = structuredClone(result);
  // As kept by the server: the per-circle stages are not stored, the report finds them again.
  for (const m of stored.methods) delete stored.results[m]!.stages;
  const value: ReportInput = {
    projectName: "Invented reservoir",
    run: {
      id: 12,
      title: "Upstream, staged drawdown",
      status,
      sectionName: "Trial section",
      sectionVersion: 1,
      loadingCondition: "rapid-drawdown",
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
      result: stored,
      sliceTables: {
        bishop: { slices: slices.bishop, minMAlpha: null },
        fellenius: { slices: slices.fellenius, minMAlpha: null },
      },
    },
    review: {
      submittedByName: "Engineer",
      submittedAt: "2026-01-02T00:00:00.000Z",
      reviewedByName: "Reviewer",
      reviewedAt: "2026-01-03T00:00:00.000Z",
      reviewNote: null,
      ...review,
    },
    checklist: [],
    comments: [],
    materials: buildMaterialSources([...doc.materials, { id: "rock", name: "Bedrock", model: "impenetrable" }], [], []),
    sourcesFrozen: true,
    generatedAt: "2026-01-04T00:00:00.000Z",
    generatedBy: "Reviewer",
  };
  return value;
}

// Embedding and subsetting the report's font takes a second or two on a busy machine.
describe("the calculation report of a staged drawdown signed off below the required FS", { timeout: 20_000 }, () => {
  test("states each stage's FS, lists the impenetrable layer, and says signed off — below the required FS", async () => {
    const { doc, result } = smallStagedRun();
    const reason = "Accepted as the record of a failing case; redesign follows.";
    const bytes = await buildRunReport(input(doc, { belowRequiredReason: reason }, "approved"));
    if (process.env.SCARPLINE_KEEP_PDF) (await import("node:fs")).writeFileSync(process.env.SCARPLINE_KEEP_PDF, bytes);
    const text = await pdfText(bytes);
    expect(text).toContain("SIGNED OFF — BELOW THE REQUIRED FS, by Reviewer");
    expect(text).toContain(`Reason: ${reason}`);
    expect(text).not.toMatch(/Review status: SIGNED OFF by/);
    expect(text).toContain("Staged rapid drawdown: three stages after Duncan, Wright & Wong (1990)");
    const b = result.results.bishop!.stages!;
    expect(text).toContain(`Stage 1: before drawdown, effective stress (consolidation) ${b.fs1!.toFixed(3)}`);
    expect(text).toContain("— (no slice drained)");
    // Bedrock has no number at all, yet bounds every slip surface.
    expect(text).toContain("Bedrock (rock) Impenetrable");
    expect(text).toContain("no slip surface may enter it");
    // The staged slice table heads its strengths as the final stage's, not c' and phi'.
    expect(text).toContain("Governing strength");
    expect(text).toContain("c, final stage (kPa)");
  });

  test("a plain sign-off keeps the plain words", async () => {
    const { doc } = smallStagedRun();
    const text = await pdfText(await buildRunReport(input(doc, { belowRequiredReason: null }, "approved")));
    expect(text).toMatch(/Review status: SIGNED OFF by Reviewer/);
    expect(text).not.toContain("BELOW THE REQUIRED FS");
  });
});
