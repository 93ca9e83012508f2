import type { ReactNode } from "react";
import type { CentreMark } from "@/lib/runs/view/circle-styles";
import type { RunScene } from "@/lib/runs/view/run-scene";
import { METHOD_NAME } from "@/lib/runs/view/warning-text";
import { WATER_FILL, WATER_LINE } from "@/components/runs/result/canvas-section";
import { SETUP_ACCENT } from "@/components/runs/result/canvas-centre-grid";
import { countOf } from "@/lib/format";

function LineSample({
  colour,
  dash,
  width = 2,
  opacity = 1,
}: {
  colour: string;
  dash?: number[];
  width?: number;
  opacity?: number;
}) {
  return (
    <svg width={34} height={10} aria-hidden="true">
      <line
        x1={1}
        y1={5}
        x2={33}
        y2={5}
        stroke={colour}
        strokeWidth={width}
        strokeDasharray={dash && dash.length > 0 ? dash.join(" ") : undefined}
        opacity={opacity}
      />
    </svg>
  );
}

function MarkSample({ mark, colour }: { mark: CentreMark; colour: string }) {
  const shape = {
    dot: <circle cx={6} cy={6} r={4} fill={colour} />,
    square: <rect x={2} y={2} width={8} height={8} fill={colour} />,
    diamond: <path d="M6 0 L12 6 L6 12 L0 6 Z" fill={colour} />,
    triangle: <path d="M6 1 L11.5 11 L0.5 11 Z" fill={colour} />,
  }[mark];
  return (
    <svg width={12} height={12} aria-hidden="true">
      {shape}
    </svg>
  );
}

function Item({ sample, children }: { sample: ReactNode; children: ReactNode }) {
  return (
    <li className="flex items-center gap-1.5">
      {sample}
      <span>{children}</span>
    </li>
  );
}

/** The key to what the canvas shows, listing only what is drawn. */
export function CanvasKey({ scene, setup }: { scene: RunScene; setup: boolean }) {
  return (
    <ul className="flex flex-wrap gap-x-5 gap-y-1 text-xs text-ink-soft" data-testid="run-canvas-key">
      {scene.critical.map((c) => (
        <Item
          key={c.key}
          sample={
            <>
              <LineSample colour={c.style.colour} dash={c.style.dash} width={c.style.width} />
              <MarkSample mark={c.style.mark} colour={c.style.colour} />
            </>
          }
        >
          {c.method ? `Critical circle, ${METHOD_NAME[c.method]}` : c.label}
        </Item>
      ))}
      {scene.lowest.length > 0 && scene.method ? (
        <Item sample={<LineSample colour="#1f1d1a" width={1} opacity={0.35} />}>
          {scene.lowest.length} lowest circles ({METHOD_NAME[scene.method]})
        </Item>
      ) : null}
      {scene.slices.length > 0 ? (
        <Item sample={<LineSample colour="#4a4640" width={1} dash={[1, 3]} />}>
          slice sides ({countOf(scene.slices.length - 1, "slice")})
        </Item>
      ) : null}
      {scene.phreatic ? (
        <Item sample={<LineSample colour={WATER_LINE} dash={[9, 5]} />}>
          {scene.beforeDrawdown ? "pore-water level after drawdown (analysed)" : "phreatic line"}
        </Item>
      ) : null}
      {scene.beforeDrawdown ? (
        <Item sample={<LineSample colour={WATER_LINE} dash={[3, 4]} width={1} opacity={0.45} />}>
          line before drawdown (not analysed)
        </Item>
      ) : null}
      {scene.ponds.length > 0 ? (
        <Item
          sample={
            <svg width={18} height={10} aria-hidden="true">
              <rect width={18} height={10} fill={WATER_FILL} />
            </svg>
          }
        >
          ponded water
        </Item>
      ) : null}
      {scene.pool ? <Item sample={<LineSample colour={WATER_LINE} dash={[2, 4]} />}>pool after drawdown</Item> : null}
      {setup ? (
        <Item sample={<LineSample colour={SETUP_ACCENT} dash={[7, 4]} />}>
          drag the grid, its corners or the band lines (0.5 m steps)
        </Item>
      ) : null}
    </ul>
  );
}
