"use client";

import type { MethodProbabilistic } from "@/lib/stability";
import { formatTick, linearScale, niceDomain, niceTicks, type Scale } from "@/lib/scales";

const INK = "#1f1d1a";
const CLAY = "#b5562b";
const GRID = "#d9d3c7";
const AXIS = "#66605a";
const W = 360;
const H = 200;
const M = { left: 44, right: 10, top: 10, bottom: 30 };

/** Gridlines and labels of both axes of one small plot. */
function Axes(p: {
  x: Scale;
  y: Scale;
  xTicks: number[];
  yTicks: number[];
  xLabel: string;
  xFormat?: (v: number) => string;
}) {
  const ys = p.yTicks.length > 1 ? p.yTicks[1] - p.yTicks[0] : undefined;
  const xs = p.xTicks.length > 1 ? p.xTicks[1] - p.xTicks[0] : undefined;
  return (
    <g fontSize={10} fill={AXIS}>
      {p.yTicks.map((t) => (
        <g key={`y${t}`}>
          <line x1={M.left} x2={W - M.right} y1={p.y(t)} y2={p.y(t)} stroke={GRID} strokeDasharray="3 3" />
          <text x={M.left - 4} y={p.y(t) + 3} textAnchor="end">
            {formatTick(t, ys)}
          </text>
        </g>
      ))}
      {p.xTicks.map((t) => (
        <text key={`x${t}`} x={p.x(t)} y={H - M.bottom + 13} textAnchor="middle">
          {p.xFormat ? p.xFormat(t) : formatTick(t, xs)}
        </text>
      ))}
      <text x={(M.left + W - M.right) / 2} y={H - 4} textAnchor="middle" fill={INK}>
        {p.xLabel}
      </text>
    </g>
  );
}

/** A dashed vertical line at FS = 1, where failure starts. */
function FailureLine({ x }: { x: Scale }) {
  return (
    <g>
      <line x1={x(1)} x2={x(1)} y1={M.top} y2={H - M.bottom} stroke={INK} strokeDasharray="5 3" />
      <text x={x(1) + 3} y={M.top + 9} fontSize={10} fill={INK}>
        FS = 1
      </text>
    </g>
  );
}

function Histogram({ s }: { s: MethodProbabilistic }) {
  const { min, binWidth, counts } = s.histogram;
  const hi = min + binWidth * counts.length;
  const dom = niceDomain([Math.min(min, 1), Math.max(hi, 1)]);
  const x = linearScale(dom, [M.left, W - M.right]);
  const top = Math.max(1, ...counts);
  const y = linearScale([0, top], [H - M.bottom, M.top]);
  return (
    <figure data-testid="scatter-histogram">
      <figcaption className="text-xs text-ink-soft">
        How the sampled FS spread ({s.valid.toLocaleString("en-US")} samples)
      </figcaption>
      <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full" role="img" aria-label="Histogram of sampled FS">
        <Axes
          x={x}
          y={y}
          xTicks={niceTicks(dom[0], dom[1], 5)}
          yTicks={niceTicks(0, top, 4)}
          xLabel="factor of safety"
        />
        {counts.map((c, i) => {
          const x0 = x(min + i * binWidth);
          const x1 = x(min + (i + 1) * binWidth);
          return (
            <rect key={i} x={x0} y={y(c)} width={Math.max(0.5, x1 - x0 - 0.5)} height={y(0) - y(c)} fill={CLAY}>
              <title>{`FS ${(min + i * binWidth).toFixed(3)}–${(min + (i + 1) * binWidth).toFixed(3)}: ${c}`}</title>
            </rect>
          );
        })}
        <FailureLine x={x} />
      </svg>
    </figure>
  );
}

function Cdf({ s }: { s: MethodProbabilistic }) {
  const fs = s.cdf.map((p) => p[0]);
  const dom = niceDomain([Math.min(1, ...fs), Math.max(1, ...fs)]);
  const x = linearScale(dom, [M.left, W - M.right]);
  const y = linearScale([0, 1], [H - M.bottom, M.top]);
  return (
    <figure data-testid="scatter-cdf">
      <figcaption className="text-xs text-ink-soft">Share of samples at or below each FS</figcaption>
      <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full" role="img" aria-label="Cumulative distribution of FS">
        <Axes
          x={x}
          y={y}
          xTicks={niceTicks(dom[0], dom[1], 5)}
          yTicks={[0, 0.25, 0.5, 0.75, 1]}
          xLabel="factor of safety"
        />
        <polyline
          points={s.cdf.map(([f, p]) => `${x(f)},${y(p)}`).join(" ")}
          fill="none"
          stroke={CLAY}
          strokeWidth={1.5}
        />
        <FailureLine x={x} />
      </svg>
    </figure>
  );
}

function Convergence({ s }: { s: MethodProbabilistic }) {
  const pts = s.convergence.filter(([n]) => n > 0);
  const nMax = Math.max(10, ...pts.map(([n]) => n));
  const lx = linearScale([0, Math.log10(nMax)], [M.left, W - M.right]);
  const x = (n: number) => lx(Math.log10(Math.max(1, n)));
  const pMax = Math.max(1e-3, ...pts.map(([, p]) => p));
  const dom = niceDomain([0, pMax]);
  const y = linearScale(dom, [H - M.bottom, M.top]);
  const decades = Array.from({ length: Math.floor(Math.log10(nMax)) + 1 }, (_, i) => 10 ** i);
  return (
    <figure data-testid="scatter-convergence">
      <figcaption className="text-xs text-ink-soft">
        pf as the samples add up (settles when enough are drawn)
      </figcaption>
      <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full" role="img" aria-label="pf against the number of samples">
        <Axes
          x={x}
          y={y}
          xTicks={decades}
          yTicks={niceTicks(dom[0], dom[1], 4)}
          xLabel="samples (log scale)"
          xFormat={(v) => v.toLocaleString("en-US")}
        />
        <polyline
          points={pts.map(([n, p]) => `${x(n)},${y(p)}`).join(" ")}
          fill="none"
          stroke={CLAY}
          strokeWidth={1.5}
        />
      </svg>
    </figure>
  );
}

/** Histogram, cumulative distribution and pf convergence of one method's samples, in the project's own SVG. */
export function ScatterStudyCharts({ s }: { s: MethodProbabilistic }) {
  if (s.valid === 0) return null;
  return (
    <div className="grid gap-4 md:grid-cols-3">
      <Histogram s={s} />
      <Cdf s={s} />
      <Convergence s={s} />
    </div>
  );
}
