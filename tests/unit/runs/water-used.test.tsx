import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CompareTable } from "@/components/runs/result/compare-table";
import { SINGLE_WATER_TEXT, waterUsedText } from "@/lib/runs/view/water-used";

describe("which water a kept run analysed", () => {
  it("is the recorded condition's name, or says the section had a single water line", () => {
    expect(waterUsedText({ waterCondition: { name: "End of construction, no reservoir" } })).toBe(
      "End of construction, no reservoir",
    );
    expect(waterUsedText({ waterCondition: null })).toBe(SINGLE_WATER_TEXT);
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
