import { describe, expect, test } from "vitest";
import { assessPipingExits, generateEmbankment } from "@/lib/design";
import { assertInDelta, MATERIALS, params } from "./helpers";

describe("piping where water leaves the section, not at the drain entry", () => {
  test("the demo embankment's constructed line stays below the face: no unprotected exit, the drain entry left out", () => {
    const out = generateEmbankment(params(), MATERIALS);
    const piping = out.seepage.piping;
    expect(out.seepage.source).toBe("constructed");
    expect(piping?.verdict).toBe("no-unprotected-exit");
    if (!piping || piping.face.emerges) throw new Error("expected the line below the face");
    expect(piping.face.leastCover).toBeGreaterThan(0);
    // The least cover is measured to the face above the drain: the line there is lower than the face.
    const line = out.document.water!.phreatic!;
    const [x, yFace] = piping.face.at;
    const seg = line.findIndex((p) => p[0] >= x);
    const [a, b] = [line[seg - 1], line[seg]];
    const yLine = a[1] + ((b[1] - a[1]) * (x - a[0])) / (b[0] - a[0]);
    assertInDelta(yFace - yLine, piping.face.leastCover, 1e-9);
    expect(piping.findings.join(" ")).toMatch(/left out/);
    expect(piping.findings.join(" ")).not.toMatch(/i = 1/);
  });

  test("a line meeting a 2.5:1 face exits with i = sin β = 0.371 (Casagrande 1937, from memory; hand calculation)", () => {
    // Face from the crest edge (10, 20) down to the toe (35, 10); drain top at 11 m. A level line at
    // 15 m meets the face where 20 − (x − 10)/2.5 = 15, i.e. x = 22.5 m.
    const r = assessPipingExits({
      line: [
        [0, 15],
        [30, 15],
        [40, 10],
      ],
      downstreamFace: [
        [10, 20],
        [35, 10],
      ],
      drainTop: 11,
      gammaSat: 20,
      required: 3,
    });
    if (!r.face.emerges) throw new Error("expected an exit on the face");
    assertInDelta(r.face.exit.at[0], 22.5, 1e-9);
    assertInDelta(r.face.exit.at[1], 15, 1e-9);
    // sin(atan(1/2.5)) = 1/√7.25 = 0.37139; i_cr = (20 − 9.81)/9.81 = 1.03874; factor 2.797 < 3.
    assertInDelta(r.face.exit.gradient, 1 / Math.sqrt(7.25), 1e-12);
    assertInDelta(r.criticalGradient, 1.03874, 1e-5);
    assertInDelta(r.face.exit.factor, 2.797, 1e-3);
    expect(r.verdict).toBe("not-adequate");
  });

  test("a hand-drawn line is assessed the same way", () => {
    const base = params();
    const g = generateEmbankment(base, MATERIALS).geometry;
    const crest = g.downstreamCrest;
    const hand: [number, number][] = [
      [0, base.normalPool],
      [crest[0] + 1, base.normalPool],
      [g.xmax, base.foundationTop],
    ];
    const out = generateEmbankment(params({ handLines: { normal: hand, flood: null } }), MATERIALS);
    expect(out.seepage.source).toBe("hand-drawn");
    expect(out.seepage.piping?.face.emerges).toBe(true);
  });
});
