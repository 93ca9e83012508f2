"use client";

import { CASE_STYLES, sweepCase, type SweepPoint, type SweepReading } from "@/lib/design";
import { formatCount } from "@/lib/format";

export interface SweepTableProps {
  reading: SweepReading;
  recheck: SweepPoint[];
  crestLength: number;
  canOpen: boolean;
  busyPoint: string | null;
  onOpen: (point: SweepPoint, target: "run" | "editor") => void;
}

const f3 = (v: number | null) => (v === null ? "–" : v.toFixed(3));

function PointRow({
  point,
  required,
  steepest,
  crestLength,
  canOpen,
  busy,
  onOpen,
}: {
  point: SweepPoint;
  required: number;
  steepest: number | null;
  crestLength: number;
  canOpen: boolean;
  busy: boolean;
  onOpen: SweepTableProps["onOpen"];
}) {
  const pass = point.fsBishop !== null && point.fsBishop >= required;
  const isStar = steepest !== null && point.ratio === steepest;
  return (
    <tr
      className={`border-t border-rule ${isStar ? "bg-clay-50 font-medium" : ""}`}
      data-testid="sweep-row"
      data-case={point.caseKey}
      data-ratio={point.ratio}
      data-fs={point.fsBishop ?? ""}
    >
      <td className="px-2 py-1 tabular-nums">
        {point.ratio.toFixed(2)}
        {isStar ? " (n*)" : ""}
      </td>
      <td className="px-2 py-1 text-right tabular-nums">{f3(point.fsBishop)}</td>
      <td className="px-2 py-1 text-right tabular-nums">{f3(point.fsOrdinary)}</td>
      <td className="px-2 py-1 text-right tabular-nums">
        {point.resolution === null ? "–" : `±${point.resolution.toFixed(3)}`}
      </td>
      <td className="px-2 py-1">
        {point.error ? (
          <span className="text-alarm-700">{point.error}</span>
        ) : point.gridEdge ? (
          <span className="text-alarm-700">? minimum on the grid&apos;s edge</span>
        ) : pass ? (
          <span className="text-moss-700">✓ meets {required.toFixed(2)}</span>
        ) : (
          <span className="text-alarm-700">✗ below {required.toFixed(2)}</span>
        )}
      </td>
      <td className="px-2 py-1 text-right tabular-nums">{point.fillArea.toFixed(1)}</td>
      <td className="px-2 py-1 text-right tabular-nums">{formatCount(Math.round(point.fillArea * crestLength))}</td>
      <td className="px-2 py-1 text-xs tabular-nums">
        {point.circle
          ? `(${point.circle.xc.toFixed(1)}, ${point.circle.yc.toFixed(1)}) R ${point.circle.r.toFixed(1)}`
          : "–"}
      </td>
      <td className="px-2 py-1 text-xs" data-testid="sweep-warnings">
        <PointNotes point={point} />
      </td>
      <td className="px-2 py-1 whitespace-nowrap">
        {canOpen ? (
          <>
            <button
              type="button"
              className="btn-quiet px-2 py-0.5 text-xs"
              disabled={busy || point.fsBishop === null}
              onClick={() => onOpen(point, "run")}
              aria-label={`Open ${sweepCase(point.caseKey).label} at ${point.ratio.toFixed(2)}:1 as a saved run`}
            >
              Open as run
            </button>{" "}
            <button
              type="button"
              className="btn-quiet px-2 py-0.5 text-xs"
              disabled={busy}
              onClick={() => onOpen(point, "editor")}
              aria-label={`Open the section at ${point.ratio.toFixed(2)}:1 in the editor`}
            >
              Editor
            </button>
          </>
        ) : null}
      </td>
    </tr>
  );
}

/** A point's search notes in words: the grid's moves, an unsettled edge minimum, then the engine's warnings. */
function PointNotes({ point }: { point: SweepPoint }) {
  const notes: { text: string; alarm: boolean }[] = [];
  if (point.gridEdge)
    notes.push({
      text: `Minimum still on the grid's edge after ${point.gridMoves} moves: not counted as meeting the required FS.`,
      alarm: true,
    });
  else if (point.gridMoves > 0)
    notes.push({
      text:
        "Minimum on the grid's edge: the grid was moved toward it and searched again" +
        `${point.gridMoves > 1 ? ` (${point.gridMoves} times)` : ""}; the FS shown is the lowest found.`,
      alarm: false,
    });
  for (const w of point.warnings) notes.push({ text: w, alarm: false });
  if (notes.length === 0) return null;
  return (
    <ul className="max-w-md space-y-0.5">
      {notes.map((n, i) => (
        <li key={i} className={n.alarm ? "text-alarm-700" : "text-ink-soft"}>
          {n.text}
        </li>
      ))}
    </ul>
  );
}

/** Every point of the sweep, one table per case, the recommended ratio highlighted. */
export function SweepTable({ reading, recheck, crestLength, canOpen, busyPoint, onOpen }: SweepTableProps) {
  return (
    <div className="space-y-4" data-testid="sweep-table">
      {reading.cases.map((c) => (
        <div key={c.caseKey} className="panel overflow-x-auto">
          <table className="w-full text-sm">
            <caption className="px-3 py-2 text-left font-semibold">
              <span aria-hidden style={{ color: CASE_STYLES[c.caseKey].colour }}>
                {CASE_STYLES[c.caseKey].marker === "circle"
                  ? "●"
                  : CASE_STYLES[c.caseKey].marker === "square"
                    ? "■"
                    : "▲"}{" "}
              </span>
              {sweepCase(c.caseKey).label}: required FS {c.required.toFixed(2)}, n* ={" "}
              {c.steepest === null ? "none in the range" : `${c.steepest.toFixed(2)}:1`}
            </caption>
            <thead className="bg-paper-sunk text-xs uppercase tracking-wide text-ink-soft">
              <tr>
                <th scope="col" className="px-2 py-1 text-left">
                  H:1V
                </th>
                <th scope="col" className="px-2 py-1 text-right">
                  Bishop FS
                </th>
                <th scope="col" className="px-2 py-1 text-right">
                  Ordinary FS
                </th>
                <th scope="col" className="px-2 py-1 text-right">
                  Grid step
                </th>
                <th scope="col" className="px-2 py-1 text-left">
                  Against required
                </th>
                <th scope="col" className="px-2 py-1 text-right">
                  Fill m³/m
                </th>
                <th scope="col" className="px-2 py-1 text-right">
                  Fill m³ ({crestLength} m)
                </th>
                <th scope="col" className="px-2 py-1 text-left">
                  Critical circle (m)
                </th>
                <th scope="col" className="px-2 py-1 text-left">
                  Notes
                </th>
                <th scope="col" className="px-2 py-1">
                  <span className="sr-only">Open</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {c.points.map((p) => (
                <PointRow
                  key={p.id}
                  point={p}
                  required={c.required}
                  steepest={c.steepest}
                  crestLength={crestLength}
                  canOpen={canOpen}
                  busy={busyPoint !== null}
                  onOpen={onOpen}
                />
              ))}
              {recheck
                .filter((p) => p.caseKey === c.caseKey)
                .map((p) => (
                  <tr
                    key={p.id}
                    className="border-t-2 border-rule bg-paper-sunk/50"
                    data-testid="recheck-row"
                    data-case={p.caseKey}
                  >
                    <td className="px-2 py-1 text-xs" colSpan={1}>
                      Pair {p.upstreamRatio.toFixed(2)} / {p.downstreamRatio.toFixed(2)}
                    </td>
                    <td className="px-2 py-1 text-right tabular-nums">{f3(p.fsBishop)}</td>
                    <td className="px-2 py-1 text-right tabular-nums">{f3(p.fsOrdinary)}</td>
                    <td className="px-2 py-1 text-right tabular-nums">
                      {p.resolution === null ? "–" : `±${p.resolution.toFixed(3)}`}
                    </td>
                    <td className="px-2 py-1">
                      {p.fsBishop !== null && p.fsBishop >= c.required ? (
                        <span className="text-moss-700">✓ pair meets {c.required.toFixed(2)}</span>
                      ) : (
                        <span className="text-alarm-700">✗ pair below {c.required.toFixed(2)}</span>
                      )}
                    </td>
                    <td className="px-2 py-1 text-right tabular-nums">{p.fillArea.toFixed(1)}</td>
                    <td className="px-2 py-1 text-right tabular-nums">
                      {formatCount(Math.round(p.fillArea * crestLength))}
                    </td>
                    <td className="px-2 py-1 text-xs tabular-nums">
                      {p.circle
                        ? `(${p.circle.xc.toFixed(1)}, ${p.circle.yc.toFixed(1)}) R ${p.circle.r.toFixed(1)}`
                        : "–"}
                    </td>
                    <td className="px-2 py-1 text-xs">recheck of the pair</td>
                    <td className="px-2 py-1 whitespace-nowrap">
                      {canOpen ? (
                        <button
                          type="button"
                          className="btn-quiet px-2 py-0.5 text-xs"
                          disabled={busyPoint !== null || p.fsBishop === null}
                          onClick={() => onOpen(p, "run")}
                        >
                          Open as run
                        </button>
                      ) : null}
                    </td>
                  </tr>
                ))}
            </tbody>
          </table>
        </div>
      ))}
    </div>
  );
}
