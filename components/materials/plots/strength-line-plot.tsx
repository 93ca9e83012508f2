import { niceDomain } from "@/lib/scales";
import { DataLine, DataPoints, PLOT_COLORS, PlotFrame } from "./plot-frame";

export interface StrengthLinePlotProps {
  title: string;
  xLabel: string;
  yLabel: string;
  points: readonly { x: number; y: number; index: number; specimen?: string }[];
  /** The fitted line from x = 0 to the largest x tested. */
  line: readonly [readonly [number, number], readonly [number, number]];
  /** A second envelope drawn dashed with square markers, e.g. the total-stress (R) envelope. */
  second?: {
    label: string;
    points: readonly { x: number; y: number }[];
    line: readonly [readonly [number, number], readonly [number, number]];
  };
}

type Line = readonly [readonly [number, number], readonly [number, number]];

/** The line carried on to the right edge of the frame, so an envelope reads across it. */
function extend(line: Line, right: number): [number, number][] {
  const slope = line[1][0] === line[0][0] ? 0 : (line[1][1] - line[0][1]) / (line[1][0] - line[0][0]);
  return [
    [line[0][0], line[0][1]],
    [right, line[0][1] + slope * (right - line[0][0])],
  ];
}

/** Points at failure and the fitted straight line (σn–τ, p'–q or s'–t), with the origin in view. */
export function StrengthLinePlot({ title, xLabel, yLabel, points, line, second }: StrengthLinePlotProps) {
  const more = second ? [...second.points.map((p) => p.x), second.line[1][0]] : [];
  const moreY = second ? [...second.points.map((p) => p.y), second.line[0][1], second.line[1][1]] : [];
  const x = niceDomain([...points.map((p) => p.x), line[1][0], ...more], { includeZero: true });
  const y = niceDomain([...points.map((p) => p.y), line[0][1], line[1][1], ...moreY], { includeZero: true });
  return (
    <div>
      <PlotFrame
        title={title}
        x={{ domain: x, label: xLabel }}
        y={{ domain: y, label: yLabel }}
        marks={(sx, sy) => (
          <>
            <DataPoints points={points} sx={sx} sy={sy} />
            {second
              ? second.points.map((p, i) => (
                  <rect
                    key={i}
                    x={sx(p.x) - 3.5}
                    y={sy(p.y) - 3.5}
                    width={7}
                    height={7}
                    fill="#fffdf8"
                    stroke={PLOT_COLORS.second}
                    strokeWidth={1.5}
                  />
                ))
              : null}
          </>
        )}
      >
        {(sx, sy) => (
          <>
            <DataLine points={extend(line, x[1])} sx={sx} sy={sy} color={PLOT_COLORS.line} />
            {second ? (
              <DataLine points={extend(second.line, x[1])} sx={sx} sy={sy} color={PLOT_COLORS.second} dashed />
            ) : null}
          </>
        )}
      </PlotFrame>
      {second ? (
        <p className="mt-1 text-xs text-ink-faint">
          Solid line and dots: effective stresses. Dashed line and squares: {second.label}.
        </p>
      ) : null}
    </div>
  );
}
