import type { UndrainedStrengthResult } from "@/lib/lab";
import { niceDomain } from "@/lib/scales";
import { DataLine, DataPoints, PLOT_COLORS, PlotFrame } from "./plot-frame";

/**
 * su against elevation (up the page), with the mean or the fitted line. Tests without a position
 * are drawn against their test number instead.
 */
export function SuProfilePlot({ result }: { result: UndrainedStrengthResult }) {
  const placed = result.points.every((p) => p.elevation !== null);
  const points = result.points.map((p) => ({
    x: p.su,
    y: placed ? (p.elevation as number) : p.index,
    index: p.index,
    specimen: p.specimen,
  }));
  const ys = points.map((p) => p.y);
  const line: [number, number][] =
    result.model === "linear"
      ? [result.line[0], result.line[1]]
      : [
          [result.su, Math.min(...ys)],
          [result.su, Math.max(...ys)],
        ];
  const x = niceDomain([...points.map((p) => p.x), ...line.map((l) => l[0])], { includeZero: true });
  const yDomain = niceDomain([...ys, ...line.map((l) => l[1])]);
  return (
    <PlotFrame
      title="Undrained strength with depth"
      x={{ domain: x, label: "su (kPa)" }}
      y={{ domain: placed ? yDomain : [yDomain[1], yDomain[0]], label: placed ? "Elevation (m)" : "Test number" }}
      marks={(sx, sy) => <DataPoints points={points} sx={sx} sy={sy} />}
    >
      {(sx, sy) => (
        <DataLine points={line} sx={sx} sy={sy} color={PLOT_COLORS.line} dashed={result.model === "constant"} />
      )}
    </PlotFrame>
  );
}
