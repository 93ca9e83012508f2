"use client";

import { useEffect, useState } from "react";
import {
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import { CASE_STYLES, SWEEP_CASES, fsAxis, type SweepCaseKey, type SweepReading } from "@/lib/design";

interface MarkerProps {
  cx?: number;
  cy?: number;
  caseKey: SweepCaseKey;
}

/** A marker of the case's own shape, so lines stay apart without colour. */
function CaseMarker({ cx, cy, caseKey }: MarkerProps) {
  if (cx === undefined || cy === undefined || !Number.isFinite(cx) || !Number.isFinite(cy)) return null;
  const s = CASE_STYLES[caseKey];
  if (s.marker === "square")
    return <rect x={cx - 4} y={cy - 4} width={8} height={8} fill="#fffdf8" stroke={s.colour} strokeWidth={1.5} />;
  if (s.marker === "triangle")
    return (
      <path
        d={`M ${cx} ${cy - 5} L ${cx + 5} ${cy + 4} L ${cx - 5} ${cy + 4} Z`}
        fill="#fffdf8"
        stroke={s.colour}
        strokeWidth={1.5}
      />
    );
  return <circle cx={cx} cy={cy} r={4} fill="#fffdf8" stroke={s.colour} strokeWidth={1.5} />;
}

export interface FsRatioChartProps {
  reading: SweepReading;
}

/** Bishop FS against H:V ratio per face and case, with each case's required FS dashed and n* marked. */
export function FsRatioChart({ reading }: FsRatioChartProps) {
  // The chart measures its container, which only exists in the browser.
  const [mounted, setMounted] = useState(false);
  useEffect(() => setMounted(true), []);
  const ratios = [...new Set(reading.cases.flatMap((c) => c.points.map((p) => p.ratio)))].sort((a, b) => a - b);
  const rows = ratios.map((ratio) => {
    const row: Record<string, number | null> = { ratio };
    for (const c of reading.cases) row[c.caseKey] = c.points.find((p) => p.ratio === ratio)?.fsBishop ?? null;
    return row;
  });
  const fsValues = rows.flatMap((r) => SWEEP_CASES.map((c) => r[c.key])).filter((v): v is number => v !== null);
  const axis = fsAxis([...fsValues, ...reading.cases.map((c) => c.required)]);
  return (
    <figure
      className="panel p-3"
      data-testid="fs-ratio-chart"
      aria-label="Factor of safety against slope ratio; the table below has the same numbers"
    >
      <div style={{ height: 340 }}>
        {mounted ? (
          <ResponsiveContainer width="100%" height="100%">
            <LineChart data={rows} margin={{ top: 10, right: 24, bottom: 24, left: 8 }}>
              <CartesianGrid stroke="#d9d3c7" strokeDasharray="1 3" />
              <XAxis
                dataKey="ratio"
                type="number"
                domain={["dataMin", "dataMax"]}
                ticks={ratios}
                tickFormatter={(v: number) => `${v}`}
                label={{ value: "Face slope (H:1V)", position: "insideBottom", offset: -12 }}
              />
              <YAxis
                domain={axis.domain}
                ticks={axis.ticks}
                interval={0}
                allowDecimals
                tickFormatter={(v: number) => v.toFixed(axis.decimals)}
                label={{ value: "Bishop FS", angle: -90, position: "insideLeft" }}
              />
              <Tooltip
                formatter={(v) => (typeof v === "number" ? v.toFixed(3) : String(v))}
                labelFormatter={(v) => `${v}H:1V`}
              />
              <Legend verticalAlign="top" height={28} />
              {reading.cases.map((c) => (
                <ReferenceLine
                  key={`req-${c.caseKey}`}
                  y={c.required}
                  stroke={CASE_STYLES[c.caseKey].colour}
                  strokeDasharray="4 4"
                  strokeOpacity={0.8}
                  label={{
                    value: `required ${c.required.toFixed(2)}`,
                    position: "insideTopRight",
                    fontSize: 11,
                    fill: CASE_STYLES[c.caseKey].colour,
                  }}
                />
              ))}
              {(["upstream", "downstream"] as const).map((face) => {
                const n = reading.faces[face].ratio;
                return n === null ? null : (
                  <ReferenceLine
                    key={`n-${face}`}
                    x={n}
                    stroke="#1f1d1a"
                    strokeWidth={1.5}
                    label={{
                      value: `n* ${face} ${n.toFixed(2)}`,
                      position: face === "upstream" ? "insideTopLeft" : "insideBottomLeft",
                      fontSize: 11,
                    }}
                  />
                );
              })}
              {SWEEP_CASES.map((c) => (
                <Line
                  key={c.key}
                  dataKey={c.key}
                  name={CASE_STYLES[c.key].short}
                  stroke={CASE_STYLES[c.key].colour}
                  strokeDasharray={CASE_STYLES[c.key].dash}
                  strokeWidth={2}
                  isAnimationActive={false}
                  connectNulls={false}
                  dot={(props: { cx?: number; cy?: number; index?: number }) => (
                    <CaseMarker key={`${c.key}-${props.index}`} cx={props.cx} cy={props.cy} caseKey={c.key} />
                  )}
                />
              ))}
            </LineChart>
          </ResponsiveContainer>
        ) : null}
      </div>
      <figcaption className="mt-1 text-xs text-ink-soft">
        Dashed horizontal lines: the required FS of each case, in the case&apos;s colour. Black verticals: n*, the
        steepest ratio from which every flatter ratio meets its required FS.
      </figcaption>
    </figure>
  );
}
