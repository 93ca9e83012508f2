/**
 * Stability runs whose pore pressures come from the seepage solution (docs/seepage.md §6; the
 * contract in docs/engine-io.md §2): every check is against something outside this code.
 */
import { describe, expect, test } from "vitest";
import { elevationAt } from "@/lib/plane-geometry";
import { circleOnWater, prepareWater, searchOnWater } from "@/lib/seepage-stability";
import { analyzeCircle, runGridSearch, type GridSearchSuccess } from "@/lib/stability";
import { homogeneousDam, UPSTREAM_SEARCH } from "./stability-sections";

type Line = [number, number][];

function ok<T extends { ok: boolean }>(r: T): Extract<T, { ok: true }> {
  if (!r.ok) throw new Error(JSON.stringify(r));
  return r as Extract<T, { ok: true }>;
}

function fs(r: GridSearchSuccess, m: "bishop" | "fellenius"): number {
  const v = r.results[m]?.fs;
  if (v === undefined || v === null) throw new Error(`no ${m} result`);
  return v;
}

/** The water line the orchestrator hands the engine (the solution's phreatic surface and the pools). */
function solvedLine(doc: unknown): Line {
  const w = ok(prepareWater(doc));
  return (w.document as { water: { phreatic: Line } }).water.phreatic;
}

const toeDrained = (analysis?: Record<string, unknown>) =>
  homogeneousDam({
    water: { source: "seepage" },
    seepage: {
      pools: [{ side: "left", level: 8 }],
      drains: [
        [
          [46, 0],
          [56, 0],
        ],
      ],
      meshSize: 0.5,
    },
    ...(analysis ? { analysis } : {}),
  });

describe('"water": {"source": "seepage"} in a stability run', () => {
  test("equal pools on both sides: a hydrostatic field, and the same FS as the level line", () => {
    // Fact of physics: with the same level on both sides nothing flows and the water is hydrostatic,
    // u = γw·(level − y). Linear elements hold a linear head exactly, so the field is exact up to round-off
    // and both methods must give the level line's FS to the solver's tolerance.
    const pools = [
      { side: "left", level: 7 },
      { side: "right", level: 7 },
    ];
    const seep = ok(searchOnWater(homogeneousDam({ water: { source: "seepage" }, seepage: { pools, meshSize: 1 } })));
    const level = ok(
      runGridSearch(
        homogeneousDam({
          water: {
            phreatic: [
              [-10, 7],
              [66, 7],
            ],
          },
        }),
      ),
    );
    for (const m of ["bishop", "fellenius"] as const) expect(fs(seep, m)).toBeCloseTo(fs(level, m), 8);
    expect(seep.seepage?.q).toBeLessThan(1e-15);
    expect(seep.seepage?.warnings).toEqual([]);
    // Slice by slice: the base pressures are the hydrostatic ones.
    const circle = level.results.bishop?.circle;
    if (!circle) throw new Error("no circle");
    const a = ok(
      circleOnWater(homogeneousDam({ water: { source: "seepage" }, seepage: { pools, meshSize: 1 } }), circle),
    );
    const b = ok(
      analyzeCircle(
        homogeneousDam({
          water: {
            phreatic: [
              [-10, 7],
              [66, 7],
            ],
          },
        }),
        circle,
      ),
    );
    a.slices.forEach((s, i) => expect(s.porePressure).toBeCloseTo(b.slices[i].porePressure, 6));
  });

  test("a homogeneous dam with a toe drain: the field's FS lies just above the same line drawn as a phreatic line", () => {
    // Common practice (Duncan, Wright & Brandon 2014, ch. 6, from memory): taking u = γw·(line − y) below
    // a phreatic line ignores the head lost as water flows down toward a drain, so it overstates u under
    // the downstream slope and the FS it gives is slightly low. Here the flow is mostly horizontal under
    // the face, so the two differ by a few per cent at most: we require field ≥ line and within 3 %.
    const doc = toeDrained();
    const seep = ok(searchOnWater(doc));
    const line = solvedLine(doc);
    const drawn = ok(runGridSearch(homogeneousDam({ water: { phreatic: line } })));
    for (const m of ["bishop", "fellenius"] as const) {
      expect(fs(seep, m)).toBeGreaterThanOrEqual(fs(drawn, m) - 1e-9);
      expect(fs(seep, m) / fs(drawn, m)).toBeLessThan(1.03);
    }
    // The toe drain keeps the downstream slope dry: the line reaches the base at the drain's upstream end
    // (Casagrande 1937: the top flow line enters a horizontal filter at its start).
    const yAtDrain = line.find(([x]) => x >= 47)?.[1];
    expect(yAtDrain).toBeCloseTo(0, 6);
    expect(seep.seepage?.q).toBeGreaterThan(0);
    expect(Math.abs((seep.seepage?.qIn ?? 0) - (seep.seepage?.qOut ?? 1))).toBeLessThan(0.01 * (seep.seepage?.q ?? 0));
  });

  test("suction above the phreatic surface counts as zero", () => {
    // The contract (docs/engine-io.md §2): negative pore pressures count as zero in stability.
    const doc = toeDrained();
    const seep = ok(searchOnWater(doc));
    const circle = seep.results.bishop?.circle;
    if (!circle) throw new Error("no circle");
    const report = ok(circleOnWater(doc, circle));
    const line = solvedLine(doc);
    let above = 0;
    for (const s of report.slices) {
      expect(s.porePressure).toBeGreaterThanOrEqual(0);
      const x = (s.xLeft + s.xRight) / 2;
      if (s.baseY > elevationAt(line, x) + 0.5) {
        above++;
        expect(s.porePressure).toBe(0);
      }
    }
    expect(above).toBeGreaterThan(0);
    // And in the engine itself: a field that is all suction gives the dry section's FS.
    const suction = ok(
      runGridSearch(
        homogeneousDam({
          water: {
            source: "seepage",
            phreatic: [
              [-10, -2],
              [66, -2],
            ],
          },
        }),
        {
          waterField: { porePressure: () => -50 },
        },
      ),
    );
    const dry = ok(
      runGridSearch(
        homogeneousDam({
          water: {
            phreatic: [
              [-10, -2],
              [66, -2],
            ],
          },
        }),
      ),
    );
    for (const m of ["bishop", "fellenius"] as const) expect(fs(suction, m)).toBe(fs(dry, m));
  });

  test("a drawdown takes the solution's phreatic surface as its pre-drawdown line", () => {
    // The contract (docs/engine-io.md §2); and a fact of the trade (USACE EM 1110-2-1902, 2003, the
    // rapid-drawdown case): lowering the pool leaves the upstream slope far less stable than at steady seepage.
    const drawdown = { ...UPSTREAM_SEARCH, case: "drawdown", drawdown: { from: 8, to: 2 } };
    const seep = ok(searchOnWater(toeDrained(drawdown)));
    const line = solvedLine(toeDrained());
    const drawn = ok(runGridSearch(homogeneousDam({ water: { phreatic: line }, analysis: drawdown })));
    for (const m of ["bishop", "fellenius"] as const) expect(fs(seep, m)).toBe(fs(drawn, m));
    const steady = ok(searchOnWater(toeDrained(UPSTREAM_SEARCH)));
    for (const m of ["bishop", "fellenius"] as const) expect(fs(seep, m)).toBeLessThan(0.8 * fs(steady, m));
  });

  test("the engine alone refuses seepage water it has not been given", () => {
    const r = runGridSearch(homogeneousDam({ water: { source: "seepage" } }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.map((e) => e.path)).toContain("water.source");
    const noField = runGridSearch(
      homogeneousDam({
        water: {
          source: "seepage",
          phreatic: [
            [-10, 7],
            [66, 7],
          ],
        },
      }),
    );
    expect(noField.ok).toBe(false);
    if (!noField.ok) expect(noField.errors[0].code).toBe("seepage-field-missing");
  });
});
