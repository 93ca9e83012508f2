"use client";

import {
  Bar,
  BarChart,
  CartesianGrid,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import type { TornadoBar } from "@/lib/sensitivity/sensitivity";
import type { SweepStudy } from "@/lib/sensitivity/study";

interface SensitivityChartsProps {
  bars: TornadoBar[];
  baseFs: number;
  sweep: SweepStudy | null;
}

const INK = "#1f1d1a";
const CLAY = "#b5562b";

/** The tornado (largest swing on top) and FS along one input with the required FS drawn across. */
export function SensitivityCharts({ bars, baseFs, sweep }: SensitivityChartsProps) {
  const rows = bars
    .filter((b) => b.fsLow !== null && b.fsHigh !== null)
    .map((b) => ({
      label: b.label,
      range: [Math.min(b.fsLow!, b.fsHigh!), Math.max(b.fsLow!, b.fsHigh!)] as [number, number],
      swing: b.swing,
    }));
  const line = sweep?.points.filter((p) => p.fs !== null) ?? [];
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <figure data-testid="tornado" data-order={JSON.stringify(rows.map((r) => r.label))}>
        <figcaption className="text-xs text-ink-soft">FS when each input moves, largest swing on top</figcaption>
        <ResponsiveContainer width="100%" height={Math.max(160, 28 * rows.length + 50)}>
          <BarChart data={rows} layout="vertical" margin={{ left: 8, right: 16, top: 8, bottom: 8 }}>
            <CartesianGrid strokeDasharray="3 3" horizontal={false} />
            <XAxis type="number" domain={["auto", "auto"]} tickFormatter={(v: number) => v.toFixed(2)} />
            <YAxis type="category" dataKey="label" width={170} tick={{ fontSize: 11 }} />
            <Tooltip
              formatter={(v) => (Array.isArray(v) ? v.map((x) => Number(x).toFixed(3)).join(" to ") : String(v))}
            />
            <ReferenceLine x={baseFs} stroke={INK} strokeDasharray="4 3" label={{ value: "kept", fontSize: 10 }} />
            <Bar dataKey="range" fill={CLAY} isAnimationActive={false} />
          </BarChart>
        </ResponsiveContainer>
      </figure>
      {sweep ? (
        <figure data-testid="fs-line" data-crossing={sweep.crossing ?? ""}>
          <figcaption className="text-xs text-ink-soft">
            FS along {sweep.label}
            {sweep.crossing !== null
              ? `: FS reaches ${sweep.requiredFs.toFixed(2)} at ${sweep.crossing.toFixed(2)} ${sweep.unit}`
              : `: FS does not reach ${sweep.requiredFs.toFixed(2)} in this range`}
          </figcaption>
          <ResponsiveContainer width="100%" height={240}>
            <LineChart data={line} margin={{ left: 8, right: 16, top: 8, bottom: 8 }}>
              <CartesianGrid strokeDasharray="3 3" />
              <XAxis
                type="number"
                dataKey="x"
                domain={["dataMin", "dataMax"]}
                tickFormatter={(v: number) => v.toFixed(1)}
              />
              <YAxis domain={["auto", "auto"]} tickFormatter={(v: number) => v.toFixed(2)} />
              <Tooltip formatter={(v) => Number(v).toFixed(3)} />
              <ReferenceLine
                y={sweep.requiredFs}
                stroke={INK}
                strokeDasharray="6 3"
                label={{ value: "required", fontSize: 10 }}
              />
              {sweep.crossing !== null ? (
                <ReferenceLine x={sweep.crossing} stroke={CLAY} strokeDasharray="2 3" />
              ) : null}
              <Line type="linear" dataKey="fs" stroke={CLAY} dot isAnimationActive={false} />
            </LineChart>
          </ResponsiveContainer>
        </figure>
      ) : null}
    </div>
  );
}
