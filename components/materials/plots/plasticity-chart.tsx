import { aLine, uLine, type AtterbergResult } from "@/lib/lab";
import { DataLine, PLOT_COLORS, PlotFrame } from "./plot-frame";

/**
 * The plasticity chart of ASTM D2487 (Fig. 3): the A-line PI = 0.73(LL − 20) from PI 4, the U-line
 * PI = 0.9(LL − 8) from LL 16 (vertical below that), the hatched CL-ML band at PI 4–7, LL = 50, and
 * the sample's point.
 */
export function PlasticityChart({ result }: { result: AtterbergResult }) {
  const llMax = Math.max(100, Math.ceil((result.liquidLimit + 10) / 10) * 10);
  const piMax = Math.max(60, Math.ceil((result.plasticityIndex + 10) / 10) * 10);
  const aStart = 4 / 0.73 + 20;
  const uTop = Math.min(llMax, piMax / 0.9 + 8);
  const aAt = (pi: number) => pi / 0.73 + 20;
  return (
    <PlotFrame
      title="Plasticity chart"
      x={{ domain: [0, llMax], label: "Liquid limit LL (%)" }}
      y={{ domain: [0, piMax], label: "Plasticity index PI (%)" }}
      marks={(sx, sy) => (
        <circle
          cx={sx(result.liquidLimit)}
          cy={sy(result.plasticityIndex)}
          r={5}
          fill={PLOT_COLORS.points}
          stroke="#1f1d1a"
          strokeWidth={1}
        >
          <title>{`LL ${result.liquidLimit} %, PI ${result.plasticityIndex.toFixed(1)} %`}</title>
        </circle>
      )}
    >
      {(sx, sy) => (
        <>
          <polygon
            points={[
              [16, 4],
              [aStart, 4],
              [aAt(7), 7],
              [16, 7],
            ]
              .map(([x, y]) => `${sx(x)},${sy(y)}`)
              .join(" ")}
            fill={PLOT_COLORS.band}
            opacity={0.45}
          />
          <DataLine
            points={[
              [50, 0],
              [50, piMax],
            ]}
            sx={sx}
            sy={sy}
            color={PLOT_COLORS.axis}
            width={1}
          />
          <DataLine
            points={[
              [aStart, 4],
              [llMax, aLine(llMax)],
            ]}
            sx={sx}
            sy={sy}
            color={PLOT_COLORS.line}
          />
          <DataLine
            points={[
              [16, 0],
              [16, uLine(16)],
              [uTop, uLine(uTop)],
            ]}
            sx={sx}
            sy={sy}
            color={PLOT_COLORS.accent}
            dashed
          />
          <text x={sx(llMax) - 4} y={sy(aLine(llMax)) + 12} fontSize={9} textAnchor="end" fill={PLOT_COLORS.line}>
            A-line
          </text>
          <text x={sx(uTop) - 4} y={sy(uLine(uTop)) + 12} fontSize={9} textAnchor="end" fill={PLOT_COLORS.accent}>
            U-line
          </text>
          {[
            ["CL", 38, 22],
            ["CH", 70, 42],
            ["ML", 38, 4],
            ["MH", 75, 12],
            ["CL-ML", 9, 5.5],
          ].map(([t, x, y]) => (
            <text
              key={t as string}
              x={sx(x as number)}
              y={sy(y as number)}
              fontSize={9}
              textAnchor="middle"
              fill={PLOT_COLORS.axis}
            >
              {t}
            </text>
          ))}
        </>
      )}
    </PlotFrame>
  );
}
