import type { SectionDocument } from "@/lib/stability";
import { materialPalette } from "@/lib/sections/material-palette";
import { CANVAS_COLORS, REGION_FILL_OPACITY } from "@/components/section-editor/palette";
import { countOf } from "@/lib/format";

const W = 640;
const H = 260;
const PAD = 28;

/**
 * A drawing of an imported section before it is created: each region filled in its material's
 * colour and labelled with its name, the phreatic line over them, x and elevation at the corners.
 */
export function SectionPreview({ document: doc }: { document: SectionDocument }) {
  const points = [...doc.regions.flatMap((r) => r.points), ...(doc.water?.phreatic ?? [])];
  if (points.length === 0) return null;
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  // One scale for both axes, so slopes look as steep as they are.
  const scale = Math.min((W - 2 * PAD) / Math.max(x1 - x0, 1e-9), (H - 2 * PAD) / Math.max(y1 - y0, 1e-9));
  const sx = (x: number) => PAD + (x - x0) * scale;
  const sy = (y: number) => H - PAD - (y - y0) * scale;
  const path = (pts: readonly (readonly number[])[]) => pts.map((p) => `${sx(p[0])},${sy(p[1])}`).join(" ");
  const palette = materialPalette(doc.materials);
  const colour = (id: string) => palette.find((m) => m.key === id)?.color ?? CANVAS_COLORS.unknownMaterial;
  const fmt = (v: number) => (Math.round(v * 100) / 100).toString();

  return (
    <figure className="panel p-3" data-testid="import-preview">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        className="h-auto w-full"
        role="img"
        aria-label={`Drawing of the imported section: ${countOf(doc.regions.length, "region")}`}
      >
        <rect x={0} y={0} width={W} height={H} fill={CANVAS_COLORS.paper} />
        {doc.regions.map((r, i) => (
          <polygon
            key={i}
            points={path(r.points)}
            fill={colour(r.material)}
            fillOpacity={REGION_FILL_OPACITY}
            stroke={CANVAS_COLORS.ink}
            strokeWidth={1}
          />
        ))}
        {doc.regions.map((r, i) => {
          const cx = r.points.reduce((s, p) => s + p[0], 0) / r.points.length;
          const cy = r.points.reduce((s, p) => s + p[1], 0) / r.points.length;
          return (
            <text key={i} x={sx(cx)} y={sy(cy)} fontSize={11} textAnchor="middle" fill={CANVAS_COLORS.ink}>
              {r.name ?? `Region ${i + 1}`}
            </text>
          );
        })}
        {doc.water?.phreatic ? (
          <polyline
            points={path(doc.water.phreatic)}
            fill="none"
            stroke={CANVAS_COLORS.waterLine}
            strokeWidth={2}
            strokeDasharray="6 3"
          />
        ) : null}
        <text x={PAD} y={H - 8} fontSize={10} fill={CANVAS_COLORS.inkSoft}>
          x {fmt(x0)} m
        </text>
        <text x={W - PAD} y={H - 8} fontSize={10} textAnchor="end" fill={CANVAS_COLORS.inkSoft}>
          x {fmt(x1)} m
        </text>
        <text x={4} y={PAD - 10} fontSize={10} fill={CANVAS_COLORS.inkSoft}>
          elevation {fmt(y1)} m
        </text>
      </svg>
      <figcaption className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft">
        {palette.map((m) => (
          <span key={m.key} className="inline-flex items-center gap-1.5">
            <span
              aria-hidden="true"
              className="inline-block h-3 w-3 rounded-sm border border-ink-soft"
              style={{ background: m.color }}
            />
            {m.name}
          </span>
        ))}
        {doc.water?.phreatic ? <span>- - phreatic line</span> : null}
      </figcaption>
    </figure>
  );
}
