import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CompareTable } from "@/components/runs/result/compare-table";
import {
  SINGLE_WATER_TEXT,
  documentToDraw,
  runSeepage,
  seepageUsedText,
  waterUsedText,
} from "@/lib/runs/view/water-used";

describe("which water a kept run analysed", () => {
  it("is the recorded condition's name, or says the section had a single water line", () => {
    expect(waterUsedText({ waterCondition: { name: "End of construction, no reservoir" } })).toBe(
      "End of construction, no reservoir",
    );
    expect(waterUsedText({ waterCondition: null })).toBe(SINGLE_WATER_TEXT);
  });

  it("says when the pore pressures came from the seepage solution, with q written as the trade writes it", () => {
    const seepage = {
      q: 2.22784e-6,
      qIn: 2.22785e-6,
      qOut: 2.22783e-6,
      meshSize: 0.899,
      nodes: 3187,
      elements: 6035,
      freeSurfaceRounds: 29,
      converged: true,
      pools: [],
      waterLine: [
        [0, 23],
        [140, 6],
      ] as [number, number][],
      warnings: [],
    };
    const run = { waterCondition: { name: "Steady seepage, 23.0 m" }, result: { seepage } };
    expect(runSeepage(run)).toBe(seepage);
    expect(waterUsedText(run)).toBe("Steady seepage, 23.0 m, pore pressures from its seepage solution");
    expect(seepageUsedText(seepage)).toBe(
      "from a finite-element seepage solution (steady state, linear triangles): q = 2.23 × 10⁻⁶ m³/s per metre, " +
        "3,187 nodes and 6,035 elements of about 0.90 m",
    );
    expect(seepageUsedText({ ...seepage, converged: false })).toMatch(/had not fully settled/);
    expect(runSeepage({ result: { results: {} } })).toBeNull();
    // Drawn with the solved line; a run on any other water is drawn as stored.
    const doc = { water: { source: "seepage", gammaW: 9.81 } };
    expect(documentToDraw(doc, seepage).water).toEqual({
      source: "seepage",
      gammaW: 9.81,
      phreatic: seepage.waterLine,
    });
    expect(documentToDraw(doc, null)).toBe(doc);
  });

  it("has its own row in the comparison, one cell per run", () => {
    const html = renderToStaticMarkup(
      <CompareTable
        runs={[
          { id: 1, label: "A", water: "Rapid drawdown, 16.0 m to 8.0 m", requiredFs: 1.3, fs: { bishop: 1.15 } },
          { id: 2, label: "B", water: "End of construction, no reservoir", requiredFs: 1.3, fs: { bishop: 1.43 } },
        ]}
      />,
    );
    const row = html.slice(html.indexOf('data-testid="compare-row-water"'), html.indexOf("Required FS"));
    expect(row).toContain("Rapid drawdown, 16.0 m to 8.0 m");
    expect(row).toContain("End of construction, no reservoir");
  });
});
