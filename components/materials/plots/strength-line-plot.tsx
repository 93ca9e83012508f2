import { niceDomain } from "@/lib/scales";
import { DataLine, DataPoints, PLOT_COLORS, PlotFrame } from "./plot-frame";

export interface StrengthLinePlotProps {
  title: string;
  xLabel: string;
  yLabel: string;
  points: readonly { x: number; y: number; index: number; specimen?: string }[];
  /** The fitted line from x = 0 to the largest x tested. */
  line: readonly [readonly [number, number], readonly [number, number]];
}

/** Points at failure and the fitted straight line (σn–τ, p'–q or s'–t), with the origin in view. */
export function StrengthLinePlot({ title, xLabel, yLabel, points, line }: StrengthLinePlotProps) {
  const x = niceDomain([...points.map((p) => p.x), line[1][0]], { includeZero: true });
  const y = niceDomain([...points.map((p) => p.y), line[0][1], line[1][1]], { includeZero: true });
  // Extend the line to the plot's right edge so the envelope reads across the whole frame.
  const slope = line[1][0] === line[0][0] ? 0 : (line[1][1] - line[0][1]) / (line[1][0] - line[0][0]);
  const extended: [number, number][] = [
    [line[0][0], line[0][1]],
    [x[1], line[0][1] + slope * (x[1] - line[0][0])],
  ];
  return (
    <PlotFrame title={title} x={{ domain: x, label: xLabel }} y={{ domain: y, label: yLabel }}>
      {(sx, sy) => (
        <>
          <DataLine points={extended} sx={sx} sy={sy} color={PLOT_COLORS.line} />
          <DataPoints points={points} sx={sx} sy={sy} />
        </>
      )}
    </PlotFrame>
  );
}
