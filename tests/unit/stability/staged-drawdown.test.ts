/**
 * Staged rapid drawdown through the engine (docs/engine.md §7(b)): Duncan, Wright & Wong (1990) and
 * Duncan, Wright & Brandon (2014, ch. 9) three stages, USACE (1970) two stages (EM 1110-2-1902,
 * 2003, App. G). Checks: the docs/references.md derived infinite-slope example on a long slope,
 * properties that follow from the method's equations, the report, validation and the CLI.
 * Field cases (Walter Bouldin, Pilarcitos) are known from memory only and are not asserted.
 */
import { spawnSync } from "node:child_process";
import path from "node:path";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { analyzeCircle, validateSection, type SectionDocument } from "@/lib/stability";
import { circle, clone, expectRelative, FIXTURES, loadFixture, search } from "./helpers";

// The fields the command-line checks below read; a missing one fails the test.
interface StagedCliOutput {
  results: { bishop: { fs: number; stages: { final: number } } };
  stages: { bishop: { final: number } };
  slices: { stage: { governing: string } }[];
}

const RAD = Math.PI / 180;
const staged = loadFixture("drawdown-staged-embankment.json");

function withDrawdown(doc: SectionDocument, patch: Record<string, unknown>): SectionDocument {
  const d = clone(doc);
  d.analysis = { ...d.analysis, drawdown: { ...d.analysis!.drawdown!, ...patch } };
  return d;
}

/** R envelopes far above the effective ones: the Kc = Kf (effective) envelope then governs stage 2. */
function highR(doc: SectionDocument): SectionDocument {
  const d = clone(doc);
  for (const m of d.materials)
    if (m.model === "mohr-coulomb" && m.cR !== undefined) {
      m.cR = 5000;
      m.phiR = 59;
    }
  return d;
}

/** Random circles over the fixture's upstream face, most of them valid. */
const upstreamCircle = fc.record({
  xc: fc.double({ min: 18, max: 42, noNaN: true }),
  yc: fc.double({ min: 26, max: 45, noNaN: true }),
  tangent: fc.double({ min: 1, max: 9, noNaN: true }),
});

// docs/references.md derived example: 3H:1V slope under 100 ft of water, γ = 125 pcf, c' = 0, φ' = 40°,
// Kc = 1 envelope d = 2000 psf, ψ = 20°, drawn down below the toe; in SI (γw = 62.4 pcf = 9.802 kN/m³).
const PCF = 0.157087463;
const gamma = 125 * PCF;
const gw = 62.4 * PCF;
const kPsi = Math.tan(20 * RAD) / Math.cos(40 * RAD);
const sinR = kPsi / (1 + kPsi); // φR, cR that give ψ = 20°, d = 2000 psf (docs/engine.md §7(b) inverted)
const cRExample = (2000 * 0.04788026 * (1 - sinR)) / (Math.sqrt(1 - sinR * sinR) * Math.cos(40 * RAD));
const longSlope: SectionDocument = {
  version: 1,
  materials: [
    {
      id: "fill",
      model: "mohr-coulomb",
      gamma,
      gammaSat: gamma,
      c: 0,
      phi: 40,
      cR: cRExample,
      phiR: Math.asin(sinR) / RAD,
    },
  ],
  regions: [
    {
      material: "fill",
      points: [
        [0, 0],
        [30, 0],
        [210, 60],
        [260, 60],
        [260, -20],
        [0, -20],
      ],
    },
  ],
  water: {
    gammaW: gw,
    phreatic: [
      [0, 90.48],
      [260, 90.48],
    ],
  },
  analysis: {
    case: "drawdown",
    drawdown: { from: 90.48, to: -5, method: "staged" },
    direction: "left",
    methods: ["bishop"],
    grid: { x1: 80, y1: 70, x2: 170, y2: 130, nx: 10, ny: 7 },
    radii: { r1: 30, r2: 150, n: 25 },
    refine: true,
  },
};

describe("runGridSearch(long 3H:1V slope): docs/references.md derived example (Duncan, Wright & Wong 1990; Duncan, Wright & Brandon 2014 ch. 9)", () => {
  const doc = longSlope;
  const beta = Math.atan(1 / 3);

  test("shallow circles approach FS1 = 2.517, FS2 = 1.261 (Kc = Kf governs) and the stage-3 closed form from above", () => {
    const stages = search(doc).results.bishop!.stages!;
    // Stage 1: submerged, c' = 0: tan φ'/tan β (docs/references.md 2.517).
    expect(stages.fs1! / 2.517 - 1).toBeGreaterThan(-0.005);
    expect(stages.fs1! / 2.517 - 1).toBeLessThan(0.015);
    // Stage 2: (γ'/γ)·tan φ'/tan β (docs/references.md 1.261).
    expect(stages.fs2! / 1.261 - 1).toBeGreaterThan(-0.005);
    expect(stages.fs2! / 1.261 - 1).toBeLessThan(0.015);
    // Stage 3 (derived): after drawdown the engine holds the water at the ground with vertical
    // hydrostatic u = γw·z (docs/engine.md §7(a)), below the σ'fc of stage 1, so every base switches to
    // drained: FS = (γ·cos²β − γw)·tan φ'/(γ·sin β·cos β), the "vertical hydrostatic" form of
    // docs/engine.md §10.1.
    const fs3 = ((gamma * Math.cos(beta) ** 2 - gw) * Math.tan(40 * RAD)) / (gamma * Math.sin(beta) * Math.cos(beta));
    expect(stages.final).toBe(stages.fs3);
    expect(stages.final! / fs3 - 1).toBeGreaterThan(-0.005);
    expect(stages.final! / fs3 - 1).toBeLessThan(0.015);
  });
});

describe("staged drawdown properties (derived from the equations of docs/engine.md §7(b))", () => {
  test("a drawdown to the pool level with R envelopes above the effective ones gives the steady-seepage FS", () => {
    // With no drawdown and τ2 = τKf on every base, stage 2 reproduces stage 1 slice by slice
    // (Σ(c' + σ'fc·tan φ')·l = F1·D), and the stage-3 drained strength equals τ2.
    const steady = clone(staged);
    steady.analysis = { ...steady.analysis, case: "steady" };
    delete steady.analysis!.drawdown;
    const noDrop = withDrawdown(highR(staged), { to: 20 });
    const noDropEffective = withDrawdown(staged, { to: 20, method: "effective" });
    fc.assert(
      fc.property(upstreamCircle, ({ xc, yc, tangent }) => {
        const a = circle(steady, xc, yc, yc - tangent);
        const b = circle(noDrop, xc, yc, yc - tangent);
        // The effective method at the same level cuts the same slices: equal to solver tolerance.
        const e = circle(noDropEffective, xc, yc, yc - tangent);
        expect(b.fs.bishop === null).toBe(a.fs.bishop === null);
        if (e.fs.bishop !== null) expectRelative(b.fs.bishop, e.fs.bishop, 1e-6);
        if (e.fs.fellenius !== null) expectRelative(b.fs.fellenius, e.fs.fellenius, 1e-9);
        // The steady case itself differs only by the drawdown's extra slice breaks (shore, lowered level).
        if (a.fs.bishop !== null) expectRelative(b.fs.bishop, a.fs.bishop, 1e-3);
        if (a.fs.fellenius !== null) expectRelative(b.fs.fellenius, a.fs.fellenius, 1e-3);
      }),
      { numRuns: 40 },
    );
  });

  test("with R envelopes set very high, τ2 = τKf and, once every base switched, FS = the effective-stress FS after drawdown", () => {
    // The lower of the Kc = 1 and Kc = Kf envelopes governs (docs/references.md), so very high R
    // envelopes leave τ2 = τKf; where the post-drawdown drained strength is lower on every base
    // (on the long slope the water held at the ground leaves less effective stress than stage 1),
    // stage 3 is exactly the effective-stress analysis with the post-drawdown pore pressures.
    const hi = highR(longSlope);
    const eff = withDrawdown(longSlope, { method: "effective" });
    let allDrained = 0;
    fc.assert(
      fc.property(
        fc.double({ min: 60, max: 200, noNaN: true }),
        fc.double({ min: 0.5, max: 12, noNaN: true }),
        fc.double({ min: 25, max: 120, noNaN: true }),
        (x, depth, r) => {
          // A circle through the face point at x, reaching `depth` below it, centre on the face normal.
          const yg = (x - 30) / 3;
          const n = [1 / Math.sqrt(10), 3 / Math.sqrt(10)];
          const [xc, yc] = [x - n[0] * (r - depth), yg + n[1] * (r - depth)];
          const s = circle(hi, xc, yc, r);
          if (s.fs.bishop === null) return;
          const undrained = s.slices.filter((row) => row.stage!.governing === "undrained");
          for (const row of undrained) {
            const { tau2, tauKf } = row.stage!;
            expect(Math.abs(tau2! - tauKf!)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(tauKf!)));
          }
          if (undrained.length > 0) return;
          allDrained++;
          expectRelative(s.fs.bishop, circle(eff, xc, yc, r).fs.bishop!, 1e-6);
        },
      ),
      // A fixed seed keeps the share of all-drained circles, and so this check, reproducible.
      { numRuns: 80, seed: 20261202 },
    );
    // The all-drained branch must actually be exercised, not skipped by chance.
    expect(allDrained).toBeGreaterThan(10);
  });

  test("the staged FS of free-draining materials equals their effective-stress FS", () => {
    fc.assert(
      fc.property(upstreamCircle, fc.double({ min: 8, max: 20, noNaN: true }), ({ xc, yc, tangent }, to) => {
        const free = withDrawdown(staged, { to });
        for (const m of free.materials) if (m.model === "mohr-coulomb") m.freeDraining = true;
        const eff = withDrawdown(free, { method: "effective" });
        const a = circle(free, xc, yc, yc - tangent);
        const b = circle(eff, xc, yc, yc - tangent);
        expect(a.fs.bishop === null).toBe(b.fs.bishop === null);
        if (b.fs.bishop !== null) expectRelative(a.fs.bishop, b.fs.bishop, 1e-6);
        if (b.fs.fellenius !== null) expectRelative(a.fs.fellenius, b.fs.fellenius, 1e-9);
        expect(a.stages?.bishop?.switchedSlices ?? 0).toBe(0);
      }),
      { numRuns: 40 },
    );
  });
});

describe("staged drawdown results", () => {
  const result = search(staged);

  test("the search minimises the final-stage FS and a re-check of its circle gives the same stages", () => {
    for (const method of ["bishop", "fellenius"] as const) {
      const crit = result.results[method]!;
      expect(crit.fs).toBe(crit.stages!.final);
      for (const c of result.lowest[method]!) expect(c.fs).toBeGreaterThanOrEqual(crit.fs);
      const one = circle(staged, crit.circle.xc, crit.circle.yc, crit.circle.r);
      expect(one.fs[method]).toBe(crit.fs);
      expect(one.stages![method]).toEqual(crit.stages);
    }
    expect(result.stagedVariant).toBe("three-stage");
  });

  test("each slice reports the strength that governs, and c, φ show it (Duncan, Wright & Wong 1990 stage rules)", () => {
    const crit = result.results.bishop!.circle;
    const r = circle(staged, crit.xc, crit.yc, crit.r);
    const low = r.slices.filter((s) => s.stage!.drainage === "low-permeability");
    expect(low.length).toBeGreaterThan(0);
    for (const s of r.slices) {
      const st = s.stage!;
      if (st.drainage === "free-draining") {
        expect(st.governing).toBe("drained");
        expect(s.material).toBe("shell");
      } else if (st.governing === "undrained") {
        expect(s.c).toBe(st.tau2);
        expect(s.phi).toBe(0);
        expect(st.tauDrained!).toBeGreaterThanOrEqual(st.tau2!);
      } else {
        expect(st.tauDrained!).toBeLessThan(st.tau2!);
        expect(s.phi).toBeGreaterThan(0);
      }
      if (st.sigmaFc !== null) expect(st.sigmaFc).toBeGreaterThanOrEqual(0);
    }
    const stages = r.stages!.bishop!;
    expect(stages.final).toBe(r.fs.bishop);
    expect(stages.final).toBe(stages.switchedSlices > 0 ? stages.fs3 : stages.fs2);
  });

  test("the USACE two-stage option: τ2 = min(cR + σ'fc·tan φR, c' + σ'fc·tan φ'), no third stage (EM 1110-2-1902 App. G)", () => {
    const doc = withDrawdown(staged, { stagedVariant: "usace-two-stage" });
    const crit = result.results.bishop!.circle;
    const r = circle(doc, crit.xc, crit.yc, crit.r);
    expect(r.stagedVariant).toBe("usace-two-stage");
    const st = r.stages!.bishop!;
    expect(st.fs3).toBeNull();
    expect(st.final).toBe(st.fs2);
    const mats = new Map(doc.materials.map((m) => [m.id, m]));
    for (const s of r.slices.filter((x) => x.stage!.drainage === "low-permeability")) {
      const m = mats.get(s.material)!;
      if (m.model !== "mohr-coulomb") continue;
      const sig = s.stage!.sigmaFc!;
      const expected = Math.min(m.cR! + sig * Math.tan(m.phiR! * RAD), m.c + sig * Math.tan(m.phi * RAD));
      expectRelative(s.stage!.tau2, expected, 1e-12);
    }
  });

  test("a slope that would fail before drawdown is flagged stage1-unstable", () => {
    const weak = clone(staged);
    for (const m of weak.materials)
      if (m.model === "mohr-coulomb") {
        m.c *= 0.2;
        m.phi = 12;
      }
    const crit = result.results.bishop!.circle;
    const r = circle(weak, crit.xc, crit.yc, crit.r);
    expect(r.stages!.bishop!.fs1!).toBeLessThan(1);
    expect(r.warnings.map((w) => w.code)).toContain("stage1-unstable");
  });
});

describe("validateSection: staged drawdown inputs", () => {
  const codes = (doc: unknown) => {
    const v = validateSection(doc);
    return v.ok ? [] : v.errors.map((e) => `${e.code} ${e.path}`);
  };

  test("a low-permeability material without cR/phiR is an error that names it and says what to add", () => {
    const doc = clone(staged);
    const core = doc.materials[1];
    if (core.model === "mohr-coulomb") {
      delete core.cR;
      delete core.phiR;
    }
    const v = validateSection(doc);
    expect(v.ok).toBe(false);
    if (v.ok) return;
    const e = v.errors.find((x) => x.code === "r-envelope-missing")!;
    expect(e.path).toBe("materials[1]");
    expect(e.message).toMatch(/'core'.*cR.*phiR.*freeDraining/s);
    if (core.model === "mohr-coulomb") core.freeDraining = true;
    expect(codes(doc)).toEqual([]);
  });

  test("cR and phiR are range-checked and must come together", () => {
    const set = (patch: Record<string, unknown>) => {
      const doc = clone(staged);
      Object.assign(doc.materials[2], patch);
      return codes(doc);
    };
    expect(set({ cR: -1 })).toEqual(["r-cohesion-negative materials[2].cR"]);
    expect(set({ phiR: 60 })).toEqual(["r-phi-out-of-range materials[2].phiR"]);
    expect(set({ phiR: undefined })).toContain("r-envelope-incomplete materials[2].phiR");
  });

  test("the effective method stays the default and needs no R envelope (a version-1 file stays valid)", () => {
    const doc = withDrawdown(staged, { method: undefined });
    for (const m of doc.materials)
      if (m.model === "mohr-coulomb") {
        delete m.cR;
        delete m.phiR;
        delete m.freeDraining;
      }
    expect(codes(doc)).toEqual([]);
    const r = analyzeCircle(doc, { xc: 27, yc: 31, r: 23 });
    expect(r.ok && r.stages).toBeUndefined();
  });
});

describe('scripts/analyze.ts with "method": "staged" (docs/engine-io.md command line)', () => {
  const ROOT = path.resolve(__dirname, "../../..");
  const run = (args: string[]) => {
    const r = spawnSync("npx", ["tsx", "scripts/analyze.ts", ...args], {
      cwd: ROOT,
      encoding: "utf8",
      timeout: 60_000,
    });
    return { status: r.status, json: JSON.parse(r.stdout) as StagedCliOutput };
  };

  test("a grid search and one circle of the staged fixture print the same final-stage FS as the library", () => {
    const file = path.join(FIXTURES, "drawdown-staged-embankment.json");
    const lib = search(staged).results.bishop!;
    const r = run([file]);
    expect(r.status).toBe(0);
    expect(r.json.results.bishop.fs).toBe(lib.fs);
    expect(r.json.results.bishop.stages.final).toBe(lib.fs);
    const c = lib.circle;
    const one = run([file, "--circle", `${c.xc},${c.yc},${c.r}`]);
    expect(one.status).toBe(0);
    expect(one.json.stages.bishop.final).toBe(lib.fs);
    expect(["undrained", "drained"]).toContain(one.json.slices[0].stage.governing);
  }, 60_000);
});
