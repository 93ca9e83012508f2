import { describe, expect, it } from "vitest";
import { REASONS, runGridSearch } from "@/lib/stability";
import {
  describeWarning,
  describeWarnings,
  ordinaryFormText,
  rejectionList,
  rejectionText,
} from "@/lib/runs/view/warning-text";
import { embankment } from "./engine-run";

describe("warning sentences", () => {
  it("give every rejection reason the engine names (lib/stability/status.ts) its own words", () => {
    for (const r of REASONS.slice(1)) expect(rejectionText(r)).not.toBe(r.replace(/-/g, " "));
  });

  it("turn the engine's grid-edge warning into a check with the suggested move kept", () => {
    const doc = embankment();
    // A grid far left of the downstream face puts the minimum on its right edge.
    doc.analysis = {
      ...doc.analysis,
      grid: { x1: 45, y1: 25, x2: 55, y2: 35, nx: 4, ny: 4 },
      radii: { tangentY1: 10, tangentY2: 2, n: 4 },
      refine: false,
    };
    const result = runGridSearch(doc);
    if (!result.ok) throw new Error("search failed");
    const edge = result.warnings.find((w) => w.code === "minimum-on-grid-edge");
    expect(edge).toBeDefined();
    const s = describeWarning(edge!);
    expect(s.weight).toBe("check");
    expect(s.action).toMatch(/Move the grid/);
    expect(s.detail).toBe(edge!.message);
    expect(s.detail).toMatch(/move the grid about/);
  });

  it("keep unknown codes readable and list checks before notes", () => {
    const out = describeWarnings([
      { code: "negative-normal", message: "Ordinary method: N' came out negative on 2 slice(s) and was set to zero." },
      { code: "gamma-high", message: "Material 'x': γ = 25 kN/m³ is high." },
      { code: "m-alpha-low", message: "mα falls to 0.150" },
    ]);
    expect(out.map((w) => w.code)).toEqual(["m-alpha-low", "negative-normal", "gamma-high"]);
    expect(out[2].headline).toBe("Material 'x': γ = 25 kN/m³ is high.");
  });

  it("count rejections largest first and state the ordinary method's form (docs/engine-io.md)", () => {
    expect(rejectionList({ "no-slip-mass": 3, "upper-arc": 10, impenetrable: 0 }).map((r) => r.count)).toEqual([10, 3]);
    expect(ordinaryFormText("classical")).toMatch(/N′ = N − u·l/);
    expect(ordinaryFormText("effective-weight")).toMatch(/\(W − u·b\)·cos α/);
  });
});
