/**
 * Sensitivity maths checked against the infinite-slope factor of safety, whose closed form is
 * textbook: FS = c′ / (γ z sin β cos β) + tan φ′ / tan β for a dry slope of angle β and a slip
 * plane at depth z (Duncan, Wright & Brandon, "Soil Strength and Slope Stability", 2nd ed. 2014,
 * ch. 6; the formula from memory).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import type { InputParameter } from "@/lib/sensitivity/parameters";
import {
  bisectTarget,
  bracketTarget,
  sweepValues,
  tornadoBar,
  tornadoOrder,
  variedValues,
} from "@/lib/sensitivity/sensitivity";

const rad = (d: number) => (d * Math.PI) / 180;
const beta = Math.atan(1 / 2.5); // a 2.5H:1V face
const z = 3;
const stored = { c: 5, phi: 30, gamma: 19 };
function infiniteFs(v: { c: number; phi: number; gamma: number }): number {
  return v.c / (v.gamma * z * Math.sin(beta) * Math.cos(beta)) + Math.tan(rad(v.phi)) / Math.tan(beta);
}

const param = (key: "c" | "phi" | "gamma", extra: Partial<InputParameter> = {}): InputParameter => ({
  key,
  label: key,
  unit: "",
  stored: stored[key],
  min: 0,
  max: 100,
  step: 0.1,
  ...extra,
});

describe("variedValues", () => {
  it("moves by a percentage of the stored value, kept inside the range", () => {
    expect(variedValues(param("phi"), { kind: "percent", percent: 10 })).toEqual({ low: 27, high: 33 });
    expect(variedValues(param("phi", { max: 31 }), { kind: "percent", percent: 10 })).toEqual({ low: 27, high: 31 });
  });
  it("moves by one standard deviation only where one is given", () => {
    expect(variedValues(param("phi", { sd: 2 }), { kind: "sd" })).toEqual({ low: 28, high: 32 });
    expect(variedValues(param("phi"), { kind: "sd" })).toBeNull();
    expect(variedValues(param("c", { stored: 0 }), { kind: "percent", percent: 10 })).toBeNull();
  });
});

describe("tornado order", () => {
  it("puts the input with the largest FS swing on top, as the closed form ranks them", () => {
    const bars = (["c", "phi", "gamma"] as const).map((k) => {
      const p = param(k);
      const r = variedValues(p, { kind: "percent", percent: 10 })!;
      return tornadoBar(p, r, infiniteFs({ ...stored, [k]: r.low }), infiniteFs({ ...stored, [k]: r.high }));
    });
    const order = tornadoOrder(bars).map((b) => b.key);
    // Swings by hand: φ′: (tan 33° − tan 27°)/tan β ≈ 0.350; c′: 0.2·c′/(γ z sin β cos β) ≈ 0.051;
    // γ: c′/(z sin β cos β)·(1/17.1 − 1/20.9) ≈ 0.052 (γ edges past c′ by a hair).
    expect(order).toEqual(["phi", "gamma", "c"]);
    expect(bars.find((b) => b.key === "phi")!.swing).toBeCloseTo(
      (Math.tan(rad(33)) - Math.tan(rad(27))) / Math.tan(beta),
      12,
    );
  });
  it("gives no swing to an input that lost its FS at either end", () => {
    expect(tornadoBar(param("c"), { low: 4, high: 6 }, null, 1.2).swing).toBe(0);
  });
});

describe("FS along one input and the required FS", () => {
  it("finds the φ′ at which a cohesionless infinite slope reaches FS 1.5: atan(1.5 tan β)", async () => {
    const f = async (phi: number) => infiniteFs({ c: 0, phi, gamma: 19 });
    const xs = sweepValues(20, 45, 11);
    expect(xs[0]).toBe(20);
    expect(xs[10]).toBe(45);
    const pts = await Promise.all(xs.map(async (x) => ({ x, fs: await f(x) })));
    const bracket = bracketTarget(pts, 1.5)!;
    const phi = await bisectTarget(f, bracket.lo, bracket.hi, 1.5, 1e-9);
    expect(phi!).toBeCloseTo((Math.atan(1.5 * Math.tan(beta)) * 180) / Math.PI, 7);
    expect(phi!).toBeCloseTo(30.96, 2);
  });
  it("returns null when the line never reaches the target", async () => {
    const f = async (phi: number) => infiniteFs({ c: 0, phi, gamma: 19 });
    expect(
      bracketTarget(
        [
          { x: 10, fs: await f(10) },
          { x: 20, fs: await f(20) },
        ],
        1.5,
      ),
    ).toBeNull();
    expect(await bisectTarget(f, 10, 20, 1.5, 1e-6)).toBeNull();
  });
  it("lands within the tolerance of the root of any increasing line that crosses the target", async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.double({ min: -3, max: 3, noNaN: true }),
        async (slope, root) => {
          const x = await bisectTarget(async (v) => 1.5 + slope * (v - root), -10, 10, 1.5, 1e-8);
          expect(Math.abs(x! - root)).toBeLessThan(1e-7);
        },
      ),
    );
  });
});
