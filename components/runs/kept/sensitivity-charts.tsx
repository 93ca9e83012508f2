"use client";

import type { TornadoBar } from "@/lib/sensitivity/sensitivity";
import type { SweepStudy } from "@/lib/sensitivity/study";
import { formatTick, linearScale, niceDomain, niceTicks } from "@/lib/scales";

interface SensitivityChartsProps {
  bars: TornadoBar[];
  baseFs: number;
  sweep: SweepStudy | null;
}

const INK = "#1f1d1a";
const CLAY = "#b5562b";
const GRID = "#d9d3c7";
const AXIS = "#66605a";
const W = 520;

/** A horizontal value axis with nice ticks along the bottom of a plot. */
function ValueAxis({ ticks, x, y, top }: { ticks: number[]; x: (v: number) => number; y: number; top: number }) {
  const step = ticks.length > 1 ? ticks[1] - ticks[0] : undefined;
  return (
    <g>
      {ticks.map((t) => (
        <g key={t}>
          <line x1={x(t)} x2={x(t)} y1={top} y2={y} stroke={GRID} strokeDasharray="3 3" />
          <text x={x(t)} y={y + 14} fontSize={11} textAnchor="middle" fill={AXIS}>
            {formatTick(t, step)}
          </text>
        </g>
      ))}
    </g>
  );
}

/** FS ranges per input, largest swing on top, with the kept FS as a dashed line. */
function Tornado({ bars, baseFs }: { bars: TornadoBar[]; baseFs: number }) {
  const rows = bars
    .filter((b) => b.fsLow !== null && b.fsHigh !== null)
    .map((b) => ({ label: b.label, lo: Math.min(b.fsLow!, b.fsHigh!), hi: Math.max(b.fsLow!, b.fsHigh!) }));
  const left = 170;
  const top = 8;
  const rowH = 28;
  const bottom = top + rowH * Math.max(rows.length, 1);
  const domain = niceDomain([baseFs, ...rows.flatMap((r) => [r.lo, r.hi])]);
  const x = linearScale(domain, [left, W - 16]);
  return (
    <figure data-testid="tornado" data-order={JSON.stringify(rows.map((r) => r.label))}>
      <figcaption className="text-xs text-ink-soft">FS when each input moves, largest swing on top</figcaption>
      <svg viewBox={`0 0 ${W} ${bottom + 24}`} className="h-auto w-full" role="img" aria-label="Tornado chart of FS">
        <ValueAxis ticks={niceTicks(domain[0], domain[1], 5)} x={x} y={bottom} top={top} />
        {rows.map((r, i) => (
          <g key={r.label}>
            <text x={left - 6} y={top + i * rowH + rowH / 2 + 4} fontSize={11} textAnchor="end" fill={INK}>
              {r.label}
            </text>
            <rect
              x={x(r.lo)}
              y={top + i * rowH + 5}
              width={Math.max(1, x(r.hi) - x(r.lo))}
              height={rowH - 10}
              fill={CLAY}
            >
              <title>{`${r.label}: FS ${r.lo.toFixed(3)} to ${r.hi.toFixed(3)}`}</title>
            </rect>
          </g>
        ))}
        <line x1={x(baseFs)} x2={x(baseFs)} y1={top} y2={bottom} stroke={INK} strokeDasharray="4 3" />
        <text x={x(baseFs) + 3} y={top + 9} fontSize={10} fill={INK}>
          kept {baseFs.toFixed(3)}
        </text>
      </svg>
    </figure>
  );
}

/** FS along one input over its range, with the required FS and where it is reached. */
function FsLine({ sweep }: { sweep: SweepStudy }) {
  const points = sweep.points.filter((p): p is typeof p & { fs: number } => p.fs !== null);
  const H = 240;
  const m = { left: 48, right: 16, top: 10, bottom: 28 };
  const xs = points.map((p) => p.x);
  const xDomain: [number, number] = xs.length > 0 ? [Math.min(...xs), Math.max(...xs)] : [0, 1];
  const yDomain = niceDomain([sweep.requiredFs, ...points.map((p) => p.fs)]);
  const x = linearScale(xDomain, [m.left, W - m.right]);
  const y = linearScale(yDomain, [H - m.bottom, m.top]);
  const yTicks = niceTicks(yDomain[0], yDomain[1], 5);
  const yStep = yTicks.length > 1 ? yTicks[1] - yTicks[0] : undefined;
  return (
    <figure data-testid="fs-line" data-crossing={sweep.crossing ?? ""}>
      <figcaption className="text-xs text-ink-soft">
        FS along {sweep.label}
        {sweep.crossing !== null
          ? `: FS reaches ${sweep.requiredFs.toFixed(2)} at ${sweep.crossing.toFixed(2)} ${sweep.unit}`
          : `: FS does not reach ${sweep.requiredFs.toFixed(2)} in this range`}
      </figcaption>
      <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full" role="img" aria-label={`FS along ${sweep.label}`}>
        <ValueAxis ticks={niceTicks(xDomain[0], xDomain[1], 6)} x={x} y={H - m.bottom} top={m.top} />
        {yTicks.map((t) => (
          <g key={t}>
            <line x1={m.left} x2={W - m.right} y1={y(t)} y2={y(t)} stroke={GRID} strokeDasharray="3 3" />
            <text x={m.left - 6} y={y(t) + 4} fontSize={11} textAnchor="end" fill={AXIS}>
              {formatTick(t, yStep)}
            </text>
          </g>
        ))}
        <line
          x1={m.left}
          x2={W - m.right}
          y1={y(sweep.requiredFs)}
          y2={y(sweep.requiredFs)}
          stroke={INK}
          strokeDasharray="6 3"
        />
        <text x={W - m.right - 4} y={y(sweep.requiredFs) - 4} fontSize={10} textAnchor="end" fill={INK}>
          required {sweep.requiredFs.toFixed(2)}
        </text>
        {sweep.crossing !== null ? (
          <line
            x1={x(sweep.crossing)}
            x2={x(sweep.crossing)}
            y1={m.top}
            y2={H - m.bottom}
            stroke={CLAY}
            strokeDasharray="2 3"
          />
        ) : null}
        <polyline points={points.map((p) => `${x(p.x)},${y(p.fs)}`).join(" ")} fill="none" stroke={CLAY} />
        {points.map((p) => (
          <circle key={p.x} cx={x(p.x)} cy={y(p.fs)} r={3} fill={CLAY}>
            <title>{`${p.x.toFixed(2)} ${sweep.unit}: FS ${p.fs.toFixed(3)}`}</title>
          </circle>
        ))}
      </svg>
    </figure>
  );
}

/** The tornado (largest swing on top) and FS along one input with the required FS drawn across. */
export function SensitivityCharts({ bars, baseFs, sweep }: SensitivityChartsProps) {
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <Tornado bars={bars} baseFs={baseFs} />
      {sweep ? <FsLine sweep={sweep} /> : null}
    </div>
  );
}
