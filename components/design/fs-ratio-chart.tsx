import { CASE_STYLES, fsAxis, type SweepCaseKey, type SweepReading } from "@/lib/design";
import { formatTick, linearScale } from "@/lib/scales";

const W = 720;
const H = 340;
const M = { left: 56, right: 24, top: 36, bottom: 44 };
const GRID = "#d9d3c7";
const AXIS = "#7b756c";
const PAPER = "#fffdf8";

/** A marker of the case's own shape, so lines stay apart without colour. */
function CaseMarker({ cx, cy, caseKey, label }: { cx: number; cy: number; caseKey: SweepCaseKey; label: string }) {
  const s = CASE_STYLES[caseKey];
  const paint = { fill: PAPER, stroke: s.colour, strokeWidth: 1.5 };
  const title = <title>{label}</title>;
  if (s.marker === "square")
    return (
      <rect x={cx - 4} y={cy - 4} width={8} height={8} {...paint}>
        {title}
      </rect>
    );
  if (s.marker === "triangle")
    return (
      <path d={`M ${cx} ${cy - 5} L ${cx + 5} ${cy + 4} L ${cx - 5} ${cy + 4} Z`} {...paint}>
        {title}
      </path>
    );
  return (
    <circle cx={cx} cy={cy} r={4} {...paint}>
      {title}
    </circle>
  );
}

/** The points with an FS, in runs broken where a ratio found none, so no line bridges a gap. */
function solvedRuns(points: readonly { ratio: number; fsBishop: number | null }[]) {
  const runs: { ratio: number; fs: number }[][] = [[]];
  for (const p of points) {
    if (p.fsBishop === null) runs.push([]);
    else runs[runs.length - 1].push({ ratio: p.ratio, fs: p.fsBishop });
  }
  return runs.filter((r) => r.length > 0);
}

export interface FsRatioChartProps {
  reading: SweepReading;
}

/** Bishop FS against H:V ratio per face and case, with each case's required FS dashed and n* marked. */
export function FsRatioChart({ reading }: FsRatioChartProps) {
  const ratios = [...new Set(reading.cases.flatMap((c) => c.points.map((p) => p.ratio)))].sort((a, b) => a - b);
  const fsValues = reading.cases.flatMap((c) => c.points.flatMap((p) => (p.fsBishop === null ? [] : [p.fsBishop])));
  const required = reading.cases.map((c) => c.required);
  // Ticks sit exactly at their labelled values (lib/design/fs-axis.ts).
  const axis = fsAxis([...fsValues, ...required]);
  const [bottom, top] = axis.domain;
  const xDomain: [number, number] = ratios.length > 0 ? [ratios[0], ratios[ratios.length - 1]] : [0, 1];
  const sx = linearScale(xDomain, [M.left, W - M.right]);
  const sy = linearScale([bottom, top], [H - M.bottom, M.top]);
  const yTicks = axis.ticks;
  const plotBottom = H - M.bottom;
  return (
    <figure className="panel p-3" data-testid="fs-ratio-chart">
      <ul className="mb-1 flex flex-wrap gap-x-4 gap-y-1 text-xs" aria-hidden="true">
        {reading.cases.map((c) => (
          <li key={c.caseKey} className="flex items-center gap-1">
            <svg width={28} height={10}>
              <line
                x1={0}
                x2={28}
                y1={5}
                y2={5}
                stroke={CASE_STYLES[c.caseKey].colour}
                strokeWidth={2}
                strokeDasharray={CASE_STYLES[c.caseKey].dash || undefined}
              />
            </svg>
            {CASE_STYLES[c.caseKey].short}
          </li>
        ))}
      </ul>
      <svg
        viewBox={`0 0 ${W} ${H}`}
        className="h-auto w-full"
        role="img"
        aria-label="Factor of safety against slope ratio; the table below has the same numbers"
        data-testid="fs-ratio-plot"
      >
        {ratios.map((r) => (
          <g key={`x${r}`}>
            <line x1={sx(r)} x2={sx(r)} y1={M.top} y2={plotBottom} stroke={GRID} strokeDasharray="1 3" />
            <text x={sx(r)} y={plotBottom + 14} fontSize={11} textAnchor="middle" fill={AXIS}>
              {formatTick(r)}
            </text>
          </g>
        ))}
        {yTicks.map((t) => (
          <g key={`y${t}`}>
            <line x1={M.left} x2={W - M.right} y1={sy(t)} y2={sy(t)} stroke={GRID} strokeDasharray="1 3" />
            <text x={M.left - 6} y={sy(t) + 4} fontSize={11} textAnchor="end" fill={AXIS}>
              {t.toFixed(axis.decimals)}
            </text>
          </g>
        ))}
        <rect
          x={M.left}
          y={M.top}
          width={W - M.left - M.right}
          height={plotBottom - M.top}
          fill="none"
          stroke={AXIS}
          strokeWidth={0.8}
        />
        <text x={(M.left + W - M.right) / 2} y={H - 8} fontSize={12} textAnchor="middle" fill="#4a4640">
          Face slope (H:1V)
        </text>
        <text
          x={14}
          y={(M.top + plotBottom) / 2}
          fontSize={12}
          textAnchor="middle"
          fill="#4a4640"
          transform={`rotate(-90 14 ${(M.top + plotBottom) / 2})`}
        >
          Bishop FS
        </text>
        {reading.cases.map((c) => (
          <g key={`req-${c.caseKey}`}>
            <line
              x1={M.left}
              x2={W - M.right}
              y1={sy(c.required)}
              y2={sy(c.required)}
              stroke={CASE_STYLES[c.caseKey].colour}
              strokeDasharray="4 4"
              strokeOpacity={0.8}
            />
            <text
              x={W - M.right - 4}
              y={sy(c.required) - 4}
              fontSize={11}
              textAnchor="end"
              fill={CASE_STYLES[c.caseKey].colour}
            >
              required {c.required.toFixed(2)}
            </text>
          </g>
        ))}
        {(["upstream", "downstream"] as const).map((face) => {
          const n = reading.faces[face].ratio;
          if (n === null) return null;
          return (
            <g key={`n-${face}`}>
              <line x1={sx(n)} x2={sx(n)} y1={M.top} y2={plotBottom} stroke="#1f1d1a" strokeWidth={1.5} />
              <text x={sx(n) + 4} y={face === "upstream" ? M.top + 12 : plotBottom - 6} fontSize={11} fill="#1f1d1a">
                n* {face} {n.toFixed(2)}
              </text>
            </g>
          );
        })}
        {reading.cases.map((c) => {
          const style = CASE_STYLES[c.caseKey];
          return (
            <g key={c.caseKey}>
              {solvedRuns(c.points).map((run) => (
                <polyline
                  key={run[0].ratio}
                  points={run.map((p) => `${sx(p.ratio)},${sy(p.fs)}`).join(" ")}
                  fill="none"
                  stroke={style.colour}
                  strokeWidth={2}
                  strokeDasharray={style.dash || undefined}
                />
              ))}
              {solvedRuns(c.points)
                .flat()
                .map((p) => (
                  <CaseMarker
                    key={p.ratio}
                    cx={sx(p.ratio)}
                    cy={sy(p.fs)}
                    caseKey={c.caseKey}
                    label={`${style.short}: ${p.ratio}H:1V, FS ${p.fs.toFixed(3)}`}
                  />
                ))}
            </g>
          );
        })}
      </svg>
      <figcaption className="mt-1 text-xs text-ink-soft">
        Dashed horizontal lines: the required FS of each case, in the case&apos;s colour. Black verticals: n*, the
        steepest ratio from which every flatter ratio meets its required FS.
      </figcaption>
    </figure>
  );
}
