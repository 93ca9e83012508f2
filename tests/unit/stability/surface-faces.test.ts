/**
 * Ponded water against a vertical step of the ground on slip surfaces of any shape (docs/engine.md
 * §3 "Ponded water", §12). Sources:
 * - Hydrostatics (fact of the trade): water standing h above the foot of a vertical wall pushes on it
 *   horizontally with γw·h²/2 per metre run, acting h/3 above the foot.
 * - A circle given as a fine polyline gives the circle's own factor once both equilibria hold
 *   (Fredlund, Zhang & Lam 1992, Can. Geotech. J. 29), so the thrust must enter the polyline's force
 *   and moment balance as it enters the circle's.
 */
import { describe, expect, test } from "vitest";
import type { SectionDocument } from "@/lib/stability";
import { analyzeSurface } from "@/lib/stability/surfaces/analyze-surface";
import { circle, expectRelative } from "./helpers";

const GW = 9.81;

/** Invented: a bench at y = 10 left of x = 20, a vertical step to a floor at y = 4, water at y = 8. */
function pondedStep(): SectionDocument {
  return {
    version: 1,
    materials: [{ id: "soil", model: "mohr-coulomb", gamma: 19, c: 10, phi: 25 }],
    regions: [
      {
        material: "soil",
        points: [
          [0, -10],
          [60, -10],
          [60, 4],
          [20, 4],
          [20, 10],
          [0, 10],
        ],
      },
    ],
    water: {
      gammaW: GW,
      phreatic: [
        [0, 8],
        [60, 8],
      ],
    },
    analysis: { methods: ["spencer", "morgenstern-price"], slices: 40 },
  };
}

// Centre (20, 16), R 14: the arc passes 2 m under the foot of the step (y = 2 at x = 20), so the
// whole wet part of the face, y = 4 to 8 (h = 4 m), belongs to the mass; it enters the bench at
// x = 20 − √160 and leaves through the floor at x = 20 + √52, sliding toward the pond (+x).
const xc = 20;
const yc = 16;
const R = 14;
const arc = (x: number) => yc - Math.sqrt(R * R - (x - xc) ** 2);

function polylineOfCircle(): [number, number][] {
  const xa = xc - Math.sqrt(160);
  const xb = xc + Math.sqrt(52);
  const pts: [number, number][] = [];
  for (let i = 0; i <= 300; i++) {
    const x = xa + ((xb - xa) * i) / 300;
    pts.push([x, i === 0 ? 10 : i === 300 ? 4 : arc(x)]);
  }
  return pts;
}

describe("a ponded vertical step under a polyline slip surface", () => {
  test("the slice against the step carries γw·h²/2 = 9.81 × 4² / 2 kN/m, pushing against the sliding", () => {
    const r = analyzeSurface(pondedStep(), polylineOfCircle());
    if (!r.ok) throw new Error("invalid");
    const against = r.slices.filter((s) => Math.abs(s.xRight - 20) < 1e-9);
    expect(against).toHaveLength(1);
    // The bench top (y = 10) is above the water, so the step is the slice's only water thrust;
    // the pond stands on the +x side and the mass slides toward +x, so the thrust is negative.
    expect(against[0].waterThrust).toBeCloseTo(-(GW * 4 * 4) / 2, 9);
    // The slice to the right of the step sits under the pond's flat floor: no horizontal thrust.
    const beyond = r.slices.filter((s) => Math.abs(s.xLeft - 20) < 1e-9);
    expect(beyond).toHaveLength(1);
    expect(beyond[0].waterThrust).toBe(0);
    expect(beyond[0].pondedLoad).toBeCloseTo(GW * 4 * (beyond[0].xRight - beyond[0].xLeft), 9);
  });

  test("the fine polyline gives the circle's Spencer and Morgenstern–Price factors within 0.1 %", () => {
    const doc = pondedStep();
    const c = circle(doc, xc, yc, R);
    const r = analyzeSurface(doc, polylineOfCircle());
    if (!r.ok) throw new Error("invalid");
    expect(c.fs.spencer).not.toBeNull();
    expectRelative(r.fs.spencer, c.fs.spencer ?? NaN, 1e-3);
    expectRelative(r.fs["morgenstern-price"], c.fs["morgenstern-price"] ?? NaN, 1e-3);
  });

  test("a dry step below y = 0 carries no thrust, on the circle and on the polyline", () => {
    // Without a water line nothing stands against the face (the same section 20 m lower, below y = 0).
    const doc = pondedStep();
    delete doc.water;
    for (const r of doc.regions) r.points = r.points.map(([x, y]) => [x, y - 20] as [number, number]);
    const c = circle(doc, xc, yc - 20, R);
    const r = analyzeSurface(
      doc,
      polylineOfCircle().map(([x, y]) => [x, y - 20]),
    );
    if (!r.ok) throw new Error("invalid");
    expect(r.slices.length).toBeGreaterThan(0);
    for (const s of [...c.slices, ...r.slices]) expect(s.waterThrust).toBe(0);
  });
});
