import type { CompactionResult } from "@/lib/lab";
import { formatTick, niceDomain } from "@/lib/scales";
import { clipPolyline } from "@/lib/materials/clip-polyline";
import { DataLine, DataPoints, PLOT_COLORS, PlotFrame } from "./plot-frame";

/**
 * Dry density against moisture content: the points, the fitted curve, the zero-air-voids line and
 * the acceptance window (moisture between the two limits, density at or above the chosen percentage).
 */
export function CompactionPlot({ result }: { result: CompactionResult }) {
  const { acceptance } = result;
  const x = niceDomain([...result.curve.map((c) => c[0]), ...result.points.map((p) => p.x)]);
  // The zero-air-voids line climbs steeply on the dry side; the frame follows the test data instead.
  const y = niceDomain([...result.points.map((p) => p.y), result.maxDryDensity, acceptance.dryDensity], { count: 4 });
  // The zero-air-voids curve inside the chart's range only; its label sits at the curve's top end in view.
  const zav = clipPolyline(result.zeroAirVoids, { x0: x[0], x1: x[1], y0: y[0], y1: y[1] });
  const zavEnd = zav.flat().reduce<[number, number] | null>((top, p) => (!top || p[1] > top[1] ? p : top), null);
  return (
    <PlotFrame
      title="Compaction curve"
      x={{ domain: x, label: "Moisture content w (%)" }}
      y={{ domain: y, label: "Dry density ρd (Mg/m³)" }}
      marks={(sx, sy) => <DataPoints points={result.points} sx={sx} sy={sy} />}
    >
      {(sx, sy) => {
        const left = sx(acceptance.dryLimit.moistureContent);
        const right = sx(acceptance.wetLimit.moistureContent);
        return (
          <>
            <rect
              x={left}
              y={sy(y[1])}
              width={Math.max(0, right - left)}
              height={Math.max(0, sy(acceptance.dryDensity) - sy(y[1]))}
              fill={PLOT_COLORS.band}
              opacity={0.35}
            >
              <title>{`Acceptance window: ${formatTick(acceptance.percent)} % of the maximum dry density, w ${acceptance.dryLimit.moistureContent.toFixed(1)}–${acceptance.wetLimit.moistureContent.toFixed(1)} %`}</title>
            </rect>
            <DataLine
              points={[
                [x[0], acceptance.dryDensity],
                [x[1], acceptance.dryDensity],
              ]}
              sx={sx}
              sy={sy}
              color={PLOT_COLORS.band}
              dashed
              width={1.2}
            />
            {zav.map((piece, i) => (
              <DataLine key={i} points={piece} sx={sx} sy={sy} color={PLOT_COLORS.second} dashed />
            ))}
            <DataLine points={result.curve} sx={sx} sy={sy} color={PLOT_COLORS.line} />
            <line
              x1={sx(result.optimumMoistureContent)}
              x2={sx(result.optimumMoistureContent)}
              y1={sy(y[0])}
              y2={sy(result.maxDryDensity)}
              stroke={PLOT_COLORS.accent}
              strokeDasharray="2 3"
            />
            {zavEnd ? (
              <text
                x={Math.min(sx(zavEnd[0]) + 4, sx(x[1]) - 4)}
                y={sy(zavEnd[1]) + 12}
                fontSize={9}
                textAnchor={sx(zavEnd[0]) > (sx(x[0]) + sx(x[1])) / 2 ? "end" : "start"}
                fill={PLOT_COLORS.second}
              >
                zero air voids, Gs {result.specificGravity}
              </text>
            ) : null}
          </>
        );
      }}
    </PlotFrame>
  );
}
