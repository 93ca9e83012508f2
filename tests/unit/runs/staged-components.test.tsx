import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { FsSummary } from "@/components/runs/result/fs-summary";
import { SliceTable } from "@/components/runs/result/slice-table";
import { StatusBadge } from "@/components/runs/list/status-badge";
import { smallStagedRun } from "./staged-fixture";

const text = (html: string) =>
  html
    .replace(/<[^>]+>/g, " ")
    .replace(/&#x27;/g, "'")
    .replace(/&amp;/g, "&")
    .replace(/\s+/g, " ");

describe("the results panel of a staged drawdown", () => {
  const { result, slices } = smallStagedRun();

  it("shows each stage's FS per method, the final one judged against the required FS", () => {
    const html = renderToStaticMarkup(<FsSummary result={result} requiredFs={1.3} />);
    const b = result.results.bishop!.stages!;
    expect(html).toContain('data-testid="stage-fs"');
    expect(html).toMatch(new RegExp(`data-testid="stage-1-bishop"[^>]*>${b.fs1!.toFixed(3)}`));
    expect(html).toMatch(new RegExp(`data-testid="stage-2-bishop"[^>]*>${b.fs2!.toFixed(3)}`));
    expect(text(html)).toContain("Staged drawdown, three stages after Duncan, Wright & Wong (1990)");
    expect(text(html)).toContain("no slice drained");
  });

  it("heads the slice table's strengths as the final stage's and names the governing strength", () => {
    const html = renderToStaticMarkup(<SliceTable rows={slices.bishop} meta={{ method: "bishop" }} />);
    expect(text(html)).toContain("c, final stage");
    expect(text(html)).toContain("Governing strength");
    expect(text(html)).not.toMatch(/c′ \(kPa\)/);
    expect(html).toContain('data-testid="staged-slice-note"');
  });
});

describe("the status badge of a run signed off below its required FS", () => {
  it("says so in words and shape, not the plain sign-off's green dot", () => {
    const below = renderToStaticMarkup(<StatusBadge status="approved" belowRequired />);
    const plain = renderToStaticMarkup(<StatusBadge status="approved" />);
    expect(text(below)).toContain("▲ Signed off — below the required FS");
    expect(below).toContain('data-status="approved-below"');
    expect(below).not.toContain("moss");
    expect(text(plain)).toContain("● Signed off");
  });
});
