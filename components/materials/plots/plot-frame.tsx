import { formatTick, linearScale, niceTicks } from "@/lib/scales";
import { clipPolyline } from "@/lib/materials/clip-polyline";

/** Colours of the lab plots (Tol's muted scheme, as the material colours). */
export const PLOT_COLORS = {
  points: "#CC6677",
  line: "#332288",
  second: "#117733",
  band: "#DDCC77",
  accent: "#882255",
  grid: "#d9d3c7",
  axis: "#66605a",
} as const;

/** Data to pixels; `range` is the frame's extent in pixels along the axis, so lines can end on it. */
export type Scale = ((value: number) => number) & { range?: readonly [number, number] };

function frameScale(domain: [number, number], range: [number, number]): Scale {
  return Object.assign(linearScale(domain, range), { range });
}

export interface PlotAxis {
  domain: [number, number];
  label: string;
}

export interface PlotFrameProps {
  /** Read by screen readers: what the plot shows. */
  title: string;
  x: PlotAxis;
  y: PlotAxis;
  width?: number;
  height?: number;
  /** Lines and areas, kept inside the frame. */
  children: (sx: Scale, sy: Scale) => React.ReactNode;
  /** Measured points, drawn over the frame unclipped, so a point on its edge shows whole. */
  marks?: (sx: Scale, sy: Scale) => React.ReactNode;
}

const M = { left: 52, right: 14, top: 12, bottom: 40 };

/** Axes, grid and tick labels of a small plot; the plot's marks are drawn by `children`. */
export function PlotFrame({ title, x, y, width = 380, height = 260, children, marks }: PlotFrameProps) {
  const sx = frameScale(x.domain, [M.left, width - M.right]);
  const sy = frameScale(y.domain, [height - M.bottom, M.top]);
  // A domain may run downward (test numbers down the page), so ticks take its ends in order.
  const xTicks = niceTicks(Math.min(...x.domain), Math.max(...x.domain), 6);
  const yTicks = niceTicks(Math.min(...y.domain), Math.max(...y.domain), 5);
  const clipId = `clip-${title.replace(/[^a-z0-9]+/gi, "-").toLowerCase()}`;
  return (
    <svg
      viewBox={`0 0 ${width} ${height}`}
      overflow="visible"
      className="h-auto w-full max-w-md"
      role="img"
      aria-label={title}
      data-testid="lab-plot"
    >
      <title>{title}</title>
      <defs>
        <clipPath id={clipId}>
          <rect x={M.left} y={M.top} width={width - M.left - M.right} height={height - M.top - M.bottom} />
        </clipPath>
      </defs>
      {xTicks.map((t) => (
        <g key={`x${t}`}>
          <line x1={sx(t)} x2={sx(t)} y1={M.top} y2={height - M.bottom} stroke={PLOT_COLORS.grid} strokeWidth={0.5} />
          <text x={sx(t)} y={height - M.bottom + 13} fontSize={10} textAnchor="middle" fill={PLOT_COLORS.axis}>
            {formatTick(t)}
          </text>
        </g>
      ))}
      {yTicks.map((t) => (
        <g key={`y${t}`}>
          <line x1={M.left} x2={width - M.right} y1={sy(t)} y2={sy(t)} stroke={PLOT_COLORS.grid} strokeWidth={0.5} />
          <text x={M.left - 5} y={sy(t) + 3} fontSize={10} textAnchor="end" fill={PLOT_COLORS.axis}>
            {formatTick(t)}
          </text>
        </g>
      ))}
      <rect
        x={M.left}
        y={M.top}
        width={width - M.left - M.right}
        height={height - M.top - M.bottom}
        fill="none"
        stroke={PLOT_COLORS.axis}
        strokeWidth={0.8}
      />
      <text x={(M.left + width - M.right) / 2} y={height - 6} fontSize={11} textAnchor="middle" fill="#4a4640">
        {x.label}
      </text>
      <text
        x={12}
        y={(M.top + height - M.bottom) / 2}
        fontSize={11}
        textAnchor="middle"
        fill="#4a4640"
        transform={`rotate(-90 12 ${(M.top + height - M.bottom) / 2})`}
      >
        {y.label}
      </text>
      <g clipPath={`url(#${clipId})`}>{children(sx, sy)}</g>
      {marks ? <g>{marks(sx, sy)}</g> : null}
    </svg>
  );
}

/** A polyline through [x, y] pairs in data units. */
export function DataLine({
  points,
  sx,
  sy,
  color,
  dashed = false,
  width = 1.6,
}: {
  points: readonly (readonly [number, number])[];
  sx: Scale;
  sy: Scale;
  color: string;
  dashed?: boolean;
  width?: number;
}) {
  const frame = sx.range && sy.range ? { x0: sx.range[0], x1: sx.range[1], y0: sy.range[0], y1: sy.range[1] } : null;
  const pixels = points.map(([x, y]) => [sx(x), sy(y)] as [number, number]);
  // Cut at the frame itself rather than hidden by the clip path, so the line ends on the frame.
  const pieces = frame ? clipPolyline(pixels, frame) : [pixels];
  return (
    <>
      {pieces.map((piece, i) => (
        <polyline
          key={i}
          points={piece.map(([px, py]) => `${px},${py}`).join(" ")}
          fill="none"
          stroke={color}
          strokeWidth={width}
          strokeDasharray={dashed ? "5 4" : undefined}
        />
      ))}
    </>
  );
}

/** Measured points as open circles, each with a tooltip naming its test. */
export function DataPoints({
  points,
  sx,
  sy,
}: {
  points: readonly { x: number; y: number; index: number; specimen?: string }[];
  sx: Scale;
  sy: Scale;
}) {
  return (
    <>
      {points.map((p) => (
        <circle
          key={p.index}
          cx={sx(p.x)}
          cy={sy(p.y)}
          r={4}
          fill="#fffdf8"
          stroke={PLOT_COLORS.points}
          strokeWidth={2}
        >
          <title>{`test ${p.index}${p.specimen ? ` (${p.specimen})` : ""}: ${formatTick(p.x)}, ${formatTick(p.y)}`}</title>
        </circle>
      ))}
    </>
  );
}
