/**
 * Regression pins: the engine's main results as computed by ENGINE_VERSION 1.1.0, held at a
 * relative 1e-4 so that any change to a factor of safety is seen and explained (and the version
 * bumped). These are not evidence of correctness: that is the job of the literature checks
 * beside them (reference-charts.test.ts, closed-forms.test.ts, hand-calculation.test.ts,
 * engine-rules.test.ts, reference-agreement.test.ts; sources in docs/references.md).
 */
import { describe, test } from "vitest";
import { circle, expectRelative, loadFixture, search } from "./helpers";

const PIN = 1e-4;

describe("grid-search minima are pinned", () => {
  test.each([
    ["acads-1a.json", 0.9856043, 0.9436464],
    ["griffiths-lane-ex1.json", 1.379706, 1.313718],
    ["griffiths-lane-ex2.json", 1.471666, 1.471666],
    ["three-material-embankment.json", 1.454402, 1.26076],
    ["drawdown-staged-embankment.json", 1.061194, 0.7301555],
    ["long-slope-dry.json", 1.154779, 1.15474],
    ["taylor-phi0-beta90-deep.json", 1.000204, 1.000204],
    ["taylor-phi0-beta53-deep.json", 1.002117, 1.002117],
    ["taylor-phi20-beta45-deep.json", 1.014407, 0.9621278],
    ["trench-two-pieces.json", 0.4320041, 0.4022169],
    ["weak-layer-outline.json", 1.415871, 1.252395],
  ])("%s: Bishop %s, ordinary %s", (file, bishop, ordinary) => {
    const r = search(loadFixture(file));
    expectRelative(r.results.bishop?.fs, bishop, PIN);
    expectRelative(r.results.fellenius?.fs, ordinary, PIN);
  });
});

describe("single circles are pinned", () => {
  test.each([
    ["acads-1a.json", 30, 55, 30, 0.9925561, 0.9570059],
    ["acads-1a.json", 31.946, 47.97, 23.052, 0.9959516, 0.9423816],
    ["trench-two-pieces.json", 50, 20, 18, 0.6284805, 0.618131],
    ["cut-steep-arc-end.json", 22, 10.02, 8, 1.968433, 1.901304],
    ["drawdown-line-above-face.json", 30, 22, 20, 1.2312, 1.125355],
    ["three-material-embankment.json", 70, 35, 25, 1.78542, 1.640701],
  ])("%s circle (%s, %s, %s): Bishop %s, ordinary %s", (file, xc, yc, r, bishop, ordinary) => {
    const res = circle(loadFixture(file), xc, yc, r);
    expectRelative(res.fs.bishop, bishop, PIN);
    expectRelative(res.fs.fellenius, ordinary, PIN);
  });
});
