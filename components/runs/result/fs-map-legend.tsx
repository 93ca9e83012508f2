import { buildFsLegend } from "@/lib/runs/view/fs-legend";
import type { FsRange } from "@/lib/runs/view/fs-map-cells";
import { METHOD_NAME } from "@/lib/runs/view/warning-text";

export interface FsMapLegendProps {
  range: FsRange;
  method: "bishop" | "fellenius";
  requiredFs?: number;
}

const BAR_W = 280;
const BAR_H = 12;

/**
 * Colour bar of the FS map: lowest FS on the left (dark), rising to the right (light), with
 * tick values, the required FS marked by a notch and a word, and the swatch of empty cells.
 */
export function FsMapLegend({ range, method, requiredFs }: FsMapLegendProps) {
  const legend = buildFsLegend(range, requiredFs);
  const gradientId = `fs-bar-${method}`;
  const req = legend.required;
  return (
    <div className="flex flex-wrap items-end gap-x-6 gap-y-2 text-xs text-ink-soft" data-testid="fs-map-legend">
      <div>
        <p className="mb-1 font-medium text-ink">Lowest FS from each centre, {METHOD_NAME[method]}</p>
        <svg
          width={BAR_W + 40}
          height={BAR_H + 34}
          role="img"
          aria-label={`Colour scale from FS ${legend.lowLabel} (dark) to ${legend.highLabel} (light)`}
        >
          <defs>
            <linearGradient id={gradientId} x1="0" x2="1" y1="0" y2="0">
              {legend.gradient.map((g) => (
                <stop key={g.offset} offset={g.offset} stopColor={g.colour} />
              ))}
            </linearGradient>
          </defs>
          <g transform="translate(20, 14)">
            <rect width={BAR_W} height={BAR_H} fill={`url(#${gradientId})`} stroke="#7b756c" strokeWidth={0.5} />
            {legend.ticks.map((t) => (
              <g key={t.value} transform={`translate(${t.at * BAR_W}, 0)`}>
                <line y1={BAR_H} y2={BAR_H + 4} stroke="#4a4640" />
                <text y={BAR_H + 15} textAnchor="middle" fontSize={10} fill="#4a4640">
                  {t.label}
                </text>
              </g>
            ))}
            {req ? (
              <g transform={`translate(${req.at * BAR_W}, 0)`} data-testid="fs-map-legend-required">
                <path d="M -5 -9 L 5 -9 L 0 -2 Z" fill="#1f1d1a" />
                <line y1={-2} y2={BAR_H} stroke="#1f1d1a" strokeWidth={1.5} />
              </g>
            ) : null}
          </g>
        </svg>
        {req ? (
          <p className="mt-0.5">
            ▼ required FS {req.value.toFixed(2)}
            {req.outside === "below"
              ? " (every centre is above it)"
              : req.outside === "above"
                ? " (every centre is below it)"
                : ""}
            {range.clipped ? `; cells above ${range.hi.toFixed(2)} share the lightest colour` : ""}
          </p>
        ) : range.clipped ? (
          <p className="mt-0.5">Cells above {range.hi.toFixed(2)} share the lightest colour.</p>
        ) : null}
      </div>
      <div className="flex items-center gap-1.5">
        <svg width={18} height={14} aria-hidden="true">
          <rect x={0.5} y={0.5} width={17} height={13} fill="none" stroke="#7b756c" />
          <line x1={0.5} y1={13.5} x2={17.5} y2={0.5} stroke="#7b756c" />
        </svg>
        <span>no valid circle from that centre</span>
      </div>
    </div>
  );
}
