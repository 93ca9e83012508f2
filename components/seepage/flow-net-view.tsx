import type { MouseEvent, ReactNode } from "react";
import type { SeepageSolution } from "@/lib/seepage";
import { materialPalette } from "@/lib/sections/material-palette";
import { formatScientific } from "@/lib/materials/parameter-form";
import { boxOfPoints, fitView, toScreen, type RunView } from "@/lib/runs/view/view-fit";
import { Caution } from "@/components/ui/caution";

/** Water and net colours: a blue surface, a darker blue for flow lines, warm grey for head contours. */
const PHREATIC = "#1f5f99";
const FLOW_LINE = "#2a5d8a";
const EQUIPOTENTIAL = "#8a6d3b";
const EXIT = "#a3282c";

export interface FlowNetViewProps {
  materials: { id: string; name?: string; color?: string }[];
  regions: { material: string; points: [number, number][] }[];
  /** The seepage solution as the command line prints it; without one only the section is drawn. */
  solution: SeepageSolution | null;
  width?: number;
  height?: number;
  /** Extra layers under the flow net (colour of head, the mesh, pools and drains), in this view. */
  layers?: (view: RunView) => ReactNode;
  /** Called with the point clicked, in metres (the drain tool). */
  onPick?: (x: number, y: number) => void;
  /** Shows the caption (q, the hand check) and the caution; the seepage view lays these out itself. */
  caption?: boolean;
}

/** A value written as the trade writes it, 6.31 × 10⁻⁹. */
export const sci = (v: number) => formatScientific(v);

export function svgPath(view: RunView, line: readonly (readonly [number, number])[]): string {
  return line
    .map(([x, y], i) => {
      const [sx, sy] = toScreen(view, x, y);
      return `${i === 0 ? "M" : "L"}${sx.toFixed(1)},${sy.toFixed(1)}`;
    })
    .join(" ");
}

/** Equipotentials, flow lines, the phreatic surface and the exits with their piping factors. */
export function FlowNetLayers({
  view,
  solution,
  width = Infinity,
}: {
  view: RunView;
  solution: SeepageSolution;
  /** Drawing width (px): labels near the right edge are written to the left of their mark. */
  width?: number;
}) {
  const net = solution.flowNet;
  return (
    <>
      <g data-layer="equipotentials" stroke={EQUIPOTENTIAL} strokeWidth={1} strokeDasharray="5 3" fill="none">
        {net.equipotentials.flatMap((eq, i) =>
          eq.lines.map((line, j) => <path key={`${i}-${j}`} d={svgPath(view, line)} data-head={eq.head} />),
        )}
      </g>
      <g data-layer="flow-lines" stroke={FLOW_LINE} strokeWidth={1.2} fill="none">
        {net.flowLines.map((line, i) => (
          <path key={i} d={svgPath(view, line)} />
        ))}
      </g>
      <path
        data-layer="phreatic"
        d={svgPath(view, solution.phreatic)}
        stroke={PHREATIC}
        strokeWidth={2.2}
        fill="none"
      />
      <g data-layer="exits">
        {solution.exitGradients.map((g, i) => {
          const [sx, sy] = toScreen(view, g.x, g.y);
          const factor = g.pipingFactor === null ? "no γsat" : `F = ${g.pipingFactor.toFixed(2)}`;
          const leftward = sx > width - 160;
          return (
            <g key={i} data-exit={i} data-low={g.pipingFactor !== null && g.pipingFactor < 3 ? "yes" : "no"}>
              <path d={`M${sx},${sy - 9} l-6,10 h12 Z`} fill={EXIT} />
              <text
                x={leftward ? sx - 8 : sx + 8}
                y={sy - 10}
                fontSize={11}
                fill="#1f1d1a"
                textAnchor={leftward ? "end" : "start"}
              >
                {`i = ${g.i.toFixed(3)}, ${factor}`}
              </text>
            </g>
          );
        })}
      </g>
    </>
  );
}

/** q beside the practitioner's k·ΔH·Nf/Nd; `checkOnly` leaves q out where it is shown already. */
export function FlowNetCaption({ solution, checkOnly = false }: { solution: SeepageSolution; checkOnly?: boolean }) {
  if (checkOnly) return <FlowNetCheck solution={solution} />;
  return (
    <>
      <span data-testid="flow-net-q">
        q = {sci(solution.q)} m³/s/m (in {sci(solution.qIn)}, out {sci(solution.qOut)})
      </span>
      {solution.qTotal !== null ? <span> · {sci(solution.qTotal)} m³/s along the crest</span> : null}
      <br />
      <FlowNetCheck solution={solution} />
    </>
  );
}

function FlowNetCheck({ solution }: { solution: SeepageSolution }) {
  const net = solution.flowNet;
  return (
    <span data-testid="flow-net-check">
      Flow net: Nf = {net.flowChannels} channels, Nd = {net.headDrops} drops, ΔH = {net.deltaH.toFixed(2)} m, k of{" "}
      {net.kRefMaterial} = {sci(net.kRef)} m/s → k·ΔH·Nf/Nd = {sci(net.qFlowNet)} m³/s/m, beside the computed q (a hand
      check for one material: in a zoned section the cells are square only in that zone).
    </span>
  );
}

/**
 * A drawing of a seepage solution as a flow net is drawn by hand: equipotentials at equal head
 * drops, flow lines at equal flow between them, the phreatic surface, the exits with their
 * gradients and piping factors, and q beside the practitioner's k·ΔH·Nf/Nd.
 */
export function FlowNetView({
  materials,
  regions,
  solution,
  width = 960,
  height = 420,
  layers,
  onPick,
  caption = true,
}: FlowNetViewProps) {
  const box = boxOfPoints(regions.flatMap((r) => r.points));
  if (!box) return null;
  const view = fitView(box, width, height);
  const fills = new Map(materialPalette(materials).map((m) => [m.key, m.color]));
  const pick = onPick
    ? (e: MouseEvent<SVGSVGElement>) => {
        const ctm = e.currentTarget.getScreenCTM();
        if (!ctm) return;
        const p = new DOMPoint(e.clientX, e.clientY).matrixTransform(ctm.inverse());
        onPick((p.x - view.offsetX) / view.scale, (view.offsetY - p.y) / view.scale);
      }
    : undefined;
  return (
    <figure className="space-y-2" data-testid="flow-net-view">
      <svg
        viewBox={`0 0 ${width} ${height}`}
        width="100%"
        role="img"
        aria-label="Flow net of the section"
        className={`rounded-md border border-rule bg-paper-raised ${onPick ? "cursor-crosshair" : ""}`}
        onClick={pick}
        data-testid="flow-net-svg"
      >
        <g data-layer="regions">
          {regions.map((r, i) => (
            <path
              key={i}
              d={`${svgPath(view, r.points)} Z`}
              fill={fills.get(r.material) ?? "#d9d3c7"}
              fillOpacity={0.45}
              stroke="#7b756c"
              strokeWidth={1}
            />
          ))}
        </g>
        {layers?.(view)}
        {solution ? <FlowNetLayers view={view} solution={solution} width={width} /> : null}
      </svg>
      {caption && solution ? (
        <>
          <figcaption className="text-sm text-ink-soft">
            <FlowNetCaption solution={solution} />
          </figcaption>
          <Caution compact />
        </>
      ) : null}
    </figure>
  );
}
