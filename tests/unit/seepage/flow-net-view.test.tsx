/**
 * The read-only flow-net drawing, fed by the command line's output for the invented zoned dam:
 * every layer is drawn, the exits carry their gradients and piping factors, and the caption sets
 * q beside the practitioner's k·ΔH·Nf/Nd.
 */
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, test } from "vitest";
import { FlowNetView } from "@/components/seepage/flow-net-view";
import { runSeepage } from "@/lib/seepage";
import { CAUTION_TEXT } from "@/components/ui/caution";
import { zonedDam } from "./sections";

describe("FlowNetView", () => {
  const doc = zonedDam(1.5);
  const run = runSeepage(doc);
  if (!run.ok) throw new Error(JSON.stringify(run.errors));
  const s = run.solution;
  const html = renderToStaticMarkup(
    <FlowNetView materials={doc.materials as { id: string }[]} regions={doc.regions} solution={s} />,
  );

  test("draws the regions, each equipotential and flow line, and the phreatic surface", () => {
    expect((html.match(/<path[^>]*fill-opacity/g) ?? []).length).toBe(doc.regions.length);
    const contours = s.flowNet.equipotentials.reduce((n, e) => n + e.lines.length, 0);
    expect((html.match(/data-head=/g) ?? []).length).toBe(contours);
    expect(contours).toBeGreaterThan(0);
    expect(html).toContain('data-layer="phreatic"');
    expect(html).toContain('data-layer="flow-lines"');
  });

  test("marks each exit with its gradient and factor against piping, and states q beside k·ΔH·Nf/Nd", () => {
    expect((html.match(/data-exit=/g) ?? []).length).toBe(s.exitGradients.length);
    for (const g of s.exitGradients) expect(html).toContain(`i = ${g.i.toFixed(3)}`);
    expect(html).toContain(`Nf = ${s.flowNet.flowChannels}`);
    expect(html).toContain(`Nd = ${s.flowNet.headDrops}`);
    expect(html).toContain("k·ΔH·Nf/Nd");
    // The zoned dam's water moves mostly through the gravelly shells: the hand check says whose k it uses.
    expect(s.flowNet.kRefMaterial).toBe("shell");
    expect(html).toContain("k of shell");
    expect(html).toContain(CAUTION_TEXT.slice(0, 40));
  });
});
