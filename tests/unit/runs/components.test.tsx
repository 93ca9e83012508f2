import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CAUTION_TEXT } from "@/components/ui/caution";
import { CompareTable } from "@/components/runs/result/compare-table";
import { FsSummary } from "@/components/runs/result/fs-summary";
import { InputDiff } from "@/components/runs/result/input-diff";
import { SliceTable } from "@/components/runs/result/slice-table";
import { smallRun } from "./engine-run";
import { SLICES } from "./fixtures";

const text = (html: string) =>
  html
    .replace(/<[^>]+>/g, " ")
    .replace(/&#x27;/g, "'")
    .replace(/&quot;/g, '"')
    .replace(/&amp;/g, "&")
    .replace(/\s+/g, " ");

describe("FsSummary", () => {
  const { result, bishop } = smallRun();
  const fsB = result.results.bishop!.fs;
  const html = renderToStaticMarkup(
    <FsSummary result={result} requiredFs={fsB + 0.01} minMAlpha={{ bishop: bishop.minMAlpha }} />,
  );

  it("prints each method's FS to 3 decimals with a worded, shaped verdict and the caution", () => {
    expect(text(html)).toContain(fsB.toFixed(3));
    expect(html).toMatch(/data-testid="fs-row-bishop"[\s\S]*data-verdict="fail"/);
    expect(text(html)).toMatch(/✕ below the required/);
    expect(text(html)).toContain(CAUTION_TEXT);
    expect(text(html)).toMatch(/classical form/);
  });

  it("states the critical circle, the counts and each rejection reason in words", () => {
    const c = result.results.bishop!.circle;
    expect(text(html)).toContain(`(${c.xc.toFixed(2)}, ${c.yc.toFixed(2)}) m`);
    expect(text(html)).toContain(`${result.circles.tried.toLocaleString("en-GB")} tried`);
    for (const reason of Object.keys(result.circles.rejected)) expect(html).toContain(`data-reason="${reason}"`);
  });

  it("passes when the FS reaches the requirement", () => {
    const ok = renderToStaticMarkup(<FsSummary result={result} requiredFs={1.0} />);
    expect(text(ok)).toMatch(/✓ meets the required 1.00/);
  });
});

describe("SliceTable", () => {
  const html = renderToStaticMarkup(<SliceTable rows={SLICES} meta={{ method: "bishop", title: "Demo" }} />);
  it("renders units in the headers, aria-sort on each, a CSV button and the caution", () => {
    expect(text(html)).toMatch(/Weight W \(kN\/m\)/);
    expect((html.match(/aria-sort="none"/g) ?? []).length).toBe(15);
    expect(html).toContain('data-testid="slice-csv-download"');
    expect(text(html)).toContain(CAUTION_TEXT);
    // mα = 0.15 is flagged with a mark, not colour alone.
    expect(text(html)).toContain("0.150 !");
  });
});

describe("CompareTable and InputDiff", () => {
  it("puts runs in columns with the required FS, verdicts and the lowest marked", () => {
    const html = renderToStaticMarkup(
      <CompareTable
        runs={[
          { id: 1, label: "Run A", requiredFs: 1.5, fs: { bishop: 1.62, fellenius: 1.48 } },
          { id: 2, label: "Run B", requiredFs: 1.5, fs: { bishop: 1.41, fellenius: 1.33 } },
        ]}
      />,
    );
    const t = text(html);
    expect(t).toMatch(/Run A .*Run B/);
    expect(t).toContain("1.620");
    expect((html.match(/data-verdict="fail"/g) ?? []).length).toBe(3);
    expect((t.match(/lowest/g) ?? []).length).toBe(2);
    expect(t).toContain(CAUTION_TEXT);
  });

  it("groups differences by area in reading order", () => {
    const html = renderToStaticMarkup(
      <InputDiff
        differences={[
          { area: "analysis", path: "analysis.grid", text: "grid moved" },
          { area: "materials", path: "materials[fill].phi", text: "fill: φ' 30° → 28°", before: "30°", after: "28°" },
        ]}
      />,
    );
    expect(html.indexOf('data-area="materials"')).toBeLessThan(html.indexOf('data-area="analysis"'));
    expect(text(html)).toContain("fill: φ' 30° → 28°");
  });
});
